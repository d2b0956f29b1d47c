import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { DataSource } from 'typeorm';
import { AppSetting, JWT_SECRET_SETTING } from '../auth/app-setting.entity';

/** Where versions before the shared key kept the generated key; read once, to import it. */
export const LEGACY_SECRET_FILE = 'jwt-secret';

/** As JWT_SECRET must be (env.validation.ts): shorter keys are guessable offline from one token. */
export const MIN_JWT_SECRET_LENGTH = 32;

/**
 * The key that signs access tokens, the same for every API instance: JWT_SECRET when set,
 * otherwise the key stored in the database's settings. On the first start without one, the key
 * an older version generated into DATA_DIR/jwt-secret is imported (so signed-in people stay
 * signed in), or else a random key is generated. Instances starting together may both try; the
 * first insert wins and every instance reads back the same stored key.
 */
export async function resolveJwtSecret(
  configured: string | undefined,
  dataDir: string,
  dataSource: DataSource,
): Promise<string> {
  if (configured) return configured;
  const settings = dataSource.getRepository(AppSetting);
  const stored = await settings.findOneBy({ key: JWT_SECRET_SETTING });
  if (stored) return stored.value;
  const candidate = legacyKey(dataDir) ?? randomBytes(48).toString('base64url');
  await settings
    .createQueryBuilder()
    .insert()
    .values({ key: JWT_SECRET_SETTING, value: candidate })
    .orIgnore()
    .execute();
  return (await settings.findOneByOrFail({ key: JWT_SECRET_SETTING })).value;
}

/** The key file of an older version, when there is one long enough to be a key it made. */
function legacyKey(dataDir: string): string | null {
  const file = join(dataDir, LEGACY_SECRET_FILE);
  if (!existsSync(file)) return null;
  const key = readFileSync(file, 'utf8').trim();
  return key.length >= MIN_JWT_SECRET_LENGTH ? key : null;
}
