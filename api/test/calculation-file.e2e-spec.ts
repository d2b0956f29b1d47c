import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

describe('calculation files: export and import', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let importer: TestUser;
  let student: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    owner = await createUser(testApp.app, ['designer'], 'owner');
    importer = await createUser(testApp.app, ['designer'], 'importer');
    student = await createUser(testApp.app, ['student'], 'student');
    const created = await http()
      .post('/api/calculations')
      .set(owner.auth)
      .send({
        title: 'Dune sphere',
        kind: 'lift-check',
        inputs: liftCheckInputs(),
        tags: ['spring'],
        note: 'First size',
      });
    calculationId = created.body.id;
    await http()
      .post(`/api/calculations/${calculationId}/versions`)
      .set(owner.auth)
      .send({
        baseVersion: 1,
        inputs: liftCheckInputs({ envelope: { shape: 'sphere', diameterM: 1.3 } }),
        note: 'Bigger',
      });
  });

  afterAll(async () => {
    await testApp.close();
  });

  const exportFile = async () => {
    const response = await http().get(`/api/calculations/${calculationId}/export`).set(owner.auth);
    expect(response.status).toBe(200);
    return response;
  };

  it('exports a documented, versioned file with every version as a download', async () => {
    const response = await exportFile();
    expect(response.headers['content-disposition']).toMatch(
      /^attachment; filename="Dune-sphere\.loftwright\.json"/,
    );
    expect(response.body).toMatchObject({
      format: 'loftwright.calculation',
      formatVersion: 1,
      calculation: { title: 'Dune sphere', kind: 'lift-check', tags: ['spring'] },
    });
    expect(
      response.body.versions.map((v: { number: number; note: string }) => [v.number, v.note]),
    ).toEqual([
      [1, 'First size'],
      [2, 'Bigger'],
    ]);
    expect(response.body.versions[1].inputs.envelope.diameterM).toBe(1.3);
    expect(response.body.versions[1].fingerprint).toMatch(/^[0-9a-f]{64}$/);
  });

  it('imports it as a new calculation of the importer, with the same results and fingerprints', async () => {
    const file = (await exportFile()).body;
    const imported = await http().post('/api/calculations/import').set(importer.auth).send(file);
    expect(imported.status).toBe(201);
    expect(imported.body.id).not.toBe(calculationId);
    expect(imported.body).toMatchObject({
      title: 'Dune sphere',
      owner: { id: importer.id },
      latestVersion: 2,
      status: 'draft',
    });
    // Same inputs, same engine: the recomputed content has the same fingerprint.
    expect(imported.body.latest.fingerprint).toBe(file.versions[1].fingerprint);
    expect(imported.body.latest.note).toBe('Bigger — Imported from a Loftwright file (version 2)');
  });

  it('refuses a file of another format or format version, saying which', async () => {
    const file = (await exportFile()).body;
    const wrongFormat = await http()
      .post('/api/calculations/import')
      .set(importer.auth)
      .send({ ...file, format: 'someone-else.project' });
    expect(wrongFormat.status).toBe(400);
    expect(wrongFormat.body.message).toMatch(/not a Loftwright calculation file/);
    const future = await http()
      .post('/api/calculations/import')
      .set(importer.auth)
      .send({ ...file, formatVersion: 2 });
    expect(future.status).toBe(400);
    expect(future.body.message).toMatch(/formatVersion must be 1/);
  });

  it('names the version and the field of bad inputs, and creates nothing', async () => {
    const file = (await exportFile()).body;
    const before = await http().get('/api/calculations').set(importer.auth);
    file.versions[1].inputs.envelope.diameterM = -4;
    const response = await http().post('/api/calculations/import').set(importer.auth).send(file);
    expect(response.status).toBe(422);
    expect(response.body.issues.map((issue: { field: string }) => issue.field)).toEqual([
      'versions.1.inputs.envelope.diameterM',
    ]);
    const after = await http().get('/api/calculations').set(importer.auth);
    expect(after.body.total).toBe(before.body.total);
  });

  it('refuses an unknown kind and a file without versions', async () => {
    const file = (await exportFile()).body;
    const unknownKind = await http()
      .post('/api/calculations/import')
      .set(importer.auth)
      .send({ ...file, calculation: { ...file.calculation, kind: 'perpetual-motion' } });
    expect(unknownKind.status).toBe(400);
    expect(unknownKind.body.message).toMatch(/calculation.kind must be one of/);
    const empty = await http()
      .post('/api/calculations/import')
      .set(importer.auth)
      .send({ ...file, versions: [] });
    expect(empty.status).toBe(400);
    expect(empty.body.message).toMatch(/versions needs at least one version/);
  });

  it('refuses a file of more than 100 versions, naming versions and the limit, and creates nothing', async () => {
    const file = (await exportFile()).body;
    const before = await http().get('/api/calculations').set(importer.auth);
    const versions = Array.from({ length: 101 }, (_, index) => ({
      ...file.versions[0],
      number: index + 1,
    }));
    const response = await http()
      .post('/api/calculations/import')
      .set(importer.auth)
      .send({ ...file, versions });
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/versions may hold at most 100 versions/);
    const after = await http().get('/api/calculations').set(importer.auth);
    expect(after.body.total).toBe(before.body.total);
  });

  it('lets only authors import, and only readers export', async () => {
    const file = (await exportFile()).body;
    expect(
      (await http().post('/api/calculations/import').set(student.auth).send(file)).status,
    ).toBe(403);
    expect(
      (await http().get(`/api/calculations/${calculationId}/export`).set(student.auth)).status,
    ).toBe(404);
  });
});
