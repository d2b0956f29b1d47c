import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { testDatabaseUrl } from './postgres-test-database';

export const BUILT_SERVER = join(__dirname, '..', '..', 'dist', 'main.js');

export interface ServerProcess {
  readonly baseUrl: string;
  readonly child: ChildProcess;
  output(): string;
}

/**
 * Every server a test started, so none outlives the test run: a test that times out while a server
 * is still starting never gets its handle, and the worker's exit must take the process down.
 */
const started = new Set<ChildProcess>();
process.once('exit', () => {
  for (const child of started) if (child.exitCode === null) child.kill('SIGKILL');
});

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

/** Starts the built API (dist/main.js) as `npm start` does, and waits for its health endpoint. */
export async function startServerProcess(
  dataDir: string,
  env: Record<string, string> = {},
): Promise<ServerProcess> {
  if (!existsSync(BUILT_SERVER))
    throw new Error(`${BUILT_SERVER} is missing: run "npm run build" first (npm test does).`);
  const port = await freePort();
  // In the api-postgres project the server gets the database kept for this data folder, so a
  // restart on the same folder finds its data as it would in the SQLite file.
  const databaseUrl = await testDatabaseUrl(dataDir);
  const childEnv: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'test',
    PORT: String(port),
    HOST: '127.0.0.1',
    DATA_DIR: dataDir,
    SEED_DEMO: '0',
    SCRYPT_COST: '10',
    DATABASE_URL: databaseUrl,
    ...env,
  };
  if (childEnv.DATABASE_URL === undefined) delete childEnv.DATABASE_URL;
  const child = spawn(process.execPath, [BUILT_SERVER], {
    env: childEnv,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  started.add(child);
  child.once('exit', () => started.delete(child));
  let printed = '';
  child.stdout?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  // A cold start on a busy 2-core machine can take well over the usual second or two.
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null)
      throw new Error(`server exited with ${child.exitCode}:\n${printed}`);
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok)
        return { baseUrl, child, output: () => printed };
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  child.kill('SIGKILL');
  throw new Error(`server did not become healthy:\n${printed}`);
}

/** Kills the process without letting it shut down cleanly, as a crash or power cut would. */
export async function killHard(server: ServerProcess): Promise<void> {
  if (server.child.exitCode !== null) return;
  const exited = new Promise((resolve) => server.child.once('exit', resolve));
  server.child.kill('SIGKILL');
  await exited;
}
