import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir, userInfo } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';

/** Debian's PostgreSQL 15 (`apt-get install postgresql`); POSTGRES_BIN overrides it. */
const POSTGRES_BIN = process.env.POSTGRES_BIN ?? '/usr/lib/postgresql/15/bin';

export interface ThrowawayPostgres {
  /** Superuser address of the server's `postgres` database. */
  readonly url: string;
  stop(): Promise<void>;
}

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

/**
 * PostgreSQL refuses to run as root, so under root (CI containers) every command runs as the
 * `postgres` account the Debian package creates, and the data folder is handed to it.
 */
function asServerUser(command: string, args: string[]): [string, string[]] {
  if (userInfo().uid !== 0) return [command, args];
  return ['runuser', ['-u', 'postgres', '--', command, ...args]];
}

function handToServerUser(path: string): void {
  if (userInfo().uid !== 0) return;
  const found = spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' });
  const groups = spawnSync('id', ['-g', 'postgres'], { encoding: 'utf8' });
  if (found.status !== 0) throw new Error('running as root, but there is no "postgres" user');
  chownSync(path, Number(found.stdout.trim()), Number(groups.stdout.trim()));
}

function initialise(dataDir: string): void {
  const [command, args] = asServerUser(join(POSTGRES_BIN, 'initdb'), [
    '-D',
    dataDir,
    '-U',
    'postgres',
    '--auth=trust',
    '--encoding=UTF8',
    '--locale=C.UTF-8',
    '--no-sync',
  ]);
  const result = spawnSync(command, args, { encoding: 'utf8' });
  if (result.status !== 0) {
    throw new Error(`initdb failed (${result.status}):\n${result.stdout}\n${result.stderr}`);
  }
}

/** Polls until the server answers a query; gives up when it exits or after `timeoutMs`. */
async function waitUntilReady(url: string, child: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`postgres exited early:\n${log()}`);
    const client = new pg.Client({ connectionString: url });
    try {
      await client.connect();
      await client.query('SELECT 1');
      return;
    } catch {
      // still starting
    } finally {
      await client.end().catch(() => undefined);
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`postgres did not accept connections within 60 s:\n${log()}`);
}

/**
 * Starts a PostgreSQL server for one test run, in a fresh data folder under the temporary
 * folder, on a free loopback port. Durability settings are off: the data is thrown away.
 */
export async function startThrowawayPostgres(): Promise<ThrowawayPostgres> {
  if (!existsSync(join(POSTGRES_BIN, 'initdb'))) {
    throw new Error(
      `${POSTGRES_BIN}/initdb is missing: install Debian's "postgresql" package, or set TEST_DATABASE_URL`,
    );
  }
  const root = mkdtempSync(join(tmpdir(), 'loftwright-pg-'));
  handToServerUser(root);
  const dataDir = join(root, 'data');
  initialise(dataDir);
  const port = await freePort();
  const [command, args] = asServerUser(join(POSTGRES_BIN, 'postgres'), [
    '-D',
    dataDir,
    '-p',
    String(port),
    '-h',
    '127.0.0.1',
    '-k',
    root,
    '-c',
    'fsync=off',
    '-c',
    'synchronous_commit=off',
    '-c',
    'full_page_writes=off',
    '-c',
    'max_connections=300',
  ]);
  const child = spawn(command, args, { stdio: ['ignore', 'pipe', 'pipe'] });
  let printed = '';
  child.stdout?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  const url = `postgres://postgres@127.0.0.1:${port}/postgres`;
  await waitUntilReady(url, child, () => printed);
  return {
    url,
    async stop() {
      if (child.exitCode === null) {
        const exited = new Promise((resolve) => child.once('exit', resolve));
        // SIGINT is PostgreSQL's "fast" shutdown: open sessions are ended, nothing is kept. It
        // goes to the server itself (its pid heads postmaster.pid): runuser does not pass it on.
        const serverPid = Number(
          readFileSync(join(dataDir, 'postmaster.pid'), 'utf8').split('\n')[0],
        );
        process.kill(serverPid > 0 ? serverPid : (child.pid as number), 'SIGINT');
        await exited;
      }
      rmSync(root, { recursive: true, force: true });
    },
  };
}
