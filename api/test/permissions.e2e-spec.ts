import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

type Actor = 'anonymous' | 'student' | 'owner' | 'otherDesigner' | 'reviewer' | 'teacher' | 'admin';
const ACTORS: Actor[] = [
  'anonymous',
  'student',
  'owner',
  'otherDesigner',
  'reviewer',
  'teacher',
  'admin',
];

interface Case {
  name: string;
  method: 'get' | 'post' | 'patch' | 'delete';
  /** Builds the path, creating a fresh object when the request changes state. */
  path: () => Promise<string>;
  body?: Record<string, unknown>;
  expected: Record<Actor, number>;
}

/**
 * Every route, every role, own and someone else's objects: 401 without a token, 403 for a role
 * that may not, 404 where a private object's existence must not leak.
 */
describe('permission matrix', () => {
  let testApp: TestApp;
  const users = {} as Record<Exclude<Actor, 'anonymous'>, TestUser>;
  const http = () => request(testApp.app.getHttpServer());

  async function calculation(
    visibility: 'private' | 'team' | 'published',
    stage: 'draft' | 'in_review' = 'draft',
  ): Promise<string> {
    const created = await http()
      .post('/api/calculations')
      .set(users.owner.auth)
      .send({
        title: `${visibility} ${stage}`,
        kind: 'lift-check',
        inputs: liftCheckInputs(),
        visibility,
      });
    expect(created.status).toBe(201);
    if (stage === 'in_review') {
      expect(
        (
          await http()
            .post(`/api/calculations/${created.body.id}/versions/1/submit`)
            .set(users.owner.auth)
            .send({})
        ).status,
      ).toBe(200);
    }
    return created.body.id as string;
  }

  beforeAll(async () => {
    testApp = await createTestApp();
    users.admin = await createUser(testApp.app, ['admin'], 'admin');
    users.owner = await createUser(testApp.app, ['designer'], 'owner');
    users.otherDesigner = await createUser(testApp.app, ['designer'], 'other');
    users.reviewer = await createUser(testApp.app, ['reviewer'], 'reviewer');
    users.teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    users.student = await createUser(testApp.app, ['student'], 'student');
  });
  afterAll(async () => {
    await testApp.close();
  });

  const all = (status: number): Record<Actor, number> =>
    Object.fromEntries(ACTORS.map((actor) => [actor, status])) as Record<Actor, number>;
  const signedIn = (status: number) => ({ ...all(status), anonymous: 401 });
  const save = { baseVersion: 1, inputs: liftCheckInputs({ payloadMassKg: 0.3 }) };

  const cases: Case[] = [
    { name: 'GET /api/health', method: 'get', path: async () => '/api/health', expected: all(200) },
    { name: 'GET /api/kinds', method: 'get', path: async () => '/api/kinds', expected: all(200) },
    {
      name: 'POST /api/evaluate',
      method: 'post',
      path: async () => '/api/evaluate',
      body: { kind: 'lift-check', inputs: liftCheckInputs() },
      expected: all(200),
    },
    {
      name: 'GET /api/verify/:fingerprint',
      method: 'get',
      path: async () => `/api/verify/${'a'.repeat(64)}`,
      expected: all(200),
    },
    {
      name: 'GET /api/auth/me',
      method: 'get',
      path: async () => '/api/auth/me',
      expected: signedIn(200),
    },
    {
      name: 'GET /api/calculations',
      method: 'get',
      path: async () => '/api/calculations',
      expected: signedIn(200),
    },
    {
      name: 'POST /api/calculations',
      method: 'post',
      path: async () => '/api/calculations',
      body: { title: 'x', kind: 'lift-check', inputs: liftCheckInputs() },
      expected: {
        anonymous: 401,
        student: 403,
        owner: 201,
        otherDesigner: 201,
        reviewer: 403,
        teacher: 201,
        admin: 403,
      },
    },
    {
      name: 'GET /api/calculations/:id (private draft)',
      method: 'get',
      path: async () => `/api/calculations/${await calculation('private')}`,
      expected: {
        anonymous: 401,
        student: 404,
        owner: 200,
        otherDesigner: 404,
        reviewer: 404,
        teacher: 404,
        admin: 200,
      },
    },
    {
      name: 'GET /api/calculations/:id (private, submitted)',
      method: 'get',
      path: async () => `/api/calculations/${await calculation('private', 'in_review')}`,
      expected: {
        anonymous: 401,
        student: 404,
        owner: 200,
        otherDesigner: 404,
        reviewer: 200,
        teacher: 404,
        admin: 200,
      },
    },
    {
      name: 'GET /api/calculations/:id (team)',
      method: 'get',
      path: async () => `/api/calculations/${await calculation('team')}`,
      expected: { ...signedIn(200), student: 404 },
    },
    {
      name: 'GET /api/calculations/:id (published)',
      method: 'get',
      path: async () => `/api/calculations/${await calculation('published')}`,
      expected: signedIn(200),
    },
    {
      name: 'GET /api/calculations/:id/versions/:n (private)',
      method: 'get',
      path: async () => `/api/calculations/${await calculation('private')}/versions/1`,
      expected: {
        anonymous: 401,
        student: 404,
        owner: 200,
        otherDesigner: 404,
        reviewer: 404,
        teacher: 404,
        admin: 200,
      },
    },
    {
      name: 'GET /api/calculations/:id/versions/:a/diff/:b (team)',
      method: 'get',
      path: async () => `/api/calculations/${await calculation('team')}/versions/1/diff/1`,
      expected: { ...signedIn(200), student: 404 },
    },
    {
      name: 'POST /api/calculations/:id/versions (private)',
      method: 'post',
      path: async () => `/api/calculations/${await calculation('private')}/versions`,
      body: save,
      expected: {
        anonymous: 401,
        student: 404,
        owner: 201,
        otherDesigner: 404,
        reviewer: 404,
        teacher: 404,
        admin: 403,
      },
    },
    {
      name: 'POST /api/calculations/:id/versions (team)',
      method: 'post',
      path: async () => `/api/calculations/${await calculation('team')}/versions`,
      body: save,
      expected: {
        anonymous: 401,
        student: 404,
        owner: 201,
        otherDesigner: 403,
        reviewer: 403,
        teacher: 403,
        admin: 403,
      },
    },
    {
      name: 'PATCH /api/calculations/:id (team)',
      method: 'patch',
      path: async () => `/api/calculations/${await calculation('team')}`,
      body: { title: 'renamed' },
      expected: {
        anonymous: 401,
        student: 404,
        owner: 200,
        otherDesigner: 403,
        reviewer: 403,
        teacher: 403,
        admin: 403,
      },
    },
    {
      name: 'DELETE /api/calculations/:id (team)',
      method: 'delete',
      path: async () => `/api/calculations/${await calculation('team')}`,
      expected: {
        anonymous: 401,
        student: 404,
        owner: 204,
        otherDesigner: 403,
        reviewer: 403,
        teacher: 403,
        admin: 204,
      },
    },
    {
      name: 'POST .../versions/:n/submit (private)',
      method: 'post',
      path: async () => `/api/calculations/${await calculation('private')}/versions/1/submit`,
      body: {},
      expected: {
        anonymous: 401,
        student: 404,
        owner: 200,
        otherDesigner: 404,
        reviewer: 404,
        teacher: 404,
        admin: 403,
      },
    },
    {
      name: 'POST .../versions/:n/approve (private, submitted)',
      method: 'post',
      path: async () =>
        `/api/calculations/${await calculation('private', 'in_review')}/versions/1/approve`,
      body: { comment: 'ok' },
      expected: {
        anonymous: 401,
        student: 403,
        owner: 403,
        otherDesigner: 403,
        reviewer: 200,
        teacher: 403,
        admin: 403,
      },
    },
    {
      name: 'POST .../versions/:n/send-back (team, submitted)',
      method: 'post',
      path: async () =>
        `/api/calculations/${await calculation('team', 'in_review')}/versions/1/send-back`,
      body: { comment: 'fix it' },
      expected: {
        anonymous: 401,
        student: 403,
        owner: 403,
        otherDesigner: 403,
        reviewer: 200,
        teacher: 403,
        admin: 403,
      },
    },
    {
      name: 'GET /api/reviews/queue',
      method: 'get',
      path: async () => '/api/reviews/queue',
      expected: { ...signedIn(403), reviewer: 200 },
    },
    {
      name: 'GET /api/admin/users',
      method: 'get',
      path: async () => '/api/admin/users',
      expected: { ...signedIn(403), admin: 200 },
    },
    {
      name: 'PATCH /api/admin/users/:id',
      method: 'patch',
      path: async () =>
        `/api/admin/users/${(await createUser(testApp.app, ['student'], 'target')).id}`,
      body: { roles: ['student'] },
      expected: { ...signedIn(403), admin: 200 },
    },
    {
      name: 'GET /api/admin/audit',
      method: 'get',
      path: async () => '/api/admin/audit',
      expected: { ...signedIn(403), admin: 200 },
    },
    {
      name: 'GET /api/admin/outbox',
      method: 'get',
      path: async () => '/api/admin/outbox',
      expected: { ...signedIn(403), admin: 200 },
    },
  ];

  it.each(cases.map((testCase) => [testCase.name, testCase] as const))(
    '%s',
    async (_name, testCase) => {
      const seen: Partial<Record<Actor, number>> = {};
      for (const actor of ACTORS) {
        const path = await testCase.path();
        let call = http()[testCase.method](path);
        if (actor !== 'anonymous') call = call.set(users[actor].auth);
        const response = testCase.body ? await call.send(testCase.body) : await call;
        seen[actor] = response.status;
        // Refusals never explain what they protect beyond the message.
        if (response.status >= 400)
          expect(JSON.stringify(response.body)).not.toMatch(/stack|at .*\.js/);
      }
      expect(seen).toEqual(testCase.expected);
    },
  );

  it('a student promoted by an admin must sign in again, then has the new rights', async () => {
    const student = await createUser(testApp.app, ['student'], 'promoted');
    await http()
      .patch(`/api/admin/users/${student.id}`)
      .set(users.admin.auth)
      .send({ roles: ['student', 'designer'] });
    expect((await http().get('/api/auth/me').set(student.auth)).status).toBe(401);
  });

  it('refuses to take the admin role from the last admin', async () => {
    const response = await http()
      .patch(`/api/admin/users/${users.admin.id}`)
      .set(users.admin.auth)
      .send({ roles: ['designer'] });
    expect(response.status).toBe(409);
    expect(response.body.field).toBe('roles');
  });
});
