import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

/** Every resource says what the signed-in user may do with it; the web shows actions from that. */
describe('permissions sent with each resource', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let reviewer: TestUser;
  let admin: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());
  const permissions = async (who: TestUser) =>
    (await http().get(`/api/calculations/${calculationId}`).set(who.auth)).body.permissions;

  beforeAll(async () => {
    testApp = await createTestApp();
    owner = await createUser(testApp.app, ['designer'], 'owner');
    reviewer = await createUser(testApp.app, ['reviewer'], 'reviewer');
    admin = await createUser(testApp.app, ['admin'], 'admin');
    const created = await http()
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Flags', kind: 'lift-check', inputs: liftCheckInputs() });
    calculationId = created.body.id;
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('tells the owner of a draft they may edit, submit, upload and export, not review', async () => {
    expect(await permissions(owner)).toEqual({
      edit: true,
      archive: true,
      submit: true,
      review: false,
      upload: true,
      export: true,
    });
  });

  it('moves submit to review once the version is in review', async () => {
    await http()
      .post(`/api/calculations/${calculationId}/versions/1/submit`)
      .set(owner.auth)
      .send({});
    expect(await permissions(owner)).toMatchObject({ submit: false, review: false });
    expect(await permissions(reviewer)).toEqual({
      edit: false,
      archive: false,
      submit: false,
      review: true,
      upload: false,
      export: true,
    });
    expect(await permissions(admin)).toMatchObject({ edit: false, archive: true, upload: true });
  });

  it('says on each row of the list whether the reader may archive it', async () => {
    const row = async (who: TestUser) =>
      (await http().get('/api/calculations').set(who.auth)).body.items.find(
        (item: { id: string }) => item.id === calculationId,
      );
    expect((await row(owner)).permissions).toEqual({ archive: true });
    expect((await row(reviewer)).permissions).toEqual({ archive: false });
  });

  it('says of each file whether the reader may remove it', async () => {
    const uploaded = await http()
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth)
      .attach('file', Buffer.from('time,mass\n0,1\n'), {
        filename: 'scale.csv',
        contentType: 'text/csv',
      });
    expect(uploaded.status).toBe(201);
    expect(uploaded.body.permissions).toEqual({ remove: true });
    const asReviewer = await http()
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(reviewer.auth);
    expect(asReviewer.body[0].permissions).toEqual({ remove: false });
    const asAdmin = await http()
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(admin.auth);
    expect(asAdmin.body[0].permissions).toEqual({ remove: true });
  });
});
