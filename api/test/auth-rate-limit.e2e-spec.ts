import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';

// In a file of its own: the environment is read once per file, when the app module loads.
describe('sign-in rate limit', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp({ env: { LOGIN_RATE_LIMIT: '3' } });
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('answers 429 after the allowed attempts in a minute', async () => {
    const statuses: number[] = [];
    for (let attempt = 0; attempt < 5; attempt += 1) {
      const response = await request(testApp.app.getHttpServer())
        .post('/api/auth/login')
        .send({ email: 'x@example.org', password: 'whatever-it-is' });
      statuses.push(response.status);
    }
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses.slice(3)).toEqual([429, 429]);
  });
});
