import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';

// In a file of its own: the environment is read once per file, when the app module loads.
describe('rate limits behind a trusted proxy count each forwarded client on its own', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp({ env: { TRUST_PROXY: 'loopback', LOGIN_RATE_LIMIT: '2' } });
  });
  afterAll(async () => {
    await testApp.close();
    delete process.env.TRUST_PROXY;
  });

  const signIn = (forwardedFor: string) =>
    request(testApp.app.getHttpServer())
      .post('/api/auth/login')
      .set('X-Forwarded-For', forwardedFor)
      .send({ email: 'nobody@example.org', password: 'not a password at all' });

  it('limits one forwarded address without limiting another', async () => {
    const first = [];
    for (let attempt = 0; attempt < 3; attempt += 1)
      first.push((await signIn('203.0.113.7')).status);
    expect(first).toEqual([401, 401, 429]);
    expect((await signIn('198.51.100.9')).status).toBe(401);
  });
});
