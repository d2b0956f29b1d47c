import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ClassroomsService } from '../src/classrooms/classrooms.service';
import { JOIN_CODE_ALPHABET } from '../src/classrooms/join-code';
import { createTestApp, type TestApp } from './support/create-test-app';
import { createUser, registerThroughMail, type TestUser } from './support/users';

describe('classes and join codes', () => {
  let testApp: TestApp;
  let teacher: TestUser;
  let otherTeacher: TestUser;
  let student: TestUser;
  let outsider: TestUser;
  let designer: TestUser;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp({ env: { PUBLIC_URL: 'https://loft.example.test/' } });
    teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    otherTeacher = await createUser(testApp.app, ['teacher'], 'other-teacher');
    student = await createUser(testApp.app, ['student'], 'student');
    outsider = await createUser(testApp.app, ['student'], 'outsider');
    designer = await createUser(testApp.app, ['designer'], 'designer');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const createClass = async (title = 'Physics 11B') => {
    const response = await http().post('/api/classes').set(teacher.auth).send({ title });
    expect(response.status).toBe(201);
    return response.body as { id: string; joinCode: string; joinUrl: string; students: unknown[] };
  };

  it('gives a new class a readable join code and a join link', async () => {
    const created = await createClass();
    expect(created.joinCode).toMatch(/^[A-Z2-9]{4}-[A-Z2-9]{4}$/);
    for (const character of created.joinCode.replace('-', '')) {
      expect(JOIN_CODE_ALPHABET).toContain(character);
    }
    expect(created.joinUrl).toBe(
      `https://loft.example.test/join/${created.joinCode.replace('-', '')}`,
    );
    expect(created.students).toEqual([]);
  });

  it('answers 401 to every class route without a sign-in', async () => {
    const id = '00000000-0000-4000-8000-000000000000';
    for (const [method, path] of [
      ['get', '/api/classes'],
      ['post', '/api/classes/join'],
      ['get', `/api/classes/${id}`],
      ['get', `/api/classes/${id}/examples`],
      ['get', `/api/examples/${id}`],
      ['post', `/api/examples/${id}/submissions`],
    ] as const) {
      expect((await http()[method](path)).status, path).toBe(401);
    }
  });

  it('lets only teachers create classes, and names the title when it is empty', async () => {
    const byDesigner = await http().post('/api/classes').set(designer.auth).send({ title: 'x' });
    expect(byDesigner.status).toBe(403);
    const empty = await http().post('/api/classes').set(teacher.auth).send({ title: '' });
    expect(empty.status).toBe(400);
    expect(empty.body.field).toBe('title');
  });

  it('joins a student with the code as typed (lower case, spaced), once', async () => {
    const created = await createClass('Join as typed');
    const typed = ` ${created.joinCode.toLowerCase().replace('-', ' ')} `;
    const joined = await http().post('/api/classes/join').set(student.auth).send({ code: typed });
    expect(joined.status).toBe(200);
    expect(joined.body).toMatchObject({ id: created.id, standing: 'student' });
    // Students are not handed the code or the roster.
    expect(joined.body.joinCode).toBeUndefined();
    expect(joined.body.students).toBeUndefined();
    const again = await http()
      .post('/api/classes/join')
      .set(student.auth)
      .send({ code: created.joinCode });
    expect(again.status).toBe(200);
    const roster = await http().get(`/api/classes/${created.id}`).set(teacher.auth);
    expect(roster.body.students).toHaveLength(1);
    expect(roster.body.students[0]).toMatchObject({ id: student.id });
  });

  it('answers a wrong code 404, an expired one 410 and a closed class 409, each naming code', async () => {
    const wrong = await http()
      .post('/api/classes/join')
      .set(student.auth)
      .send({ code: 'ZZZZ-ZZZZ' });
    expect(wrong.status).toBe(404);
    expect(wrong.body.field).toBe('code');
    const short = await http().post('/api/classes/join').set(student.auth).send({ code: 'AB' });
    expect(short.status).toBe(404);

    const expiring = await createClass('Expiring');
    await testApp.app
      .get(ClassroomsService)
      .setCodeExpiry(expiring.id, new Date(Date.now() - 1000));
    const expired = await http()
      .post('/api/classes/join')
      .set(outsider.auth)
      .send({ code: expiring.joinCode });
    expect(expired.status).toBe(410);
    expect(expired.body).toMatchObject({ field: 'code' });
    expect(expired.body.message).toMatch(/expired/);
    // A new code works and the old one stops working.
    const renewed = await http()
      .post(`/api/classes/${expiring.id}/join-code`)
      .set(teacher.auth)
      .send({ joinCodeValidDays: 2 });
    expect(renewed.status).toBe(200);
    expect(renewed.body.joinCode).not.toBe(expiring.joinCode);
    const withNew = await http()
      .post('/api/classes/join')
      .set(outsider.auth)
      .send({ code: renewed.body.joinCode });
    expect(withNew.status).toBe(200);

    const closing = await createClass('Closing');
    const closed = await http().post(`/api/classes/${closing.id}/close`).set(teacher.auth);
    expect(closed.status).toBe(200);
    expect(closed.body.closed).toBe(true);
    const intoClosed = await http()
      .post('/api/classes/join')
      .set(student.auth)
      .send({ code: closing.joinCode });
    expect(intoClosed.status).toBe(409);
    expect(intoClosed.body.field).toBe('code');
  });

  it('registers a new student from a join code, and creates no account for a wrong one', async () => {
    const created = await createClass('Register from the link');
    const wrong = await http().post('/api/auth/register').send({
      email: 'new-pupil@test.invalid',
      password: 'a-long-password-1',
      displayName: 'New Pupil',
      joinCode: 'ZZZZ-ZZZZ',
    });
    expect(wrong.status).toBe(404);
    expect(wrong.body.field).toBe('joinCode');
    const registered = await registerThroughMail(testApp.app, {
      email: 'new-pupil@test.invalid',
      password: 'a-long-password-1',
      displayName: 'New Pupil',
      joinCode: created.joinCode.toLowerCase(),
    });
    expect(registered.status).toBe(201);
    expect(registered.body.user.roles).toEqual(['student']);
    const auth = { Authorization: `Bearer ${registered.body.accessToken}` };
    const classes = await http().get('/api/classes').set(auth);
    expect(classes.body.map((item: { id: string }) => item.id)).toEqual([created.id]);
    // Without a code a self-registered account stays a designer, as before.
    const plain = await registerThroughMail(testApp.app, {
      email: 'plain@test.invalid',
      password: 'a-long-password-2',
      displayName: 'Plain',
    });
    expect(plain.body.user.roles).toEqual(['designer']);
  });

  it('refuses a join by an account without the student role', async () => {
    const created = await createClass('Teachers do not join');
    const response = await http()
      .post('/api/classes/join')
      .set(otherTeacher.auth)
      .send({ code: created.joinCode });
    expect(response.status).toBe(403);
  });

  it('shows each user only their classes, and lets only the teacher manage the roster', async () => {
    const created = await createClass('Roster');
    await http().post('/api/classes/join').set(student.auth).send({ code: created.joinCode });

    const studentList = await http().get('/api/classes').set(student.auth);
    expect(studentList.body.map((item: { id: string }) => item.id)).toContain(created.id);
    const outsiderList = await http().get('/api/classes').set(outsider.auth);
    expect(outsiderList.body.map((item: { id: string }) => item.id)).not.toContain(created.id);
    const otherList = await http().get('/api/classes').set(otherTeacher.auth);
    expect(otherList.body).toEqual([]);

    for (const stranger of [outsider, otherTeacher]) {
      const seen = await http().get(`/api/classes/${created.id}`).set(stranger.auth);
      expect(seen.status).toBe(404);
    }
    const byStudent = await http()
      .delete(`/api/classes/${created.id}/students/${student.id}`)
      .set(student.auth);
    expect(byStudent.status).toBe(403);
    const byOther = await http()
      .delete(`/api/classes/${created.id}/students/${student.id}`)
      .set(otherTeacher.auth);
    expect(byOther.status).toBe(404);

    const removed = await http()
      .delete(`/api/classes/${created.id}/students/${student.id}`)
      .set(teacher.auth);
    expect(removed.status).toBe(204);
    const gone = await http().get(`/api/classes/${created.id}`).set(student.auth);
    expect(gone.status).toBe(404);
    const twice = await http()
      .delete(`/api/classes/${created.id}/students/${student.id}`)
      .set(teacher.auth);
    expect(twice.status).toBe(404);
    expect(twice.body.field).toBe('userId');
  });
});
