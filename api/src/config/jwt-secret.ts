import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { preparePrivateDataDir } from './data-dir';

const SECRET_FILE = 'jwt-secret';

/**
 * The key that signs access tokens: JWT_SECRET when set, otherwise a random key generated on
 * first start and kept (readable by the owner only) in DATA_DIR, so tokens survive a restart and
 * no key ever sits in the source.
 */
export function resolveJwtSecret(configured: string | undefined, dataDir: string): string {
  if (configured) return configured;
  const directory = preparePrivateDataDir(dataDir);
  const file = join(directory, SECRET_FILE);
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600, flag: 'wx' });
  return secret;
}
