import { DATABASE_KIND } from './database-kind';

/**
 * SQL fragments for query builders whose spelling differs between SQLite and PostgreSQL.
 * Everything else in the services' queries is written in the SQL both accept.
 */

/**
 * `alias.column` with both parts quoted: an alias such as `user` is a reserved word in
 * PostgreSQL, and TypeORM only rewrites property names, not column names, in raw conditions.
 */
function quoted(path: string): string {
  return path
    .split('.')
    .map((part) => `"${part}"`)
    .join('.');
}

/**
 * True when the JSON array stored as text in `column` (simple-json / simple-array columns)
 * holds the string bound to `:parameter`.
 */
export function jsonArrayContains(column: string, parameter: string): string {
  const path = quoted(column);
  return DATABASE_KIND === 'postgres'
    ? `EXISTS (SELECT 1 FROM json_array_elements_text(${path}::json) AS item(value) WHERE item.value = :${parameter})`
    : `EXISTS (SELECT 1 FROM json_each(${path}) WHERE json_each.value = :${parameter})`;
}

/**
 * `column` contains the LIKE pattern bound to `:parameter` (escaped with a backslash), ignoring
 * case as SQLite's LIKE does for ASCII letters; PostgreSQL's LIKE would respect case.
 */
export function containsIgnoringCase(column: string, parameter: string): string {
  const path = quoted(column);
  return DATABASE_KIND === 'postgres'
    ? `${path} ILIKE :${parameter} ESCAPE '\\'`
    : `${path} LIKE :${parameter} ESCAPE '\\'`;
}
