import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createStorageTestApp, STORAGES, type StorageUnderTest } from './support/storages';
import { createUser, type TestUser } from './support/users';

describe('uploads when the S3 store cannot be reached', () => {
  const bucket = STORAGES.find((storage) => storage.name.startsWith('S3')) as StorageUnderTest;
  let testApp: TestApp;
  let owner: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());
  const upload = (bytes: Buffer, name: string) =>
    http()
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth)
      .attach('file', bytes, name);

  beforeAll(async () => {
    testApp = await createStorageTestApp(bucket);
    owner = await createUser(testApp.app, ['designer'], 'owner');
    calculationId = (
      await http()
        .post('/api/calculations')
        .set(owner.auth)
        .send({ title: 'Outage', kind: 'lift-check', inputs: liftCheckInputs() })
    ).body.id;
  });

  afterAll(async () => {
    await testApp.close();
    await bucket.stop();
  });

  it('answers 503, not 500, and records nothing; a removal still removes the record', async () => {
    const kept = await upload(Buffer.from('time_s,scale_kg\n0,0.500\n'), 'before.csv');
    expect(kept.status).toBe(201);

    await bucket.stop();

    const read = await http().get(kept.body.contentUrl).set(owner.auth);
    expect(read.status).toBe(503);
    expect(read.body.message).toMatch(/file store cannot be reached/);

    const refused = await upload(Buffer.from('time_s,scale_kg\n0,0.600\n'), 'during.csv');
    expect(refused.status).toBe(503);
    const listed = await http()
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth);
    expect(listed.body.map((file: { fileName: string }) => file.fileName)).toEqual(['before.csv']);

    // The record goes; its bytes stay behind unreferenced, as after a crash.
    expect((await http().delete(`/api/attachments/${kept.body.id}`).set(owner.auth)).status).toBe(
      204,
    );
  });
});
