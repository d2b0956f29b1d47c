import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

describe('review comments anchored to inputs and results', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let reviewer: TestUser;
  let outsider: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer'], 'author');
    reviewer = await createUser(testApp.app, ['reviewer'], 'checker');
    outsider = await createUser(testApp.app, ['designer'], 'outsider');
    const created = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .send({ title: 'Commented sphere', kind: 'lift-check', inputs: liftCheckInputs() });
    calculationId = created.body.id;
    await http()
      .post(`/api/calculations/${calculationId}/versions/1/submit`)
      .set(designer.auth)
      .send({});
  });
  afterAll(async () => {
    await testApp.close();
  });

  const comment = (who: TestUser, body: Record<string, unknown>, n = 1) =>
    http()
      .post(`/api/calculations/${calculationId}/versions/${n}/comments`)
      .set(who.auth)
      .send(body);

  it('takes a reviewer’s comment on an input and names the input by its label', async () => {
    const added = await comment(reviewer, {
      body: 'Weigh the film: 45 g/m² looks low.',
      anchor: { kind: 'input', path: 'envelope.diameterM' },
    });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({
      versionNumber: 1,
      anchor: { kind: 'input', path: 'envelope.diameterM', label: 'Diameter' },
      addressed: null,
    });
    const onResult = await comment(reviewer, {
      body: 'Free lift seems small for the payload.',
      anchor: { kind: 'result', path: 'freeLift' },
    });
    expect(onResult.body.anchor).toMatchObject({ kind: 'result', label: 'Free lift' });
  });

  it('refuses an anchor that is not an input or result, naming anchor.path', async () => {
    const wrong = await comment(reviewer, {
      body: 'x',
      anchor: { kind: 'input', path: 'envelope.noSuchThing' },
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.field).toBe('anchor.path');
  });

  it('lets neither the author nor a non-reviewer comment', async () => {
    expect((await comment(designer, { body: 'mine' })).status).toBe(403);
    expect((await comment(outsider, { body: 'not mine' })).status).toBe(404);
  });

  it('lets the owner mark a comment addressed by a later version, and only a later one', async () => {
    const sentBack = await http()
      .post(`/api/calculations/${calculationId}/versions/1/send-back`)
      .set(reviewer.auth)
      .send({ comment: 'See the comments on the diameter and the free lift.' });
    expect(sentBack.status).toBe(200);
    const list = await http().get(`/api/calculations/${calculationId}/comments`).set(designer.auth);
    const [first] = list.body as { id: string }[];
    const tooEarly = await http()
      .post(`/api/comments/${first?.id}/addressed`)
      .set(designer.auth)
      .send({ versionNumber: 1 });
    expect(tooEarly.status).toBe(400);
    expect(tooEarly.body.field).toBe('versionNumber');
    await http()
      .post(`/api/calculations/${calculationId}/versions`)
      .set(designer.auth)
      .send({ baseVersion: 1, inputs: liftCheckInputs({ payloadMassKg: 0.15 }), note: 'fixed' });
    const byReviewer = await http()
      .post(`/api/comments/${first?.id}/addressed`)
      .set(reviewer.auth)
      .send({ versionNumber: 2 });
    expect(byReviewer.status).toBe(403);
    const addressed = await http()
      .post(`/api/comments/${first?.id}/addressed`)
      .set(designer.auth)
      .send({ versionNumber: 2 });
    expect(addressed.status).toBe(200);
    expect(addressed.body.addressed).toMatchObject({ versionNumber: 2, by: { id: designer.id } });
    const again = await http()
      .get(`/api/calculations/${calculationId}/comments`)
      .set(reviewer.auth);
    const open = (again.body as { addressed: unknown }[]).filter((item) => item.addressed === null);
    expect(open).toHaveLength(1);
  });
});
