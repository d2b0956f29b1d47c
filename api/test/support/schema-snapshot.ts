import type { DataSource } from 'typeorm';

/**
 * A database's schema reduced to what both SQLite and PostgreSQL can say alike: per table, its
 * columns (name, nullability, broad type) and its indexes and unique constraints (columns and
 * uniqueness; names differ, as each database names inline UNIQUE constraints its own way).
 */
export interface SchemaSnapshot {
  [table: string]: { columns: string[]; indexes: string[] };
}

/** Tables that are bookkeeping, not the product's schema. */
const IGNORED_TABLES = new Set(['migrations', 'typeorm_metadata', 'sqlite_sequence']);

/** The family a declared type belongs to on either database. */
export function broadType(declared: string): string {
  const type = declared.toLowerCase();
  if (/^(varchar|character varying|text|character)/.test(type)) return 'text';
  if (/^(integer|int|bigint|smallint)/.test(type)) return 'integer';
  if (/^(real|double precision|float)/.test(type)) return 'float';
  if (/^(boolean|bool)/.test(type)) return 'boolean';
  if (/^(datetime|timestamp)/.test(type)) return 'datetime';
  return `other:${type}`;
}

function describeColumn(name: string, type: string, nullable: boolean): string {
  return `${name} ${broadType(type)}${nullable ? ' null' : ' not null'}`;
}

function describeIndex(columns: string[], unique: boolean): string {
  return `${unique ? 'unique ' : ''}(${columns.join(', ')})`;
}

export async function sqliteSchema(db: DataSource): Promise<SchemaSnapshot> {
  const tables: { name: string }[] = await db.query(
    `SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'`,
  );
  const snapshot: SchemaSnapshot = {};
  for (const { name } of tables.filter((table) => !IGNORED_TABLES.has(table.name))) {
    const columns: { name: string; type: string; notnull: number; pk: number }[] = await db.query(
      `PRAGMA table_info("${name}")`,
    );
    const indexes: { name: string; unique: number; origin: string }[] = await db.query(
      `PRAGMA index_list("${name}")`,
    );
    const described: string[] = [];
    for (const index of indexes.filter((candidate) => candidate.origin !== 'pk')) {
      const parts: { seqno: number; name: string }[] = await db.query(
        `PRAGMA index_info("${index.name}")`,
      );
      const ordered = parts.sort((a, b) => a.seqno - b.seqno).map((part) => part.name);
      described.push(describeIndex(ordered, index.unique === 1));
    }
    snapshot[name] = {
      // SQLite lets a primary key column be null unless it is declared NOT NULL; all ours are.
      columns: columns
        .map((column) => describeColumn(column.name, column.type, column.notnull === 0))
        .sort(),
      indexes: described.sort(),
    };
  }
  return snapshot;
}

export async function postgresSchema(db: DataSource): Promise<SchemaSnapshot> {
  const columns: {
    table_name: string;
    column_name: string;
    data_type: string;
    is_nullable: string;
  }[] = await db.query(
    `SELECT table_name, column_name, data_type, is_nullable FROM information_schema.columns
       WHERE table_schema = 'public'`,
  );
  // Every non-primary index with its columns in order (unique constraints are indexes too).
  const indexes: { table_name: string; unique: boolean; columns: string[] }[] = await db.query(
    `SELECT t.relname AS table_name, i.indisunique AS unique,
       array(SELECT a.attname FROM unnest(i.indkey) WITH ORDINALITY AS k(attnum, position)
             JOIN pg_attribute a ON a.attrelid = t.oid AND a.attnum = k.attnum
             ORDER BY k.position)::text[] AS columns
     FROM pg_index i JOIN pg_class t ON t.oid = i.indrelid
     JOIN pg_namespace n ON n.oid = t.relnamespace
     WHERE n.nspname = 'public' AND NOT i.indisprimary`,
  );
  const snapshot: SchemaSnapshot = {};
  for (const column of columns) {
    if (IGNORED_TABLES.has(column.table_name)) continue;
    const table = (snapshot[column.table_name] ??= { columns: [], indexes: [] });
    table.columns.push(
      describeColumn(column.column_name, column.data_type, column.is_nullable === 'YES'),
    );
  }
  for (const index of indexes) {
    const table = snapshot[index.table_name];
    if (table) table.indexes.push(describeIndex(index.columns, index.unique));
  }
  for (const table of Object.values(snapshot)) {
    table.columns.sort();
    table.indexes.sort();
  }
  return snapshot;
}
