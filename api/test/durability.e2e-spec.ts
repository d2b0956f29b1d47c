import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { liftCheckInputs } from './support/fixtures';
import { killHard, startServerProcess, type ServerProcess } from './support/server-process';

async function json(response: Response): Promise<Record<string, unknown>> {
  return (await response.json()) as Record<string, unknown>;
}

describe('durability: acknowledged saves survive SIGKILL', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-durability-'));
  let server: ServerProcess | undefined;

  afterAll(async () => {
    if (server) await killHard(server);
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('finds every acknowledged version intact after the server is killed and restarted', async () => {
    server = await startServerProcess(dataDir);
    const post = (path: string, body: unknown, token?: string) =>
      fetch(`${server?.baseUrl}${path}`, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json',
          ...(token ? { Authorization: `Bearer ${token}` } : {}),
        },
        body: JSON.stringify(body),
      });
    const registered = await json(
      await post('/api/auth/register', {
        email: 'keeper@example.org',
        password: 'keep-it-safe',
        displayName: 'Keeper',
      }),
    );
    const token = String(registered.accessToken);
    const created = await json(
      await post(
        '/api/calculations',
        { title: 'Durable', kind: 'lift-check', inputs: liftCheckInputs() },
        token,
      ),
    );
    const id = String(created.id);
    const acknowledged = new Map<number, string>([
      [1, String((created.latest as { fingerprint: string }).fingerprint)],
    ]);
    // Saves fired back to back; the kill comes right after the last acknowledgement.
    for (let base = 1; base <= 25; base += 1) {
      const response = await post(
        `/api/calculations/${id}/versions`,
        { baseVersion: base, inputs: liftCheckInputs({ payloadMassKg: 0.2 + base / 1000 }) },
        token,
      );
      expect(response.status).toBe(201);
      const version = await json(response);
      acknowledged.set(Number(version.number), String(version.fingerprint));
    }
    await killHard(server);

    server = await startServerProcess(dataDir);
    const signedIn = await json(
      await post('/api/auth/login', { email: 'keeper@example.org', password: 'keep-it-safe' }),
    );
    const detail = await json(
      await fetch(`${server.baseUrl}/api/calculations/${id}`, {
        headers: { Authorization: `Bearer ${String(signedIn.accessToken)}` },
      }),
    );
    const stored = new Map(
      (detail.versions as { number: number; fingerprint: string }[]).map((version) => [
        version.number,
        version.fingerprint,
      ]),
    );
    expect(stored.size).toBe(acknowledged.size);
    for (const [number, fingerprint] of acknowledged)
      expect(stored.get(number), `version ${number}`).toBe(fingerprint);
    expect(detail.latestVersion).toBe(26);
  }, 180_000); // two server starts and a kill on a busy 2-core machine take longer than 20 s
});
