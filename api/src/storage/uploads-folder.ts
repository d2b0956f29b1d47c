import type { ConfigService } from '@nestjs/config';
import { resolve } from 'node:path';
import { preparePrivateDataDir } from '../config/data-dir';
import type { EnvironmentVariables } from '../config/env.validation';

/** The local upload folder: where files are staged always, and stored when no bucket is set. */
export const uploadsFolder = (config: ConfigService<EnvironmentVariables, true>): string =>
  resolve(preparePrivateDataDir(config.get('DATA_DIR', { infer: true })), 'uploads');
