import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { createUser, type TestUser } from './support/users';

/** A flight to burst: the heaviest kind the engine recomputes on import. */
const flightInputs = (payloadMassKg: number) => ({
  envelope: { kind: 'extensible', launchDiameterM: 1.55, burstDiameterM: 5.8 },
  envelopeMassKg: 0.5,
  payloadMassKg,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 4, temperatureOffsetK: -3 },
  parachute: { areaM2: 0.9 },
});

/** About 240 kB of JSON nested 120,000 levels deep. */
const DEEP_BODY = `${'['.repeat(120_000)}${']'.repeat(120_000)}`;

describe('the health check answers while costly requests are in flight', () => {
  let testApp: TestApp;
  let baseUrl: string;
  let designer: TestUser;
  let importFile: { versions: unknown[] };

  beforeAll(async () => {
    // A real password cost, so each sign-in is work for the server.
    testApp = await createTestApp({ env: { SCRYPT_COST: '15' } });
    await testApp.app.listen(0, '127.0.0.1');
    const { port } = testApp.app.getHttpServer().address() as AddressInfo;
    baseUrl = `http://127.0.0.1:${port}`;
    designer = await createUser(testApp.app, ['designer'], 'loader');
    const created = await post('/api/calculations', {
      title: 'Load',
      kind: 'flight-profile',
      inputs: flightInputs(0.62),
    });
    expect(created.status).toBe(201);
    const { id } = (await created.json()) as { id: string };
    const exported = await fetch(`${baseUrl}/api/calculations/${id}/export`, {
      headers: designer.auth,
    });
    const file = (await exported.json()) as { versions: { inputs: unknown }[] };
    const [first] = file.versions;
    // The largest file an import takes: 100 versions, each recomputed.
    importFile = {
      ...file,
      versions: Array.from({ length: 100 }, (_, index) => ({
        ...first,
        number: index + 1,
        inputs: flightInputs(0.4 + index / 500),
      })),
    };
  }, 120_000);

  afterAll(async () => {
    await testApp.close();
  });

  const post = (path: string, body: unknown, raw = false) =>
    fetch(`${baseUrl}${path}`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', ...designer.auth },
      body: raw ? (body as string) : JSON.stringify(body),
    });

  it('answers before deep bodies, parallel sign-ins and a 100-version import have all finished', async () => {
    const finished: Record<string, number> = {};
    const timed = async (name: string, work: Promise<Response>) => {
      const response = await work;
      finished[name] = performance.now();
      return response.status;
    };
    const load = [
      ...Array.from({ length: 6 }, (_, index) =>
        timed(`deep-${index}`, post('/api/calculations', DEEP_BODY, true)),
      ),
      ...Array.from({ length: 8 }, (_, index) =>
        timed(
          `sign-in-${index}`,
          fetch(`${baseUrl}/api/auth/login`, {
            method: 'POST',
            headers: { 'Content-Type': 'application/json' },
            body: JSON.stringify({ email: designer.email, password: 'not the password at all' }),
          }),
        ),
      ),
      timed('import', post('/api/calculations/import', importFile)),
    ];
    const health = await timed('health', fetch(`${baseUrl}/api/health`));
    const statuses = await Promise.all(load);

    expect(health).toBe(200);
    // Each costly request got its proper answer: refused, wrong password, imported.
    expect(statuses.slice(0, 6)).toEqual(Array(6).fill(400));
    expect(statuses.slice(6, 14)).toEqual(Array(8).fill(401));
    expect(statuses[14]).toBe(201);
    const healthAt = finished.health ?? Infinity;
    expect(healthAt).toBeLessThan(finished.import ?? 0);
    expect(healthAt).toBeLessThan(
      Math.max(
        ...Object.keys(finished).flatMap((name) =>
          name.startsWith('sign-in') ? [finished[name] ?? 0] : [],
        ),
      ),
    );
  }, 120_000);
});
