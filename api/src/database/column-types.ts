import { DATABASE_KIND } from './database-kind';

/**
 * Column types that differ between the two databases, for entity decorators. SQLite's
 * `datetime` has no PostgreSQL twin (timestamptz keeps the instant, as SQLite's UTC text does);
 * SQLite's `real` is an 8-byte float but PostgreSQL's is 4-byte, so PostgreSQL gets
 * `double precision` and figures keep the same precision on both.
 */
// Spelled out: TypeORM's decorator overloads list 'timestamp with time zone' beside 'datetime'.
export const DATETIME: 'datetime' | 'timestamp with time zone' =
  DATABASE_KIND === 'postgres' ? 'timestamp with time zone' : 'datetime';

export const DOUBLE: 'real' | 'double precision' =
  DATABASE_KIND === 'postgres' ? 'double precision' : 'real';
