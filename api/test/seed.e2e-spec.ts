import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';

describe('demo seed on an empty database', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp({
      seedDemo: true,
      env: { DEMO_PASSWORD: 'demo-password-for-tests' },
    });
  });
  afterAll(async () => {
    await testApp.close();
  });

  it.each(['admin', 'designer', 'reviewer', 'teacher', 'student'])(
    'creates %s@demo.test with the DEMO_PASSWORD and that role',
    async (role) => {
      const login = await request(testApp.app.getHttpServer())
        .post('/api/auth/login')
        .send({ email: `${role}@demo.test`, password: 'demo-password-for-tests' });
      expect(login.status).toBe(200);
      expect(login.body.user.roles).toEqual([role]);
    },
  );

  it('adds a scenario with calculations in every state, all recomputed by the engine', async () => {
    const login = await request(testApp.app.getHttpServer())
      .post('/api/auth/login')
      .send({ email: 'admin@demo.test', password: 'demo-password-for-tests' });
    const list = await request(testApp.app.getHttpServer())
      .get('/api/calculations?pageSize=100')
      .set('Authorization', `Bearer ${login.body.accessToken}`);
    const statuses = new Set(list.body.items.map((item: { status: string }) => item.status));
    expect([...statuses].sort()).toEqual(['approved', 'changes_requested', 'draft', 'in_review']);
    const kinds = new Set(list.body.items.map((item: { kind: string }) => item.kind));
    expect(kinds.size).toBeGreaterThanOrEqual(4);
    const approved = list.body.items.find((item: { status: string }) => item.status === 'approved');
    const detail = await request(testApp.app.getHttpServer())
      .get(`/api/calculations/${approved.id}`)
      .set('Authorization', `Bearer ${login.body.accessToken}`);
    const verify = await request(testApp.app.getHttpServer()).get(
      `/api/verify/${detail.body.latest.fingerprint}`,
    );
    expect(verify.body).toMatchObject({ match: true, reproduces: true });
  });

  it('adds a fill log with a series of readings and a gas plan for the designer', async () => {
    const http = () => request(testApp.app.getHttpServer());
    const login = await http()
      .post('/api/auth/login')
      .send({ email: 'designer@demo.test', password: 'demo-password-for-tests' });
    const auth = { Authorization: `Bearer ${login.body.accessToken}` };
    const list = await http().get('/api/calculations?q=anemometer').set(auth);
    const logs = await http().get(`/api/calculations/${list.body.items[0].id}/fill-logs`).set(auth);
    expect(logs.body).toHaveLength(1);
    expect(logs.body[0].readings).toHaveLength(4);
    // Ballast 3 kg, scale 1.13 kg at filling: 1.87 kg measured net lift.
    expect(logs.body[0].outputs.measuredNetLift.value).toBeCloseTo(1.87, 12);
    expect(logs.body[0].outputs.halfLife.value).toBeGreaterThan(0);
    const plans = await http().get('/api/plans').set(auth);
    expect(plans.body).toHaveLength(1);
    expect(plans.body[0].result.lines).toHaveLength(3);
    expect(plans.body[0].result.outputs.timeToFill.value).toBeGreaterThan(0);
  });
});
