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

  it('adds a class the demo student has joined, with three worked examples that match their sources', async () => {
    const http = () => request(testApp.app.getHttpServer());
    const signIn = async (role: string) => {
      const login = await http()
        .post('/api/auth/login')
        .send({ email: `${role}@demo.test`, password: 'demo-password-for-tests' });
      return { Authorization: `Bearer ${login.body.accessToken}` };
    };
    const teacher = await signIn('teacher');
    const student = await signIn('student');
    const classes = await http().get('/api/classes').set(student);
    expect(classes.body).toHaveLength(1);
    const examples = await http().get(`/api/classes/${classes.body[0].id}/examples`).set(teacher);
    expect(examples.body).toHaveLength(3);
    const full = await Promise.all(
      examples.body.map(async (item: { id: string }) => {
        const response = await http().get(`/api/examples/${item.id}`).set(teacher);
        return response.body as {
          kind: string;
          intro: string;
          outputs: Record<string, { value: number }>;
        };
      }),
    );
    const byKind = (kind: string) => full.find((example) => example.kind === kind);

    // U.S. Standard Atmosphere 1976, Table I: sea-level air 1.2250 kg/m³; helium's ideal-gas
    // density at 288.15 K, 101 325 Pa is 0.169 28 kg/m³ (check-values.md §3.2), leaving 1.0557.
    const lift = byKind('lifting-gas');
    expect(lift?.intro).toMatch(/Standard Atmosphere 1976/);
    expect(lift?.outputs.airDensity?.value).toBeCloseTo(1.225, 4);
    expect(lift?.outputs.liftPerCubicMetre?.value).toBeCloseTo(1.225 - 0.16928, 3);

    // U.S. Standard Atmosphere 1976, geometric altitude 15 000 m: ρ = 0.194 76 kg/m³; a density
    // 1e-4 off moves the float height by about a metre, so 15 m bounds the table's rounding.
    const float = byKind('flight-profile');
    expect(float?.intro).toMatch(/0\.194 76/);
    expect(Math.abs((float?.outputs.floatAltitude?.value ?? 0) - 15000)).toBeLessThan(15);

    // Faraday's law (F = 96 485.332 C/mol, CODATA 2018): 2391.50 A·h per normal cubic metre of
    // hydrogen (check-values.md §5.2), so 0.1 m³ at 80 A·cells takes 2.989 h = 179.36 min.
    const supply = byKind('gas-supply');
    expect(supply?.intro).toMatch(/Faraday/);
    expect(supply?.outputs.timeToFill?.value).toBeCloseTo((0.1 * 2391.5 * 60) / 80, 1);

    // The student sees the exercises with their answers held back.
    const forStudent = await http().get(`/api/examples/${examples.body[0].id}`).set(student);
    expect(forStudent.body.revealed).toBe(false);
    expect(forStudent.body.outputs.liftPerCubicMetre).toBeUndefined();
  });
});
