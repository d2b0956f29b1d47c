import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

const FILL = { temperatureK: 288.15, pressurePa: 101325 };

describe('gas and cost plans', () => {
  let testApp: TestApp;
  let planner: TestUser;
  let other: TestUser;
  let student: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    planner = await createUser(testApp.app, ['designer'], 'planner');
    other = await createUser(testApp.app, ['designer'], 'other');
    student = await createUser(testApp.app, ['student'], 'student');
    const created = await http()
      .post('/api/calculations')
      .set(planner.auth)
      .send({ title: 'Metre sphere', kind: 'lift-check', inputs: liftCheckInputs() });
    calculationId = created.body.id;
  });

  afterAll(async () => {
    await testApp.close();
  });

  const plan = (overrides: Record<string, unknown> = {}) => ({
    title: 'Spring launch weekend',
    eventDate: '2027-04-17',
    lines: [
      { calculationId, count: 4 },
      { label: 'Pilot balloons', volumeM3: 0.1, count: 10 },
    ],
    fill: FILL,
    cylinder: { gasId: 'helium', waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15 },
    prices: { currency: 'EUR', cylinderEach: 320, bulkGasPerM3: 40 },
    pricesDate: '2026-11-30',
    ...overrides,
  });

  it('takes each envelope’s volume from its calculation version and totals the plan', async () => {
    const response = await http().post('/api/plans').set(planner.auth).send(plan());
    expect(response.status).toBe(201);
    const { lines, totalM3, outputs } = response.body.result;
    // A 1 m sphere holds π/6 = 0.523599 m³ (sphere volume, CRC Standard Mathematical Tables).
    expect(lines[0]).toMatchObject({ label: 'Metre sphere (v1)', count: 4, versionNumber: 1 });
    expect(lines[0].volumeM3).toBeCloseTo(Math.PI / 6, 9);
    expect(lines[1]).toMatchObject({
      label: 'Pilot balloons',
      volumeM3: 0.1,
      count: 10,
      totalM3: 1,
    });
    expect(totalM3).toBeCloseTo((4 * Math.PI) / 6 + 1, 9);
    expect(outputs.totalVolume.value).toBeCloseTo(totalM3, 9);
    expect(outputs.cylindersNeeded.value).toBeGreaterThan(0);
    expect(outputs.bulkCost.unit).toBe('EUR');
    expect(response.body.inputs.pricesDate).toBe('2026-11-30');
  });

  it('sizes an ad-hoc sphere from its diameter', async () => {
    const response = await http()
      .post('/api/plans')
      .set(planner.auth)
      .send(plan({ lines: [{ diameterM: 2, count: 3 }] }));
    expect(response.status).toBe(201);
    // V = π·d³/6 = 4.18879 m³ for d = 2 m (CRC Standard Mathematical Tables, sphere).
    expect(response.body.result.lines[0]).toMatchObject({ label: 'Sphere of 2 m', count: 3 });
    expect(response.body.result.lines[0].volumeM3).toBeCloseTo(4.18879, 5);
    expect(response.body.result.totalM3).toBeCloseTo(3 * 4.18879, 4);
  });

  it('recomputes on every save and keeps plans to their owner', async () => {
    const created = await http().post('/api/plans').set(planner.auth).send(plan());
    const id = created.body.id;
    const replaced = await http()
      .put(`/api/plans/${id}`)
      .set(planner.auth)
      .send(plan({ lines: [{ label: 'Only pilots', volumeM3: 0.1, count: 30 }] }));
    expect(replaced.status).toBe(200);
    expect(replaced.body.result.totalM3).toBeCloseTo(3, 12);
    expect((await http().get(`/api/plans/${id}`).set(other.auth)).status).toBe(404);
    const list = await http().get('/api/plans').set(other.auth);
    expect(list.body.map((item: { id: string }) => item.id)).not.toContain(id);
    expect((await http().delete(`/api/plans/${id}`).set(planner.auth)).status).toBe(204);
    expect((await http().get(`/api/plans/${id}`).set(planner.auth)).status).toBe(404);
  });

  it.each([
    ['a line with neither a calculation nor a size', { lines: [{ count: 2 }] }, 400, 'lines.0'],
    [
      'a sphere too small to fill',
      { lines: [{ diameterM: 0.001, count: 1 }] },
      400,
      'diameterM must be at least 0.01 m',
    ],
    [
      'a calculation the planner may not see',
      { lines: [{ calculationId: '00000000-0000-4000-8000-000000000000', count: 1 }] },
      404,
      'lines.0.calculationId',
    ],
    ['a count that is not whole', { lines: [{ volumeM3: 1, count: 2.5 }] }, 400, 'count'],
    ['a negative volume', { lines: [{ volumeM3: -1, count: 2 }] }, 422, 'lines.0.volumeM3'],
    [
      'an impossible electrolyser',
      {
        electrolyser: {
          currentA: -3,
          cellsInSeries: 2,
          voltage: { kind: 'cell', cellVoltageV: 2 },
        },
      },
      422,
      'electrolyser.currentA',
    ],
  ])('refuses %s, naming the field', async (_label, overrides, status, field) => {
    const response = await http().post('/api/plans').set(planner.auth).send(plan(overrides));
    expect(response.status).toBe(status);
    const fields = [
      response.body.field,
      ...(response.body.issues ?? []).map((i: { field: string }) => i.field),
      response.body.message,
    ];
    expect(fields.join(' ')).toContain(field);
  });

  it('lets only designers and teachers plan', async () => {
    expect((await http().post('/api/plans').set(student.auth).send(plan())).status).toBe(403);
  });

  it('exports the plan lines as CSV', async () => {
    const created = await http().post('/api/plans').set(planner.auth).send(plan());
    const response = await http().get(`/api/plans/${created.body.id}/export`).set(planner.auth);
    const rows = Papa.parse<string[]>(response.text.replace(/^\uFEFF/, '').trim()).data;
    expect(rows[0]?.[0]).toBe('Envelope');
    expect(rows.slice(1).map((row) => [row[0], row[4]])).toEqual([
      ['Metre sphere (v1)', '4'],
      ['Pilot balloons', '10'],
    ]);
  });
});
