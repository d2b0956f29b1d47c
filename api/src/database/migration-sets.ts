import type { MigrationInterface } from 'typeorm';
import type { DatabaseKind } from './database-kind';
import { PostgresSchema1764759600000 } from './migrations-postgres/1764759600000-postgres-schema';

type MigrationClass = new () => MigrationInterface;

/**
 * The last SQLite migration written in SQLite's own SQL; PostgresSchema1764759600000 creates
 * the same schema in one step. Every migration after it must be written with TypeORM's portable
 * Table API (or SQL both databases accept): it is listed once, in MIGRATIONS, and runs on both.
 */
export const POSTGRES_BASELINE_TIMESTAMP = 1764759600000;

/** The timestamp TypeORM orders a migration by: the digits at the end of its class name. */
export function migrationTimestamp(migration: MigrationClass): number {
  const digits = /(\d{13})$/.exec(migration.name);
  if (!digits) throw new Error(`Migration ${migration.name} has no 13-digit timestamp at its end`);
  return Number(digits[1]);
}

/**
 * The migrations for a database. `sqliteMigrations` is the full SQLite list; PostgreSQL gets its
 * baseline and then the portable migrations that follow it.
 */
export function migrationsFor(
  kind: DatabaseKind,
  sqliteMigrations: readonly MigrationClass[],
): MigrationClass[] {
  if (kind === 'sqlite') return [...sqliteMigrations];
  const portable = sqliteMigrations.filter(
    (migration) => migrationTimestamp(migration) > POSTGRES_BASELINE_TIMESTAMP,
  );
  return [PostgresSchema1764759600000, ...portable];
}
