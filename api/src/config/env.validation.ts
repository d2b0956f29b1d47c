import { plainToInstance, Type } from 'class-transformer';
import {
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Max,
  Min,
  MinLength,
  validateSync,
} from 'class-validator';

export const NODE_ENVIRONMENTS = ['development', 'production', 'test'] as const;

/** The process environment Loftwright reads, with its defaults. Checked once at start. */
export class EnvironmentVariables {
  @IsIn(NODE_ENVIRONMENTS)
  NODE_ENV: (typeof NODE_ENVIRONMENTS)[number] = 'production';

  @Type(() => Number)
  @IsInt()
  @Min(0)
  @Max(65535)
  PORT: number = 3000;

  @IsString()
  @MinLength(1)
  HOST: string = '127.0.0.1';

  /** Folder for the SQLite file (and, later, uploads). Relative paths start at the working directory. */
  @IsString()
  @MinLength(1)
  DATA_DIR: string = './data';

  /** Built web app to serve for every path outside /api; defaults to the workspace's web/dist. */
  @IsOptional()
  @IsString()
  WEB_DIST_DIR?: string;
}

/**
 * Validates the environment for ConfigModule. A bad value stops the process at start with every
 * problem listed, rather than failing later in the middle of a request.
 */
export function validateEnvironment(config: Record<string, unknown>): EnvironmentVariables {
  const env = plainToInstance(EnvironmentVariables, config, { enableImplicitConversion: true });
  const errors = validateSync(env, { skipMissingProperties: false });
  if (errors.length > 0) {
    const lines = errors.map(
      (error) =>
        `${error.property}=${JSON.stringify(error.value)}: ${Object.values(error.constraints ?? {}).join('; ')}`,
    );
    throw new Error(`Invalid environment:\n  ${lines.join('\n  ')}`);
  }
  return env;
}
