import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { dropTestDatabase, testDatabaseUrl } from './postgres-test-database';

export interface TestApp {
  readonly app: NestExpressApplication;
  readonly dataDir: string;
  close(): Promise<void>;
}

/**
 * Boots the real AppModule, configured as main.ts configures it, on a fresh SQLite file in a
 * temporary data directory (migrations run as on a first start). The module is imported after
 * the environment is set because ConfigModule validates the environment when it is imported.
 */
export async function createTestApp(
  options: {
    webDistDir?: string;
    /** true/false set SEED_DEMO to 1/0; 'unset' leaves it out, as a person starting it might. */
    seedDemo?: boolean | 'unset';
    env?: Record<string, string>;
  } = {},
): Promise<TestApp> {
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-api-'));
  process.env.NODE_ENV = 'test';
  process.env.DATA_DIR = dataDir;
  // Cheap hashes keep the suites fast; production refuses a cost below 12 (env.validation.ts).
  process.env.SCRYPT_COST = '10';
  if (options.seedDemo === 'unset') delete process.env.SEED_DEMO;
  else process.env.SEED_DEMO = options.seedDemo ? '1' : '0';
  delete process.env.HOST;
  process.env.LOGIN_RATE_LIMIT = '1000';
  process.env.REGISTER_RATE_LIMIT = '1000';
  process.env.CLASS_JOIN_RATE_LIMIT = '1000';
  process.env.EVALUATE_RATE_LIMIT = '100000';
  delete process.env.SMTP_URL;
  // Local folder storage unless the test asks for a bucket.
  delete process.env.STORAGE_URL;
  delete process.env.STORAGE_ENDPOINT;
  // SQLite in dataDir, or in the api-postgres project a fresh PostgreSQL database of its own.
  const databaseUrl = await testDatabaseUrl(dataDir);
  if (databaseUrl) process.env.DATABASE_URL = databaseUrl;
  else delete process.env.DATABASE_URL;
  for (const [key, value] of Object.entries(options.env ?? {})) process.env[key] = value;
  if (options.webDistDir) process.env.WEB_DIST_DIR = options.webDistDir;
  else delete process.env.WEB_DIST_DIR;

  const { AppModule } = await import('../../src/app.module');
  const { configureApp } = await import('../../src/app.setup');
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'] });
  configureApp(app);
  await app.init();

  return {
    app,
    dataDir,
    async close() {
      await app.close();
      await dropTestDatabase(dataDir);
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
