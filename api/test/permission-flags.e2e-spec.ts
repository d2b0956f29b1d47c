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

  it('tells each account what its roles let it do across the product', async () => {
    const me = async (who: TestUser) =>
      (await http().get('/api/auth/me').set(who.auth)).body.permissions;
    expect(await me(owner)).toEqual({
      createCalculations: true,
      planGas: true,
      review: false,
      runClasses: false,
      joinClasses: false,
      seeClasses: false,
      administer: false,
      seeEnvelopes: true,
      manageEnvelopes: true,
    });
    expect(await me(reviewer)).toMatchObject({ createCalculations: false, review: true });
    expect(await me(admin)).toMatchObject({
      createCalculations: false,
      planGas: true,
      seeClasses: true,
      administer: true,
    });
    const pupil = await createUser(testApp.app, ['student'], 'pupil');
    expect(await me(pupil)).toMatchObject({
      joinClasses: true,
      seeClasses: true,
      runClasses: false,
    });
  });

  it('tells a class teacher they may publish until the class closes, and refuses it after', async () => {
    const teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    const pupil = await createUser(testApp.app, ['student'], 'classmate');
    const classroom = (await http().post('/api/classes').set(teacher.auth).send({ title: '9C' }))
      .body;
    await http().post('/api/classes/join').set(pupil.auth).send({ code: classroom.joinCode });
    const flags = async (who: TestUser) =>
      (await http().get(`/api/classes/${classroom.id}`).set(who.auth)).body.permissions;
    expect(await flags(teacher)).toEqual({ publish: true });
    expect(await flags(pupil)).toEqual({ publish: false });
    // An admin oversees the class but, without the teacher role, publishes nothing.
    expect(await flags(admin)).toEqual({ publish: false });

    const own = await http()
      .post('/api/calculations')
      .set(teacher.auth)
      .send({ title: 'For 9C', kind: 'lift-check', inputs: liftCheckInputs() });
    await http().post(`/api/classes/${classroom.id}/close`).set(teacher.auth);
    expect(await flags(teacher)).toEqual({ publish: false });
    const late = await http()
      .post(`/api/classes/${classroom.id}/examples`)
      .set(teacher.auth)
      .send({ calculationId: own.body.id, versionNumber: 1 });
    expect(late.status).toBe(409);
    expect(late.body.message).toMatch(/closed/);
  });
});
