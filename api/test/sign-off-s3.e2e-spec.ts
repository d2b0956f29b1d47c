import { createHash } from 'node:crypto';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createStorageTestApp, STORAGES, type StorageUnderTest } from './support/storages';
import { createUser } from './support/users';

const sha = (bytes: Buffer): string => createHash('sha256').update(bytes).digest('hex');

describe('the archived sign-off PDF with STORAGE_URL set', () => {
  const bucket = STORAGES.find((storage) => storage.name.startsWith('S3')) as StorageUnderTest;
  let testApp: TestApp;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createStorageTestApp(bucket);
  });

  afterAll(async () => {
    await testApp.close();
    await bucket.stop();
  });

  it('is kept in the bucket and served back from it once a version is approved', async () => {
    const designer = await createUser(testApp.app, ['designer'], 'author');
    const reviewer = await createUser(testApp.app, ['reviewer'], 'checker');
    const created = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .send({ title: 'Bucket sheet', kind: 'lift-check', inputs: liftCheckInputs() });
    expect(created.status).toBe(201);
    const calculationId = created.body.id as string;
    await http()
      .post(`/api/calculations/${calculationId}/versions/1/submit`)
      .set(designer.auth)
      .send({});
    const approved = await http()
      .post(`/api/calculations/${calculationId}/versions/1/approve`)
      .set(reviewer.auth)
      .send({ comment: 'Checked against the weigh-off.' });
    expect(approved.status).toBe(200);

    const files = await http()
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(designer.auth);
    const sheet = files.body.find(
      (file: { versionNumber: number | null }) => file.versionNumber === 1,
    );
    expect(sheet).toMatchObject({ mediaType: 'application/pdf' });
    const content = await http()
      .get(sheet.contentUrl)
      .set(designer.auth)
      .buffer(true)
      .parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(content.status).toBe(200);
    const pdf = content.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(sha(pdf)).toBe(sheet.sha256);

    // In the bucket, and nothing kept under the local upload folder but (empty) staging.
    expect(await bucket.objects(testApp.dataDir).hashes()).toContain(sheet.sha256);
    const uploads = join(testApp.dataDir, 'uploads');
    expect(existsSync(uploads) ? readdirSync(uploads) : []).toEqual([]);
  });
});
