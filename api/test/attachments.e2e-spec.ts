import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { OBJECT_STORE, type ObjectStore } from '../src/storage/object-store';
import { createStorageTestApp, STORAGES, type StoredObjects } from './support/storages';
import { createUser, type TestUser } from './support/users';

// A 1×1 PNG (the smallest valid image: signature, IHDR, IDAT, IEND).
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);
const PDF = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
const CSV = Buffer.from('time_s,scale_kg\n0,0.210\n3600,0.214\n7200,0.219\n');
// A ZIP's local file header: what a renamed .docx or .zip starts with.
const ZIP = Buffer.concat([
  Buffer.from('504b0304140000000800', 'hex'),
  Buffer.alloc(30, 1),
  Buffer.from('payload.txt'),
]);
// A Windows executable's DOS header.
const EXE = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(62, 0), Buffer.from('PE\0\0')]);
const sha = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

// The same cases on the local folder and on S3 (a local fake server).
describe.each(STORAGES)('attachments, stored in the $name', (storage) => {
  let testApp: TestApp;
  let stored: StoredObjects;
  let owner: TestUser;
  let otherDesigner: TestUser;
  let reviewer: TestUser;
  let admin: TestUser;
  let calculationId: string;
  const server = () => testApp.app.getHttpServer();
  const upload = (user: TestUser, bytes: Buffer, name: string, type = 'application/octet-stream') =>
    request(server())
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(user.auth)
      .attach('file', bytes, { filename: name, contentType: type });

  beforeAll(async () => {
    testApp = await createStorageTestApp(storage);
    stored = storage.objects(testApp.dataDir);
    owner = await createUser(testApp.app, ['designer'], 'owner');
    otherDesigner = await createUser(testApp.app, ['designer'], 'other');
    reviewer = await createUser(testApp.app, ['reviewer'], 'reviewer');
    admin = await createUser(testApp.app, ['admin'], 'admin');
    const created = await request(server()).post('/api/calculations').set(owner.auth).send({
      title: 'Rig photos',
      kind: 'lift-check',
      inputs: liftCheckInputs(),
      visibility: 'team',
    });
    expect(created.status).toBe(201);
    calculationId = created.body.id;
  });

  afterAll(async () => {
    await testApp.close();
    await storage.stop();
  });

  it('stores a photo by its content hash, keeping only the name of a path-like file name', async () => {
    const response = await upload(owner, PNG, '../../etc/rig photo.png', 'image/png');
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({
      calculationId,
      mediaType: 'image/png',
      fileName: 'rig photo.png',
      sizeBytes: PNG.length,
      sha256: sha(PNG),
      uploadedBy: { id: owner.id },
    });
    expect(await stored.hashes()).toEqual([sha(PNG)]);
    // Nothing landed anywhere else: only the fan-out folder (or key prefix) of its hash.
    expect(await stored.topLevel()).toEqual([sha(PNG).slice(0, 2)]);
    expect(existsSync(join(testApp.dataDir, '..', 'etc'))).toBe(false);
  });

  it('goes by the content, not the name or the declared type', async () => {
    const response = await upload(owner, PNG, 'scale-readout.pdf', 'application/pdf');
    expect(response.status).toBe(201);
    expect(response.body.mediaType).toBe('image/png');
    const csv = await upload(owner, CSV, 'logger.bin', 'application/octet-stream');
    expect(csv.body.mediaType).toBe('text/csv');
    const pdf = await upload(owner, PDF, 'notes.txt', 'text/plain');
    expect(pdf.body.mediaType).toBe('application/pdf');
  });

  it('serves a file back byte for byte with headers that stop browsers running or sniffing it', async () => {
    const list = await request(server())
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth);
    const photo = list.body.find((item: { fileName: string }) => item.fileName === 'rig photo.png');
    const response = await request(server())
      .get(photo.contentUrl)
      .set(owner.auth)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(response.status).toBe(200);
    expect((response.body as Buffer).equals(PNG)).toBe(true);
    expect(response.headers['content-type']).toBe('image/png');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain('sandbox');
    expect(response.headers['content-security-policy']).toContain("default-src 'none'");
    expect(response.headers['content-disposition']).toMatch(/^inline; filename="rig photo.png"/);

    const download = await request(server()).get(`${photo.contentUrl}?download=1`).set(owner.auth);
    expect(download.headers['content-disposition']).toMatch(/^attachment;/);
  });

  it('serves an HTML page with a script as plain text, never as a page', async () => {
    const page = Buffer.from('<html><body><script>alert(document.cookie)</script></body></html>');
    const uploaded = await upload(owner, page, 'report.html', 'text/html');
    expect(uploaded.status).toBe(201);
    expect(uploaded.body.mediaType).toBe('text/plain');
    const served = await request(server()).get(uploaded.body.contentUrl).set(owner.auth);
    expect(served.headers['content-type']).toBe('text/plain; charset=utf-8');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
  });

  it.each([
    ['a ZIP archive renamed to .csv', ZIP, 'readings.csv', /application\/zip/],
    ['a Windows program renamed to .png', EXE, 'photo.png', /application\/x-msdownload/],
    [
      'random binary',
      Buffer.from([0xde, 0xad, 0xbe, 0xef, 0x00, 0x01, 0xff, 0xfe]),
      'x.dat',
      /not a type/,
    ],
  ])(
    'refuses %s with 415 naming the field and what is allowed',
    async (_label, bytes, name, reason) => {
      const response = await upload(owner, bytes, name);
      expect(response.status).toBe(415);
      expect(response.body.field).toBe('file');
      expect(response.body.message).toMatch(reason);
      expect(response.body.message).toContain('allowed are JPEG, PNG');
    },
  );

  it('answers 400 naming the field when no file or an empty one is sent', async () => {
    const none = await request(server())
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth);
    expect(none.status).toBe(400);
    expect(none.body.field).toBe('file');
    const empty = await upload(owner, Buffer.alloc(0), 'empty.csv');
    expect(empty.status).toBe(400);
    expect(empty.body.field).toBe('file');
  });

  it('lets team members see the files but only the owner or an admin add them', async () => {
    const seen = await request(server())
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(otherDesigner.auth);
    expect(seen.status).toBe(200);
    expect(seen.body.length).toBeGreaterThan(0);
    expect((await upload(otherDesigner, PNG, 'mine.png')).status).toBe(403);
    expect((await upload(reviewer, PNG, 'mine.png')).status).toBe(403);
    expect((await upload(admin, PDF, 'checked.pdf')).status).toBe(201);
  });

  it('hides files of a calculation the user may not see', async () => {
    const hidden = await request(server())
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Private', kind: 'lift-check', inputs: liftCheckInputs() });
    const file = await request(server())
      .post(`/api/calculations/${hidden.body.id}/attachments`)
      .set(owner.auth)
      .attach('file', CSV, 'private.csv');
    expect(file.status).toBe(201);
    const asOther = await request(server()).get(file.body.contentUrl).set(otherDesigner.auth);
    expect(asOther.status).toBe(404);
    const listed = await request(server())
      .get(`/api/calculations/${hidden.body.id}/attachments`)
      .set(otherDesigner.auth);
    expect(listed.status).toBe(404);
  });

  it('keeps one stored copy of the same content and removes it with its last record', async () => {
    const CSV = Buffer.from('time_s,scale_kg\n0,0.300\n86400,0.322\n');
    const first = await upload(owner, CSV, 'day1.csv');
    const second = await upload(owner, CSV, 'day1-again.csv');
    const isStored = async () => (await stored.hashes()).includes(sha(CSV));
    expect(first.body.sha256).toBe(second.body.sha256);

    // Only the uploader or an admin removes a file.
    const byOther = await request(server())
      .delete(`/api/attachments/${first.body.id}`)
      .set(otherDesigner.auth);
    expect(byOther.status).toBe(403);

    const csvRecords = async () =>
      (
        await request(server())
          .get(`/api/calculations/${calculationId}/attachments`)
          .set(owner.auth)
      ).body.filter((item: { sha256: string }) => item.sha256 === sha(CSV)).length;
    const before = await csvRecords();
    expect(
      (await request(server()).delete(`/api/attachments/${first.body.id}`).set(owner.auth)).status,
    ).toBe(204);
    expect(await isStored()).toBe(before > 1);
    expect(await csvRecords()).toBe(before - 1);
    for (const item of (
      await request(server()).get(`/api/calculations/${calculationId}/attachments`).set(owner.auth)
    ).body.filter((row: { sha256: string }) => row.sha256 === sha(CSV))) {
      const removed = await request(server()).delete(`/api/attachments/${item.id}`).set(admin.auth);
      expect(removed.status).toBe(204);
    }
    expect(await isStored()).toBe(false);
    expect((await request(server()).get(first.body.contentUrl).set(owner.auth)).status).toBe(404);
  });

  it('never loses an acknowledged upload to a removal of the same content running at once', async () => {
    // Removing the last record's bytes and recording a new reference to them are one decision:
    // whichever comes second sees the other. Twenty rounds, each with its own content.
    const lost: number[] = [];
    for (let round = 0; round < 20; round += 1) {
      const bytes = Buffer.from(`time_s,scale_kg\n0,0.${round}${Date.now()}\n`);
      const first = await upload(owner, bytes, `race-${round}.csv`);
      expect(first.status).toBe(201);
      const [removed, again] = await Promise.all([
        request(server()).delete(`/api/attachments/${first.body.id}`).set(owner.auth),
        upload(owner, bytes, `race-${round}-again.csv`),
      ]);
      expect(removed.status).toBe(204);
      expect(again.status).toBe(201);
      const read = await request(server()).get(again.body.contentUrl).set(owner.auth);
      if (read.status !== 200 || read.text !== bytes.toString()) lost.push(round);
    }
    expect(lost).toEqual([]);
  });

  it('turns away ids that try to walk out of the upload folder', async () => {
    for (const id of ['..%2F..%2Fetc%2Fpasswd', '..', '%2e%2e%2floftwright.sqlite']) {
      const response = await request(server())
        .get(`/api/attachments/${id}/content`)
        .set(owner.auth);
      expect([400, 404]).toContain(response.status);
      expect(response.headers['content-type']).toMatch(/application\/json/);
    }
    const store = testApp.app.get<ObjectStore>(OBJECT_STORE);
    await expect(store.get('../../loftwright.sqlite')).rejects.toThrow(/SHA-256/);
    await expect(store.get(`${'a'.repeat(63)}/`)).rejects.toThrow(/SHA-256/);
  });

  it('records uploads and removals in the audit trail', async () => {
    const audit = await request(server()).get('/api/admin/audit?pageSize=100').set(admin.auth);
    const actions = audit.body.items.map((entry: { action: string }) => entry.action);
    expect(actions).toContain('attachment.add');
    expect(actions).toContain('attachment.remove');
  });
});
