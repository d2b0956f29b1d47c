import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser } from './support/users';

// In a file of its own: the environment is read once per file, when the app module loads.
describe('rate limits on the routes that cost the server or invite guessing', () => {
  let testApp: TestApp;
  const http = () => request(testApp.app.getHttpServer());
  beforeAll(async () => {
    testApp = await createTestApp({
      env: {
        LOGIN_RATE_LIMIT: '2',
        REGISTER_RATE_LIMIT: '2',
        CLASS_JOIN_RATE_LIMIT: '2',
        EVALUATE_RATE_LIMIT: '2',
      },
    });
  });
  afterAll(async () => {
    await testApp.close();
  });

  const statuses = async (send: () => Promise<{ status: number }>, times: number) => {
    const seen: number[] = [];
    for (let index = 0; index < times; index += 1) seen.push((await send()).status);
    return seen;
  };

  it('limits registrations per address', async () => {
    let counter = 0;
    const seen = await statuses(
      () =>
        http()
          .post('/api/auth/register')
          .send({
            email: `many${(counter += 1)}@example.org`,
            password: 'a long enough password',
            displayName: 'Many',
          }),
      3,
    );
    // The first makes the first account; the second is mailed a link; the third is one too many.
    expect(seen).toEqual([201, 202, 429]);
  });

  it('limits reset confirmations per address', async () => {
    const seen = await statuses(
      () =>
        http()
          .post('/api/auth/password-reset/confirm')
          .send({ token: 'x'.repeat(43), password: 'a long enough password' }),
      3,
    );
    expect(seen.slice(0, 2).every((status) => status >= 400 && status < 429)).toBe(true);
    expect(seen[2]).toBe(429);
  });

  it('limits class joins per address', async () => {
    const student = await createUser(testApp.app, ['student'], 'joiner');
    const seen = await statuses(
      () => http().post('/api/classes/join').set(student.auth).send({ code: 'ABCD-EFGH' }),
      3,
    );
    expect(seen.slice(0, 2).every((status) => status === 404 || status === 400)).toBe(true);
    expect(seen[2]).toBe(429);
  });

  it('limits engine evaluations per address', async () => {
    const seen = await statuses(
      () => http().post('/api/evaluate').send({ kind: 'lift-check', inputs: liftCheckInputs() }),
      3,
    );
    expect(seen).toEqual([200, 200, 429]);
  });
});
