import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

interface Route {
  name: string;
  method: 'post' | 'patch';
  path: () => string;
  who: () => TestUser | null;
  valid: Record<string, unknown>;
  /** Each: a body to send and the field the answer must name. */
  bad: [string, Record<string, unknown>, string][];
}

/** Bad input on every write route: 400 or 422 naming the field, never a 500. */
describe('bad input', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let reviewer: TestUser;
  let admin: TestUser;
  let calculationId = '';
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer']);
    reviewer = await createUser(testApp.app, ['reviewer']);
    admin = await createUser(testApp.app, ['admin']);
    calculationId = (
      await http()
        .post('/api/calculations')
        .set(designer.auth)
        .send({ title: 'Target', kind: 'lift-check', inputs: liftCheckInputs() })
    ).body.id;
    await http()
      .post(`/api/calculations/${calculationId}/versions/1/submit`)
      .set(designer.auth)
      .send({});
  });
  afterAll(async () => {
    await testApp.close();
  });

  const common = (
    valid: Record<string, unknown>,
    field: string,
  ): [string, Record<string, unknown>, string][] => [
    ['missing', { ...valid, [field]: undefined }, field],
    ['wrong type', { ...valid, [field]: { nested: true } }, field],
    ['unknown field', { ...valid, sneaky: 1 }, 'sneaky'],
  ];

  const routes: Route[] = [
    {
      name: 'POST /api/auth/register',
      method: 'post',
      path: () => '/api/auth/register',
      who: () => null,
      valid: { email: 'new@example.org', password: 'long-enough-pw', displayName: 'New' },
      bad: [
        ...common(
          { email: 'new@example.org', password: 'long-enough-pw', displayName: 'New' },
          'email',
        ),
        ['not an e-mail', { email: 'nope', password: 'long-enough-pw', displayName: 'N' }, 'email'],
        [
          'huge name',
          { email: 'a@b.org', password: 'long-enough-pw', displayName: 'x'.repeat(5000) },
          'displayName',
        ],
        [
          'not a number format',
          { email: 'a@b.org', password: 'long-enough-pw', displayName: 'N', numberFormat: 'x' },
          'numberFormat',
        ],
      ],
    },
    {
      name: 'POST /api/auth/login',
      method: 'post',
      path: () => '/api/auth/login',
      who: () => null,
      valid: { email: 'a@b.org', password: 'x' },
      bad: common({ email: 'a@b.org', password: 'x' }, 'password'),
    },
    {
      name: 'POST /api/auth/password-reset/request',
      method: 'post',
      path: () => '/api/auth/password-reset/request',
      who: () => null,
      valid: { email: 'a@b.org' },
      bad: common({ email: 'a@b.org' }, 'email'),
    },
    {
      name: 'POST /api/auth/password-reset/confirm',
      method: 'post',
      path: () => '/api/auth/password-reset/confirm',
      who: () => null,
      valid: { token: 'x'.repeat(30), password: 'long-enough-pw' },
      bad: [
        ...common({ token: 'x'.repeat(30), password: 'long-enough-pw' }, 'token'),
        ['short password', { token: 'x'.repeat(30), password: 'short' }, 'password'],
      ],
    },
    {
      name: 'PATCH /api/auth/me/preferences',
      method: 'patch',
      path: () => '/api/auth/me/preferences',
      who: () => designer,
      valid: { unitSystem: 'us' },
      bad: [
        ...common({ unitSystem: 'us' }, 'unitSystem'),
        ['not a system', { unitSystem: 'metric-ish' }, 'unitSystem'],
        ['not a number format', { numberFormat: 'comma-comma' }, 'numberFormat'],
        ['lower-case currency', { currency: 'usd' }, 'currency'],
        ['null currency', { currency: null }, 'currency'],
      ],
    },
    {
      name: 'POST /api/calculations',
      method: 'post',
      path: () => '/api/calculations',
      who: () => designer,
      valid: { title: 'T', kind: 'lift-check', inputs: liftCheckInputs() },
      bad: [
        ...common({ title: 'T', kind: 'lift-check', inputs: liftCheckInputs() }, 'kind'),
        ['unknown kind', { title: 'T', kind: 'levitation', inputs: {} }, 'kind'],
        [
          'negative payload',
          { title: 'T', kind: 'lift-check', inputs: liftCheckInputs({ payloadMassKg: -2 }) },
          'inputs.payloadMassKg',
        ],
        [
          'NaN string',
          { title: 'T', kind: 'lift-check', inputs: liftCheckInputs({ payloadMassKg: 'NaN' }) },
          'inputs.payloadMassKg',
        ],
        [
          'huge number',
          {
            title: 'T',
            kind: 'lift-check',
            inputs: liftCheckInputs({ envelope: { shape: 'sphere', diameterM: 1e308 } }),
          },
          'inputs.envelope.diameterM',
        ],
        [
          'unknown input',
          { title: 'T', kind: 'lift-check', inputs: liftCheckInputs({ magic: 1 }) },
          'inputs',
        ],
        [
          'bad tag',
          { title: 'T', kind: 'lift-check', inputs: liftCheckInputs(), tags: ['<script>'] },
          'tags',
        ],
        ['empty title', { title: '', kind: 'lift-check', inputs: liftCheckInputs() }, 'title'],
      ],
    },
    {
      name: 'POST /api/calculations/:id/versions',
      method: 'post',
      path: () => `/api/calculations/${calculationId}/versions`,
      who: () => designer,
      valid: { baseVersion: 1, inputs: liftCheckInputs() },
      bad: [
        ...common({ baseVersion: 1, inputs: liftCheckInputs() }, 'baseVersion'),
        ['negative base', { baseVersion: -1, inputs: liftCheckInputs() }, 'baseVersion'],
        ['string base', { baseVersion: '1', inputs: liftCheckInputs() }, 'baseVersion'],
        [
          'out of range',
          {
            baseVersion: 1,
            inputs: liftCheckInputs({
              ambient: { mode: 'measured', temperatureK: 5000, pressurePa: 101325 },
            }),
          },
          'inputs.ambient.temperatureK',
        ],
      ],
    },
    {
      name: 'PATCH /api/calculations/:id',
      method: 'patch',
      path: () => `/api/calculations/${calculationId}`,
      who: () => designer,
      valid: { title: 'Renamed' },
      bad: [
        ...common({ title: 'Renamed' }, 'title').slice(1),
        ['bad visibility', { visibility: 'world' }, 'visibility'],
      ],
    },
    {
      name: 'POST .../versions/:n/submit',
      method: 'post',
      path: () => `/api/calculations/${calculationId}/versions/1/submit`,
      who: () => designer,
      valid: {},
      bad: [
        ['not a uuid', { reviewerId: 'bob' }, 'reviewerId'],
        ['unknown field', { sneaky: 1 }, 'sneaky'],
      ],
    },
    {
      name: 'POST .../versions/:n/approve',
      method: 'post',
      path: () => `/api/calculations/${calculationId}/versions/1/approve`,
      who: () => reviewer,
      valid: {},
      bad: [
        ['wrong type', { comment: 42 }, 'comment'],
        ['huge comment', { comment: 'x'.repeat(5000) }, 'comment'],
        ['unknown field', { sneaky: 1 }, 'sneaky'],
      ],
    },
    {
      name: 'POST .../versions/:n/send-back',
      method: 'post',
      path: () => `/api/calculations/${calculationId}/versions/1/send-back`,
      who: () => reviewer,
      valid: { comment: 'x' },
      bad: common({ comment: 'x' }, 'comment'),
    },
    {
      name: 'PATCH /api/admin/users/:id',
      method: 'patch',
      path: () => `/api/admin/users/${designer.id}`,
      who: () => admin,
      valid: { roles: ['designer'] },
      bad: [
        ...common({ roles: ['designer'] }, 'roles'),
        ['unknown role', { roles: ['wizard'] }, 'roles'],
      ],
    },
    {
      name: 'POST /api/evaluate',
      method: 'post',
      path: () => '/api/evaluate',
      who: () => null,
      valid: { kind: 'lift-check', inputs: liftCheckInputs() },
      bad: [
        ...common({ kind: 'lift-check', inputs: liftCheckInputs() }, 'kind'),
        ['inputs not an object', { kind: 'lift-check', inputs: 'lots' }, 'inputs'],
        [
          'inputs of another kind',
          { kind: 'lift-check', inputs: { nested: true } },
          'inputs.envelope',
        ],
        [
          'NaN string',
          { kind: 'lift-check', inputs: liftCheckInputs({ payloadMassKg: 'NaN' }) },
          'inputs.payloadMassKg',
        ],
      ],
    },
  ];

  describe.each(routes.map((route) => [route.name, route] as const))('%s', (_name, route) => {
    it.each(route.bad.map(([label, body, field]) => [label, body, field] as const))(
      '%s -> 400/422 naming %s',
      async (_label, body, field) => {
        const user = route.who();
        let call = http()[route.method](route.path());
        if (user) call = call.set(user.auth);
        const response = await call.send(body);
        expect([400, 422]).toContain(response.status);
        expect(response.body.field).toBe(field);
        expect(typeof response.body.message).toBe('string');
      },
    );

    it('answers 413 to an oversize body and 400 to malformed JSON, never 500', async () => {
      const user = route.who();
      const big = http()[route.method](route.path()).set('Content-Type', 'application/json');
      const bigResponse = await (user ? big.set(user.auth) : big).send(
        JSON.stringify({ ...route.valid, padding: 'x'.repeat(300 * 1024) }),
      );
      expect(bigResponse.status).toBe(413);
      const broken = http()[route.method](route.path()).set('Content-Type', 'application/json');
      const brokenResponse = await (user ? broken.set(user.auth) : broken).send('{"not json');
      expect(brokenResponse.status).toBe(400);
      expect(brokenResponse.body.message).toMatch(/JSON/);
    });
  });

  it('answers a bad route parameter with 400 naming it', async () => {
    const badId = await http().get('/api/calculations/not-a-uuid').set(designer.auth);
    expect(badId.status).toBe(400);
    expect(badId.body.field).toBe('id');
    const badNumber = await http()
      .get(`/api/calculations/${calculationId}/versions/first`)
      .set(designer.auth);
    expect(badNumber.status).toBe(400);
    expect(badNumber.body.field).toBe('n');
  });
});
