import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

/** Inputs that once answered 500: each must be a 400 naming the field. */
describe('bad input at the edges', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let teacher: TestUser;
  let admin: TestUser;
  let calculationId = '';
  let exampleId = '';
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer'], 'designer');
    teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    admin = await createUser(testApp.app, ['admin'], 'admin');
    calculationId = (
      await http()
        .post('/api/calculations')
        .set(designer.auth)
        .send({ title: 'Target', kind: 'lift-check', inputs: liftCheckInputs() })
    ).body.id;
    const teacherCalculation = (
      await http()
        .post('/api/calculations')
        .set(teacher.auth)
        .send({ title: 'Lesson', kind: 'lift-check', inputs: liftCheckInputs() })
    ).body.id;
    const classId = (await http().post('/api/classes').set(teacher.auth).send({ title: 'Class' }))
      .body.id;
    const published = await http()
      .post(`/api/classes/${classId}/examples`)
      .set(teacher.auth)
      .send({ calculationId: teacherCalculation, versionNumber: 1, title: 'Sphere' });
    expect(published.status).toBe(201);
    exampleId = published.body.id;
  });

  afterAll(async () => {
    await testApp.close();
  });

  it.each([
    ['title', { title: null }],
    ['visibility', { visibility: null }],
    ['tags', { tags: null }],
  ])('PATCH a calculation with %s: null -> 400 naming it', async (field, body) => {
    const response = await http()
      .patch(`/api/calculations/${calculationId}`)
      .set(designer.auth)
      .send(body);
    expect(response.status).toBe(400);
    expect(response.body.field).toBe(field);
  });

  it.each([
    ['title', { title: null }],
    ['intro', { intro: null }],
    ['exercise', { exercise: [] }],
    ['exercise', { exercise: 'yes' }],
  ])('PATCH an example with a bad %s -> 400 naming it', async (field, body) => {
    const response = await http().patch(`/api/examples/${exampleId}`).set(teacher.auth).send(body);
    expect(response.status).toBe(400);
    expect(response.body.field).toBe(field);
  });

  it('refuses an e-mail address with a lone surrogate, naming the field', async () => {
    const response = await http().post('/api/auth/register').send({
      email: 'ab\uD800c@example.org',
      password: 'a long enough password',
      displayName: 'X',
    });
    expect(response.status).toBe(400);
    expect(response.body.field).toBe('email');
    const login = await http()
      .post('/api/auth/login')
      .send({ email: 'ab\uD800c@example.org', password: 'a long enough password' });
    expect([400, 401]).toContain(login.status);
  });

  it.each(['/api/calculations', '/api/admin/audit', '/api/admin/outbox'])(
    '%s?page=1e308 or a 20-digit page -> 400 naming page',
    async (path) => {
      for (const page of ['1e308', '12345678901234567890', '1.5', '-1']) {
        const response = await http().get(`${path}?page=${page}`).set(admin.auth);
        expect(response.status, page).toBe(400);
        expect(response.body.field, page).toBe('page');
      }
    },
  );

  it('answers malformed JSON with the documented wording, not the parser’s', async () => {
    const response = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .set('Content-Type', 'application/json')
      .send('{"title": "x",');
    expect(response.status).toBe(400);
    expect(response.body.message).toBe('The request body is not valid JSON.');
  });

  it('refuses a deeply nested body before parsing it, naming the limit', async () => {
    const deep = `{"title":"x","kind":"lift-check","inputs":${'['.repeat(3000)}${']'.repeat(3000)}}`;
    const response = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .set('Content-Type', 'application/json')
      .send(deep);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/deeper than 32 levels/);
  });

  it('names the size limit when a body is too large', async () => {
    const response = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ title: 'x'.repeat(300 * 1024) }));
    expect(response.status).toBe(413);
    expect(response.body.message).toMatch(/256 kB/);
  });
});
