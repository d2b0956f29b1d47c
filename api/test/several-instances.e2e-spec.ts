import { createHmac, randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, rmSync, unlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { killHard, startServerProcess, type ServerProcess } from './support/server-process';

/** The sign-in bucket's limit on both instances: small, so the count is quick to exhaust. */
const SIGN_IN_LIMIT = 5;

const PASSWORD = 'a long enough password';

/**
 * Two API processes on one SQLite file, as two instances behind a load balancer: whatever one
 * decides (a sign-out, a rate-limit count, the signing key, the first admin) the other must see.
 */
describe('several API instances on one database', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-instances-'));
  const env = { LOGIN_RATE_LIMIT: String(SIGN_IN_LIMIT), REGISTER_RATE_LIMIT: '100' };
  let a: ServerProcess | undefined;
  let b: ServerProcess | undefined;
  /** The racer that became the first account (and admin). */
  let adminEmail = '';
  const urlA = (): string => a?.baseUrl ?? '';
  const urlB = (): string => b?.baseUrl ?? '';

  beforeAll(async () => {
    // One after the other: the first start runs the migrations (docs/deployment.md).
    a = await startServerProcess(dataDir, env);
    b = await startServerProcess(dataDir, env);
  }, 200_000);

  afterAll(async () => {
    if (a) await killHard(a);
    if (b) await killHard(b);
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('makes exactly one admin of six registrations racing across both instances', async () => {
    const answers = await Promise.all(
      Array.from({ length: 6 }, (_, index) =>
        request(index % 2 === 0 ? urlA() : urlB())
          .post('/api/auth/register')
          .send({
            email: `racer${index}@example.org`,
            password: PASSWORD,
            displayName: `R${index}`,
          }),
      ),
    );
    expect(answers.map((answer) => answer.status).sort()).toEqual([201, 202, 202, 202, 202, 202]);
    const first = answers.find((answer) => answer.status === 201);
    expect(first?.body.user.roles).toContain('admin');
    adminEmail = first?.body.user.email as string;
    // Only the first was created; the others wait for their mailed link, so one admin in all.
    const users = await request(urlB())
      .get('/api/admin/users')
      .set('Authorization', `Bearer ${first?.body.accessToken}`);
    expect(users.status).toBe(200);
    const admins = (users.body as { roles: string[] }[]).filter((user) =>
      user.roles.includes('admin'),
    );
    expect(admins).toHaveLength(1);
  }, 60_000);

  it('accepts on B a token signed by A, with no key file in the data folder', async () => {
    const token = await signIn(urlA());
    const me = await request(urlB()).get('/api/auth/me').set('Authorization', `Bearer ${token}`);
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(adminEmail);
    expect(existsSync(join(dataDir, 'jwt-secret'))).toBe(false);
  });

  it('refuses on B a token signed out on A', async () => {
    const token = await signIn(urlB());
    const auth = { Authorization: `Bearer ${token}` };
    expect((await request(urlB()).get('/api/auth/me').set(auth)).status).toBe(200);
    expect((await request(urlA()).post('/api/auth/logout').set(auth)).status).toBe(204);
    const after = await request(urlB()).get('/api/auth/me').set(auth);
    expect(after.status).toBe(401);
    expect(after.body.message).toMatch(/session has ended/);
  });

  it('counts one client’s sign-in attempts on A and B together: 3 on A, then the 6th on B is 429', async () => {
    const ask = (url: string) =>
      request(url).post('/api/auth/password-reset/request').send({ email: 'no@example.org' });
    const onA = [await ask(urlA()), await ask(urlA()), await ask(urlA())];
    const onB = [await ask(urlB()), await ask(urlB()), await ask(urlB())];
    expect([...onA, ...onB].map((answer) => answer.status)).toEqual([202, 202, 202, 202, 202, 429]);
    // B's first answer already counts A's three: 5 allowed − 4 made = 1 left.
    expect(onB[0]?.headers['x-ratelimit-limit-sign-in']).toBe(String(SIGN_IN_LIMIT));
    expect(onB[0]?.headers['x-ratelimit-remaining-sign-in']).toBe('1');
    const retryAfterS = Number(onB[2]?.headers['retry-after-sign-in']);
    expect(retryAfterS).toBeGreaterThan(0);
    expect(retryAfterS).toBeLessThanOrEqual(60);
  });

  it('lets exactly the limit through when one client’s requests race on both instances', async () => {
    const answers = await Promise.all(
      Array.from({ length: 12 }, (_, index) =>
        request(index % 2 === 0 ? urlA() : urlB())
          .post('/api/auth/password-reset/confirm')
          .send({ token: `not-a-token-${index}`, password: PASSWORD }),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    expect(statuses.filter((status) => status === 429)).toHaveLength(12 - SIGN_IN_LIMIT);
    expect(statuses.filter((status) => status === 400)).toHaveLength(SIGN_IN_LIMIT);
  }, 60_000);

  /** A fresh token of the first admin, signed in on the instance at `url`. */
  async function signIn(url: string): Promise<string> {
    const answer = await request(url)
      .post('/api/auth/login')
      .send({ email: adminEmail, password: PASSWORD });
    expect(answer.status).toBe(200);
    return answer.body.accessToken as string;
  }
});

describe('upgrading from a key file in the data folder', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-key-import-'));
  let server: ServerProcess | undefined;

  afterAll(async () => {
    if (server) await killHard(server);
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('imports the old key once, so tokens it signed stay valid after the file is gone', async () => {
    const oldKey = randomBytes(48).toString('base64url');
    writeFileSync(join(dataDir, 'jwt-secret'), `${oldKey}\n`, { mode: 0o600 });
    server = await startServerProcess(dataDir);
    const registered = await request(server.baseUrl)
      .post('/api/auth/register')
      .send({ email: 'keeper@example.org', password: PASSWORD, displayName: 'Keeper' });
    expect(registered.status).toBe(201);
    const token = registered.body.accessToken as string;
    // HS256 (RFC 7518 §3.2): the signature is HMAC-SHA256 of "header.payload" under the key.
    const [header, payload, signature] = token.split('.');
    const expected = createHmac('sha256', oldKey)
      .update(`${header}.${payload}`)
      .digest('base64url');
    expect(signature).toBe(expected);

    await killHard(server);
    unlinkSync(join(dataDir, 'jwt-secret'));
    server = await startServerProcess(dataDir);
    const me = await request(server.baseUrl)
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${token}`);
    expect(me.status).toBe(200);
    expect(existsSync(join(dataDir, 'jwt-secret'))).toBe(false);
  }, 200_000);
});
