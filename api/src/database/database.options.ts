import { mkdirSync } from 'node:fs';
import { resolve } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import { Installation } from '../health/installation.entity';
import { InitSchema1764633600000 } from './migrations/1764633600000-init-schema';

export const DATABASE_FILE_NAME = 'loftwright.sqlite';

export const ENTITIES = [Installation];
export const MIGRATIONS = [InitSchema1764633600000];

/**
 * TypeORM options for the SQLite file under `dataDir`. Schema changes come only from migrations,
 * which run on start; `synchronize` stays off so a model change can never silently alter a
 * team's stored calculations.
 */
export function buildDataSourceOptions(dataDir: string): DataSourceOptions {
  const directory = resolve(dataDir);
  mkdirSync(directory, { recursive: true });
  return {
    type: 'better-sqlite3',
    database: resolve(directory, DATABASE_FILE_NAME),
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsRun: true,
    synchronize: false,
    // WAL keeps readers going while a save commits; foreign keys are off by default in SQLite.
    prepareDatabase: (db: { pragma(source: string): unknown }) => {
      db.pragma('journal_mode = WAL');
      db.pragma('foreign_keys = ON');
    },
  };
}
