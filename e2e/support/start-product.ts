import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { API_ENTRY, REPO_ROOT } from './paths.js';

export interface RunningProduct {
  readonly baseUrl: string;
  readonly port: number;
  readonly dataDir: string;
  /** Everything the server printed so far. */
  output(): string;
  stop(): Promise<void>;
}

async function findFreePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

async function waitForHealth(baseUrl: string, child: ChildProcess, output: () => string) {
  const deadline = Date.now() + 45_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      throw new Error(`The product exited with code ${child.exitCode}:\n${output()}`);
    }
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`The product did not become healthy within 45 s:\n${output()}`);
}

/**
 * Starts the built product as `npm start` runs it (node api/dist/main.js), on a free port with a
 * fresh data directory, and waits until its health endpoint answers.
 */
export async function startProduct(): Promise<RunningProduct> {
  const port = await findFreePort();
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-e2e-'));
  const child = spawn(process.execPath, [API_ENTRY], {
    cwd: REPO_ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATA_DIR: dataDir,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  // A test that times out before it can call stop() must not leave the product running.
  const killOnExit = () => {
    if (child.exitCode === null) child.kill('SIGKILL');
  };
  process.once('exit', killOnExit);
  child.once('exit', () => process.off('exit', killOnExit));
  let printed = '';
  child.stdout?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (printed += chunk.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;

  const stop = async () => {
    if (child.exitCode === null) {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      // A product stuck in its shutdown is killed rather than waited for.
      const stuck = setTimeout(() => child.kill('SIGKILL'), 15_000);
      await exited;
      clearTimeout(stuck);
    }
    rmSync(dataDir, { recursive: true, force: true });
  };

  try {
    await waitForHealth(baseUrl, child, () => printed);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, port, dataDir, output: () => printed, stop };
}
