import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { afterEach, describe, expect, it } from 'vitest';
import { AppSetting, FIRST_ACCOUNT_SETTING } from '../auth/app-setting.entity';
import { buildDataSourceOptions, MIGRATIONS } from '../database/database.options';
import { SharedInstanceState1764763200000 } from '../database/migrations/1764763200000-shared-instance-state';
import { claimFirstAccount } from './first-account-claim';

// On SQLite files of its own; the PostgreSQL run covers the claim through the e2e suites.
describe.skipIf(Boolean(process.env.DATABASE_URL))('the first-account claim', () => {
  const opened: { dataSource: DataSource; dataDir: string }[] = [];
  const open = async (migrations = MIGRATIONS): Promise<DataSource> => {
    const dataDir = opened[0]?.dataDir ?? mkdtempSync(join(tmpdir(), 'loftwright-claim-'));
    const dataSource = await new DataSource({
      ...buildDataSourceOptions(dataDir),
      migrations: [...migrations],
    }).initialize();
    opened.push({ dataSource, dataDir });
    return dataSource;
  };
  afterEach(async () => {
    for (const { dataSource } of opened) if (dataSource.isInitialized) await dataSource.destroy();
    if (opened[0]) rmSync(opened[0].dataDir, { recursive: true, force: true });
    opened.length = 0;
  });

  it('goes to the first claimant only; a later one is told it was not first', async () => {
    const dataSource = await open();
    const claims = [
      await dataSource.transaction((manager) => claimFirstAccount(manager, 'first-id')),
      await dataSource.transaction((manager) => claimFirstAccount(manager, 'second-id')),
    ];
    expect(claims).toEqual([true, false]);
  });

  it('rolls back with an account that was not saved, leaving the claim free', async () => {
    const dataSource = await open();
    await expect(
      dataSource.transaction(async (manager) => {
        expect(await claimFirstAccount(manager, 'failed-id')).toBe(true);
        throw new Error('the account insert failed');
      }),
    ).rejects.toThrow('the account insert failed');
    expect(
      await dataSource.getRepository(AppSetting).findOneBy({ key: FIRST_ACCOUNT_SETTING }),
    ).toBeNull();
  });

  it('is given to the oldest account when a database with accounts is upgraded', async () => {
    const before = await open(
      MIGRATIONS.filter((migration) => migration !== SharedInstanceState1764763200000),
    );
    for (const [id, createdAt] of [
      ['newer-id', '2026-02-01 10:00:00'],
      ['oldest-id', '2026-01-01 10:00:00'],
    ]) {
      // Raw SQL is fine here: this spec runs on SQLite only.
      await before.query(
        `INSERT INTO "user" (id, email, display_name, password_hash, roles, created_at)
         VALUES (?, ?, ?, 'x', '["designer"]', ?)`,
        [id, `${id}@example.org`, id, createdAt],
      );
    }
    await before.destroy();
    const after = await open();
    expect(await after.getRepository(AppSetting).findOneBy({ key: FIRST_ACCOUNT_SETTING })).toEqual(
      {
        key: FIRST_ACCOUNT_SETTING,
        value: 'oldest-id',
      },
    );
    expect(await after.transaction((manager) => claimFirstAccount(manager, 'new-id'))).toBe(false);
  });
});
