import { createHash } from 'node:crypto';
import pg from 'pg';

/**
 * Set by the api-postgres project's setup file (postgres-setup-file.ts) to the test server's
 * superuser address; unset, API tests run on SQLite as usual.
 */
export const TEST_POSTGRES_ENV = 'LOFTWRIGHT_TEST_POSTGRES_URL';

/** SQLSTATE for CREATE DATABASE of a name that exists. */
const DUPLICATE_DATABASE = '42P04';

/** One database per data folder, so a server restarted on the same folder finds its data. */
function databaseNameFor(dataDir: string): string {
  return `loftwright_${createHash('sha256').update(dataDir).digest('hex').slice(0, 20)}`;
}

async function withAdmin<T>(adminUrl: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/**
 * The DATABASE_URL an API under test uses for `dataDir`: a database of its own on the test
 * PostgreSQL server, created on first use; undefined when the tests run on SQLite.
 */
export async function testDatabaseUrl(dataDir: string): Promise<string | undefined> {
  const adminUrl = process.env[TEST_POSTGRES_ENV];
  if (!adminUrl) return undefined;
  const name = databaseNameFor(dataDir);
  await withAdmin(adminUrl, async (client) => {
    try {
      await client.query(`CREATE DATABASE "${name}"`);
    } catch (error) {
      if ((error as { code?: unknown }).code !== DUPLICATE_DATABASE) throw error;
    }
  });
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

/** Drops the database testDatabaseUrl made for `dataDir`, with any sessions still open on it. */
export async function dropTestDatabase(dataDir: string): Promise<void> {
  const adminUrl = process.env[TEST_POSTGRES_ENV];
  if (!adminUrl) return;
  await withAdmin(adminUrl, (client) =>
    client.query(`DROP DATABASE IF EXISTS "${databaseNameFor(dataDir)}" WITH (FORCE)`),
  );
}
