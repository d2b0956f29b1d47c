import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { databaseConflict } from '../src/database/database-errors';
import { MIGRATIONS } from '../src/database/database.options';
import { migrationsFor } from '../src/database/migration-sets';
import { startThrowawayPostgres, type ThrowawayPostgres } from './support/postgres-throwaway';
import { TEST_POSTGRES_ENV } from './support/postgres-test-database';
import { postgresSchema, sqliteSchema } from './support/schema-snapshot';

/**
 * The SQLite migrations and the PostgreSQL set (its baseline plus the shared portable migrations)
 * must build the same schema, and both databases must refuse the same writes the same way.
 * Needs a PostgreSQL server: TEST_DATABASE_URL, the api-postgres project's, or a throwaway one
 * from Debian's postgresql package (.ci/run installs it). Only a machine with none of these and
 * outside CI skips it.
 */
const postgresReachable =
  Boolean(process.env.TEST_DATABASE_URL ?? process.env[TEST_POSTGRES_ENV]) ||
  existsSync(join(process.env.POSTGRES_BIN ?? '/usr/lib/postgresql/15/bin', 'initdb')) ||
  process.env.CI === 'true';

describe.runIf(postgresReachable)('SQLite and PostgreSQL schemas', () => {
  let server: ThrowawayPostgres | undefined;
  let sqliteDir: string;
  let sqlite: DataSource;
  let postgres: DataSource;
  let admin: DataSource;
  const databaseName = `schema_parity_${randomUUID().replace(/-/g, '')}`;

  beforeAll(async () => {
    let adminUrl = process.env.TEST_DATABASE_URL ?? process.env[TEST_POSTGRES_ENV];
    if (!adminUrl) {
      server = await startThrowawayPostgres();
      adminUrl = server.url;
    }
    admin = await new DataSource({ type: 'postgres', url: adminUrl }).initialize();
    await admin.query(`CREATE DATABASE "${databaseName}"`);
    const url = new URL(adminUrl);
    url.pathname = `/${databaseName}`;
    postgres = await new DataSource({
      type: 'postgres',
      url: url.toString(),
      migrations: migrationsFor('postgres', MIGRATIONS),
    }).initialize();
    await postgres.runMigrations();
    sqliteDir = mkdtempSync(join(tmpdir(), 'loftwright-parity-'));
    sqlite = await new DataSource({
      type: 'better-sqlite3',
      database: join(sqliteDir, 'parity.sqlite'),
      migrations: migrationsFor('sqlite', MIGRATIONS),
      prepareDatabase: (db: { pragma(source: string): unknown }) => {
        db.pragma('foreign_keys = ON');
      },
    }).initialize();
    await sqlite.runMigrations();
  }, 120_000);

  afterAll(async () => {
    await sqlite?.destroy();
    await postgres?.destroy();
    await admin?.query(`DROP DATABASE IF EXISTS "${databaseName}" WITH (FORCE)`);
    await admin?.destroy();
    await server?.stop();
    if (sqliteDir) rmSync(sqliteDir, { recursive: true, force: true });
  });

  it('have the same tables, columns, nullability, broad types and indexes', async () => {
    const fromSqlite = await sqliteSchema(sqlite);
    const fromPostgres = await postgresSchema(postgres);
    // The check must be able to fail: both sides really hold the product's tables.
    expect(Object.keys(fromSqlite)).toContain('calculation_version');
    expect(fromSqlite.calculation_version?.indexes).toContain('unique (calculation_id, number)');
    expect(fromPostgres).toEqual(fromSqlite);
  });

  it('ran the same migrations after the PostgreSQL baseline', async () => {
    const names = async (db: DataSource): Promise<string[]> =>
      ((await db.query(`SELECT name FROM migrations ORDER BY timestamp`)) as { name: string }[])
        .map((row) => row.name)
        .filter((name) => Number(/\d{13}$/.exec(name)?.[0]) > 1764759600000);
    expect(await names(postgres)).toEqual(await names(sqlite));
  });

  for (const kind of ['sqlite', 'postgres'] as const) {
    describe(`on ${kind}`, () => {
      const db = (): DataSource => (kind === 'sqlite' ? sqlite : postgres);
      // Placeholders are the one spelling the two drivers do not share.
      const sql = (text: string): string => {
        let index = 0;
        return kind === 'sqlite' ? text : text.replace(/\?/g, () => `$${++index}`);
      };
      const calculationId = randomUUID();

      beforeAll(async () => {
        const userId = randomUUID();
        await db().query(
          sql(`INSERT INTO "user" (id, email, display_name, password_hash, roles)
               VALUES (?, ?, 'Parity', 'x', '[]')`),
          [userId, `${userId}@example.org`],
        );
        await db().query(
          sql(`INSERT INTO calculation (id, title, kind, owner_id, tags, latest_version, latest_status)
               VALUES (?, 'Parity', 'lift', ?, '[]', 1, 'draft')`),
          [calculationId, userId],
        );
        await db().query(
          sql(`INSERT INTO calculation_version (id, calculation_id, number, inputs, outputs, steps,
                 warnings, engine_version, author_id, fingerprint)
               VALUES (?, ?, 1, '{}', '{}', '[]', '[]', 'test', ?, 'f')`),
          [randomUUID(), calculationId, userId],
        );
      });

      it('lets only one version take a number: the loser is a 409, not a 500', async () => {
        const second = db().query(
          sql(`INSERT INTO calculation_version (id, calculation_id, number, inputs, outputs, steps,
                 warnings, engine_version, author_id, fingerprint)
               SELECT ?, calculation_id, number, inputs, outputs, steps, warnings, engine_version,
                 author_id, fingerprint FROM calculation_version WHERE calculation_id = ?`),
          [randomUUID(), calculationId],
        );
        const error = await second.then(
          () => undefined,
          (caught: unknown) => caught,
        );
        expect(databaseConflict(error)?.statusCode).toBe(409);
      });

      it('refuses to change or delete a stored version, answered 409', async () => {
        for (const statement of [
          `UPDATE calculation_version SET inputs = '{"x":1}' WHERE calculation_id = ?`,
          `DELETE FROM calculation_version WHERE calculation_id = ?`,
        ]) {
          const error = await db()
            .query(sql(statement), [calculationId])
            .then(
              () => undefined,
              (caught: unknown) => caught,
            );
          expect(String(error)).toMatch(/immutable|never deleted/);
          expect(databaseConflict(error)?.statusCode).toBe(409);
        }
      });

      it('still lets a version move through review (status is not content)', async () => {
        await db().query(
          sql(`UPDATE calculation_version SET status = 'in_review' WHERE calculation_id = ?`),
          [calculationId],
        );
        const rows: { status: string }[] = await db().query(
          sql(`SELECT status FROM calculation_version WHERE calculation_id = ?`),
          [calculationId],
        );
        expect(rows.map((row) => row.status)).toEqual(['in_review']);
      });
    });
  }
});
