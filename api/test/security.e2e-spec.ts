import { existsSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { registerThroughMail } from './support/users';
import { createTestApp, type TestApp } from './support/create-test-app';

describe('security defaults', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('keeps CORS closed unless CORS_ORIGINS names an origin', async () => {
    const preflight = await request(testApp.app.getHttpServer())
      .options('/api/calculations')
      .set('Origin', 'https://elsewhere.example')
      .set('Access-Control-Request-Method', 'POST');
    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('generates the signing key on first start into the database, not a file, when JWT_SECRET is unset', async () => {
    // Every API instance on the database signs with this one key (docs/deployment.md).
    const { DataSource } = await import('typeorm');
    const rows: { value: string }[] = await testApp.app
      .get(DataSource)
      .createQueryBuilder()
      .select('setting.value', 'value')
      .from('app_setting', 'setting')
      .where('setting.key = :key', { key: 'jwt-secret' })
      .getRawMany();
    expect(rows).toHaveLength(1);
    expect(rows[0]?.value.length).toBeGreaterThanOrEqual(48);
    expect(existsSync(join(testApp.dataDir, 'jwt-secret'))).toBe(false);
  });

  it('answers an unexpected failure with a 500 that carries no internals', async () => {
    // The audit listing with an impossible date range is fine; a broken database is not.
    const { DataSource } = await import('typeorm');
    await testApp.app
      .get(DataSource)
      .query('ALTER TABLE "calculation" RENAME TO "calculation_gone"');
    const register = await registerThroughMail(testApp.app, {
      email: 'a@b.org',
      password: 'long-enough-pw',
      displayName: 'A',
    });
    const token = register.body.accessToken as string;
    const response = await request(testApp.app.getHttpServer())
      .get('/api/calculations')
      .set('Authorization', `Bearer ${token}`);
    expect(response.status).toBe(500);
    expect(response.body).toEqual({
      statusCode: 500,
      error: 'Internal Server Error',
      message: 'Something went wrong on the server; it has been logged.',
    });
    await testApp.app
      .get(DataSource)
      .query('ALTER TABLE "calculation_gone" RENAME TO "calculation"');
  });

  it('documents the API with OpenAPI at /api/docs', async () => {
    const spec = await request(testApp.app.getHttpServer()).get('/api/docs-json');
    expect(spec.status).toBe(200);
    for (const path of [
      '/api/auth/login',
      '/api/calculations',
      '/api/calculations/{id}/versions',
      '/api/evaluate',
      '/api/verify/{fingerprint}',
      '/api/reviews/queue',
    ]) {
      expect(Object.keys(spec.body.paths)).toContain(path);
    }
    expect((await request(testApp.app.getHttpServer()).get('/api/docs')).status).toBe(200);
  });
});
