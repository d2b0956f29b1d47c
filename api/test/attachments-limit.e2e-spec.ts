import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

// Its own file: the environment is read once per test file, and this one sets a small limit.
const LIMIT_BYTES = 4096;

describe('the upload size limit (UPLOAD_MAX_BYTES)', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let calculationId: string;

  beforeAll(async () => {
    testApp = await createTestApp({ env: { UPLOAD_MAX_BYTES: String(LIMIT_BYTES) } });
    owner = await createUser(testApp.app, ['designer']);
    const created = await request(testApp.app.getHttpServer())
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Logger dump', kind: 'lift-check', inputs: liftCheckInputs() });
    calculationId = created.body.id;
  });

  afterAll(async () => {
    await testApp.close();
  });

  const csvOf = (bytes: number) => {
    const line = '3600,0.214\n';
    return Buffer.from(`time_s,scale_kg\n${line.repeat(Math.ceil(bytes / line.length))}`).subarray(
      0,
      bytes,
    );
  };

  it('accepts a file at the limit', async () => {
    const response = await request(testApp.app.getHttpServer())
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth)
      .attach('file', csvOf(LIMIT_BYTES), 'at-limit.csv');
    expect(response.status).toBe(201);
    expect(response.body.sizeBytes).toBe(LIMIT_BYTES);
  });

  it('answers 413 for one byte more, saying the limit and the setting', async () => {
    const response = await request(testApp.app.getHttpServer())
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth)
      .attach('file', csvOf(LIMIT_BYTES + 1), 'too-big.csv');
    expect(response.status).toBe(413);
    expect(response.body).toMatchObject({ field: 'file', limitBytes: LIMIT_BYTES });
    expect(response.body.message).toMatch(
      /^file is larger than the 4 kB an upload may be \(UPLOAD_MAX_BYTES\)\.$/,
    );
    const listed = await request(testApp.app.getHttpServer())
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth);
    expect(listed.body.map((item: { fileName: string }) => item.fileName)).toEqual([
      'at-limit.csv',
    ]);
  });
});
