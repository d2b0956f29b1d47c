// Throughput and latency of the API on loopback with 10,000 calculations stored, measured with
// autocannon against the built server. Prints ratios to a bare health check run in the same
// session; a measurement, not a test.
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import Database from 'better-sqlite3';

const SERVER = fileURLToPath(new URL('../dist/main.js', import.meta.url));
const CALCULATIONS = 10_000;
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 8);
const CONNECTIONS = 10;

const freePort = () =>
  new Promise((resolve) => {
    const server = createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });

async function start(dataDir) {
  const port = await freePort();
  const child = spawn(process.execPath, [SERVER], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      DATA_DIR: dataDir,
      SEED_DEMO: '0',
      LOGIN_RATE_LIMIT: '10000',
    },
    stdio: 'ignore',
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  for (let attempt = 0; attempt < 300; attempt += 1) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return { child, baseUrl };
    } catch {
      // starting
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error('server did not start');
}

const stop = (child) =>
  new Promise((resolve) => {
    child.once('exit', resolve);
    child.kill('SIGTERM');
  });

const inputs = (payloadMassKg) => ({
  envelope: { shape: 'sphere', diameterM: 1.4 },
  envelopeMass: { kind: 'fixed', massKg: 0.2 },
  payloadMassKg,
  gas: { gasId: 'helium' },
  ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
});

/** Inputs of a flight to burst, the heaviest kind an import recomputes. */
const flightInputs = (payloadMassKg) => ({
  envelope: { kind: 'extensible', launchDiameterM: 1.55, burstDiameterM: 5.8 },
  envelopeMassKg: 0.5,
  payloadMassKg,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 4, temperatureOffsetK: -3 },
  parachute: { areaM2: 0.9 },
});

/**
 * Health-check latency while costly requests keep arriving: rounds of 8 parallel sign-ins (a wrong
 * password, hashed all the same), 4 bodies nested 120,000 levels deep and one import of the
 * largest file allowed (100 flight versions), one round after another until the measurement ends.
 */
async function healthUnderLoad(baseUrl, auth, run) {
  const post = (path, body, headers = auth) =>
    fetch(`${baseUrl}${path}`, { method: 'POST', headers, body });
  const created = await (
    await post(
      '/api/calculations',
      JSON.stringify({ title: 'Load', kind: 'flight-profile', inputs: flightInputs(0.62) }),
    )
  ).json();
  const file = await (
    await fetch(`${baseUrl}/api/calculations/${created.id}/export`, { headers: auth })
  ).json();
  const importBody = JSON.stringify({
    ...file,
    versions: Array.from({ length: 100 }, (_, index) => ({
      ...file.versions[0],
      number: index + 1,
      inputs: flightInputs(0.4 + index / 500),
    })),
  });
  const deepBody = `${'['.repeat(120_000)}${']'.repeat(120_000)}`;
  const wrongSignIn = JSON.stringify({ email: 'bench@example.org', password: 'not the password' });
  let running = true;
  let rounds = 0;
  const loop = (async () => {
    while (running) {
      await Promise.all([
        ...Array.from({ length: 8 }, () =>
          post('/api/auth/login', wrongSignIn, { 'Content-Type': 'application/json' }),
        ),
        ...Array.from({ length: 4 }, () => post('/api/calculations', deepBody)),
        post('/api/calculations/import', importBody),
      ]);
      rounds += 1;
    }
  })();
  const health = await run('GET /api/health under load', { url: `${baseUrl}/api/health` });
  running = false;
  await loop;
  return { health, rounds };
}

const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-bench-'));
try {
  // 1. Create the schema and one real calculation through the API.
  let server = await start(dataDir);
  const json = { 'Content-Type': 'application/json' };
  const registered = await (
    await fetch(`${server.baseUrl}/api/auth/register`, {
      method: 'POST',
      headers: json,
      body: JSON.stringify({
        email: 'bench@example.org',
        password: 'bench-password',
        displayName: 'Bench',
      }),
    })
  ).json();
  const auth = { ...json, Authorization: `Bearer ${registered.accessToken}` };
  const template = await (
    await fetch(`${server.baseUrl}/api/calculations`, {
      method: 'POST',
      headers: auth,
      body: JSON.stringify({
        title: 'Template',
        kind: 'lift-check',
        inputs: inputs(0.3),
        visibility: 'team',
      }),
    })
  ).json();
  await stop(server.child);

  // 2. Copy it 10,000 times straight into SQLite (as many teams' worth of work).
  const db = new Database(join(dataDir, 'loftwright.sqlite'));
  const version = db
    .prepare('SELECT * FROM calculation_version WHERE calculation_id = ?')
    .get(template.id);
  const insertCalculation = db.prepare(
    `INSERT INTO calculation (id, title, kind, owner_id, visibility, tags, latest_version, latest_status, ever_submitted) VALUES (?, ?, 'lift-check', ?, 'team', '["bench"]', 1, 'draft', 0)`,
  );
  const insertVersion = db.prepare(
    `INSERT INTO calculation_version (id, calculation_id, number, inputs, outputs, steps, warnings, series, engine_version, author_id, note, fingerprint, status) VALUES (?, ?, 1, ?, ?, ?, ?, NULL, ?, ?, '', ?, 'draft')`,
  );
  const ids = [];
  db.transaction(() => {
    for (let index = 0; index < CALCULATIONS; index += 1) {
      const id = randomUUID();
      ids.push(id);
      insertCalculation.run(id, `Envelope ${index}`, registered.user.id);
      insertVersion.run(
        randomUUID(),
        id,
        version.inputs,
        version.outputs,
        version.steps,
        version.warnings,
        version.engine_version,
        registered.user.id,
        version.fingerprint,
      );
    }
  })();
  db.close();

  // 3. Measure.
  server = await start(dataDir);
  // Each run names its full URL: autocannon takes no top-level path, and would measure `/`.
  const run = (title, options) =>
    autocannon({
      url: server.baseUrl,
      connections: CONNECTIONS,
      duration: DURATION_S,
      ...options,
      title,
    });
  const health = await run('GET /api/health', { url: `${server.baseUrl}/api/health` });
  const list = await run('GET /api/calculations (10,000 stored)', {
    url: `${server.baseUrl}/api/calculations?page=3&pageSize=20&sort=-updatedAt`,
    headers: auth,
  });
  let next = 0;
  const save = await run('POST /api/calculations/:id/versions', {
    method: 'POST',
    headers: auth,
    requests: [
      {
        setupRequest: (request) => ({
          ...request,
          path: `/api/calculations/${ids[next++ % ids.length]}/versions`,
          body: JSON.stringify({ baseVersion: 1, inputs: inputs(0.31), note: 'bench' }),
        }),
      },
    ],
  });
  // Two at a time, as many as hash at once: the figure is one sign-in's cost, not a queue's.
  const signIn = await run('POST /api/auth/login (right password, 2 connections)', {
    url: `${server.baseUrl}/api/auth/login`,
    connections: 2,
    method: 'POST',
    headers: json,
    body: JSON.stringify({ email: 'bench@example.org', password: 'bench-password' }),
  });
  const loaded = await healthUnderLoad(server.baseUrl, auth, run);
  await stop(server.child);

  const errors = (result) => result.non2xx + result.errors;
  const line = (result) =>
    `${result.title}: ${result.requests.average.toFixed(0)} req/s, p95 ${result.latency.p97_5 === undefined ? '?' : ''}${(result.latency.p95 ?? result.latency.p97_5).toFixed(1)} ms, ${errors(result)} failed${errors(result) ? ` (statuses ${JSON.stringify(result.statusCodeStats)})` : ''}`;
  console.log(
    `\nLoftwright API benchmark: ${CALCULATIONS} calculations, ${CONNECTIONS} connections, ${DURATION_S} s per route, Node ${process.version}`,
  );
  for (const result of [health, list, save, signIn, loaded.health]) console.log(line(result));
  console.log(
    `  (load beside the last: ${loaded.rounds} rounds of 8 sign-ins, 4 bodies nested 120,000 deep and a 100-version flight import)`,
  );
  const listRatio = list.requests.average / health.requests.average;
  const p95 = (result) => result.latency.p95 ?? result.latency.p97_5;
  console.log(
    `${listRatio >= 0.5 ? 'meets ' : 'MISSES'}  list / health rate: ${listRatio.toFixed(2)} (goal >= 0.5)`,
  );
  console.log(
    `${p95(list) < 25 ? 'meets ' : 'MISSES'}  list p95: ${p95(list).toFixed(1)} ms (goal < 25 ms)`,
  );
  console.log(
    `${p95(save) < 25 ? 'meets ' : 'MISSES'}  save p95: ${p95(save).toFixed(1)} ms (goal < 25 ms)`,
  );
  console.log(
    `${p95(loaded.health) < 250 ? 'meets ' : 'MISSES'}  health p95 under load: ${p95(loaded.health).toFixed(1)} ms (goal < 250 ms)`,
  );
  console.log(`for information  sign-in p95: ${p95(signIn).toFixed(1)} ms`);
  console.log(
    `for information  save / health rate: ${(save.requests.average / health.requests.average).toFixed(2)}`,
  );
  // Saves that 409 would mean the rotation reused a calculation: report them plainly.
  if (errors(save) > 0 || errors(list) > 0)
    console.log('note: some requests failed; see the counts above');
} finally {
  rmSync(dataDir, { recursive: true, force: true });
}
