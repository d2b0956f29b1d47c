import { evaluate } from '@loftwright/buoyancy';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

const AMBIENT = { temperatureK: 286.15, pressurePa: 100900, relativeHumidity: 0.7 };
const fillLog = (overrides: Record<string, unknown> = {}) => ({
  filledAt: '2026-11-28T09:40:00Z',
  place: 'North hut',
  envelopeLabel: 'Envelope 3',
  gasSource: 'cylinder',
  ambient: AMBIENT,
  readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.31 }],
  ...overrides,
});

describe('fill logs', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let teammate: TestUser;
  let student: TestUser;
  let calculationId: string;
  const server = () => testApp.app.getHttpServer();

  beforeAll(async () => {
    testApp = await createTestApp();
    owner = await createUser(testApp.app, ['designer'], 'owner');
    teammate = await createUser(testApp.app, ['designer'], 'teammate');
    student = await createUser(testApp.app, ['student'], 'student');
    const created = await request(server()).post('/api/calculations').set(owner.auth).send({
      title: 'Tethered sphere',
      kind: 'lift-check',
      inputs: liftCheckInputs(),
      visibility: 'team',
    });
    calculationId = created.body.id;
  });

  afterAll(async () => {
    await testApp.close();
  });

  const create = (user: TestUser, body: unknown, version = 1) =>
    request(server())
      .post(`/api/calculations/${calculationId}/versions/${version}/fill-logs`)
      .set(user.auth)
      .send(body as object);

  it('reduces the readings on the server against the version’s design in the logged air', async () => {
    const response = await create(owner, fillLog());
    expect(response.status).toBe(201);
    // Measured: ballast − scale = 0.500 − 0.310 = 0.190 kg.
    expect(response.body.outputs.measuredNetLift.value).toBeCloseTo(0.19, 12);
    // The prediction is the lift check of version 1 with no payload, at 13 °C, 1009 hPa, 70 % RH:
    // recomputed here with the engine independently of the fill-log code path.
    const expected = evaluate('lift-check', {
      ...liftCheckInputs(),
      payloadMassKg: 0,
      ambient: {
        mode: 'measured',
        temperatureK: AMBIENT.temperatureK,
        pressurePa: AMBIENT.pressurePa,
        humidity: { kind: 'relative', relativeHumidity: AMBIENT.relativeHumidity },
      },
    }).outputs.netLift?.value;
    expect(response.body.outputs.predictedNetLift.value).toBeCloseTo(expected ?? Number.NaN, 12);
    expect(response.body.points).toEqual([
      { timeS: 0, measuredKg: expect.closeTo(0.19, 12), predictedKg: expected },
    ]);
    expect(response.body).toMatchObject({
      versionNumber: 1,
      place: 'North hut',
      gasSource: 'cylinder',
      createdBy: { id: owner.id },
    });
  });

  it('keeps the logged instruments and widens the measured lift’s uncertainty with them', async () => {
    const instrument = { scaleResolutionKg: 0.01, ballastToleranceKg: 0.002 };
    const coarse = await create(owner, fillLog({ instrument }));
    expect(coarse.status).toBe(201);
    expect(coarse.body.instrument).toEqual(instrument);
    const fine = await create(owner, fillLog());
    expect(fine.body.instrument).toBeNull();
    // GUM (JCGM 100:2008) rectangular distributions, k = 2: δ/(2√3) for the scale, a/√3 for
    // the ballast.
    const expected = 2 * Math.hypot(0.01 / (2 * Math.sqrt(3)), 0.002 / Math.sqrt(3));
    expect(coarse.body.outputs.measuredUncertainty.value).toBeCloseTo(expected, 12);
    expect(fine.body.outputs.measuredUncertainty.value).toBeLessThan(expected / 5);
    // Still there after an import of more readings.
    const imported = await request(server())
      .post(`/api/fill-logs/${coarse.body.id}/readings`)
      .set(owner.auth)
      .send({
        mode: 'append',
        readings: [{ kind: 'ballast', timeS: 3600, ballastMassKg: 0.5, scaleReadingKg: 0.32 }],
      });
    expect(imported.status).toBe(201);
    expect(imported.body.outputs.measuredUncertainty.value).toBeCloseTo(expected, 12);

    const refused = await create(
      owner,
      fillLog({ instrument: { scaleResolutionKg: -0.001, ballastToleranceKg: 0 } }),
    );
    expect(refused.status).toBe(422);
    expect(JSON.stringify(refused.body)).toMatch(/instrument\.scaleResolutionKg/);
  });

  it('ignores numbers a client sends as results', async () => {
    const response = await create(owner, {
      ...fillLog(),
      outputs: { measuredNetLift: { value: 99 } },
    });
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/outputs should not exist/);
  });

  it.each([
    ['no readings', { readings: [] }, 'readings'],
    [
      'a reading of an unknown kind',
      { readings: [{ kind: 'guess', timeS: 0 }] },
      'readings.0.kind',
    ],
    [
      'a scale reading that is not a number',
      { readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 'heavy' }] },
      'readings.0.scaleReadingKg',
    ],
    [
      'air hotter than the model allows',
      { ambient: { ...AMBIENT, temperatureK: 600 } },
      'ambient.temperatureK',
    ],
    ['an unknown gas source', { gasSource: 'volcano' }, 'gasSource'],
    ['a date that is not one', { filledAt: 'last Tuesday' }, 'filledAt'],
  ])('refuses %s with 400/422 naming the field', async (_label, overrides, field) => {
    const response = await create(owner, fillLog(overrides));
    expect([400, 422]).toContain(response.status);
    const fields = [
      response.body.field,
      ...(response.body.issues ?? []).map((i: { field: string }) => i.field),
    ];
    expect(fields.join(' ')).toContain(field);
  });

  it('answers 404 for a version that does not exist', async () => {
    const response = await create(owner, fillLog(), 7);
    expect(response.status).toBe(404);
    expect(response.body.field).toBe('n');
  });

  it('lets the team read logs but only the owner write them; hides them from others', async () => {
    const listed = await request(server())
      .get(`/api/calculations/${calculationId}/fill-logs`)
      .set(teammate.auth);
    expect(listed.status).toBe(200);
    expect(listed.body.length).toBeGreaterThan(0);
    expect((await create(teammate, fillLog())).status).toBe(403);
    const hidden = await request(server())
      .get(`/api/calculations/${calculationId}/fill-logs`)
      .set(student.auth);
    expect(hidden.status).toBe(404);
    const one = await request(server())
      .get(`/api/fill-logs/${listed.body[0].id}`)
      .set(student.auth);
    expect(one.status).toBe(404);
  });

  it('imports a series of readings in one write, fitting the loss of lift', async () => {
    const created = await create(
      owner,
      fillLog({ readings: [{ kind: 'direct', timeS: 0, netLiftKg: 0.4 }] }),
    );
    const id = created.body.id;
    // Lift halving every 2 days: 0.4·2^(−t/2 d); the fit gives back the 2-day half-life.
    const day = 86400;
    const series = [1, 2, 3].map((days) => ({
      kind: 'direct',
      timeS: days * day,
      netLiftKg: 0.4 * 2 ** (-days / 2),
    }));
    const imported = await request(server())
      .post(`/api/fill-logs/${id}/readings`)
      .set(owner.auth)
      .send({ mode: 'append', readings: series });
    expect(imported.status).toBe(201);
    expect(imported.body.readings).toHaveLength(4);
    expect(imported.body.outputs.halfLife.value).toBeCloseTo(2, 9);
    expect(imported.body.points).toHaveLength(4);
  });

  it('stores nothing of an import with one bad row', async () => {
    const created = await create(owner, fillLog());
    const id = created.body.id;
    const response = await request(server())
      .post(`/api/fill-logs/${id}/readings`)
      .set(owner.auth)
      .send({
        mode: 'append',
        readings: [
          { kind: 'ballast', timeS: 600, ballastMassKg: 0.5, scaleReadingKg: 0.311 },
          { kind: 'ballast', timeS: 1200, ballastMassKg: -3, scaleReadingKg: 0.312 },
          { kind: 'ballast', timeS: 1800, ballastMassKg: 0.5, scaleReadingKg: 0.313 },
        ],
      });
    expect(response.status).toBe(422);
    expect(response.body.issues.map((issue: { field: string }) => issue.field)).toContain(
      'readings.2.ballastMassKg',
    );
    const after = await request(server()).get(`/api/fill-logs/${id}`).set(owner.auth);
    expect(after.body.readings).toHaveLength(1);
  });

  it('updates a log and recomputes it; removes it with its files', async () => {
    const created = await create(owner, fillLog());
    const id = created.body.id;
    const updated = await request(server())
      .patch(`/api/fill-logs/${id}`)
      .set(owner.auth)
      .send({ readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.3 }] });
    expect(updated.status).toBe(200);
    expect(updated.body.outputs.measuredNetLift.value).toBeCloseTo(0.2, 12);

    const photo = await request(server())
      .post(`/api/calculations/${calculationId}/attachments`)
      .set(owner.auth)
      .field('fillLogId', id)
      .attach('file', Buffer.from('time_s,kg\n0,0.3\n'), 'scale.csv');
    expect(photo.status).toBe(201);
    expect(photo.body.fillLogId).toBe(id);

    expect((await request(server()).delete(`/api/fill-logs/${id}`).set(owner.auth)).status).toBe(
      204,
    );
    expect((await request(server()).get(`/api/fill-logs/${id}`).set(owner.auth)).status).toBe(404);
    expect((await request(server()).get(photo.body.contentUrl).set(owner.auth)).status).toBe(404);
  });

  it('refuses a file for a fill log of another calculation', async () => {
    const other = await request(server())
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Other', kind: 'lift-check', inputs: liftCheckInputs() });
    const log = await create(owner, fillLog());
    const response = await request(server())
      .post(`/api/calculations/${other.body.id}/attachments`)
      .set(owner.auth)
      .field('fillLogId', log.body.id)
      .attach('file', Buffer.from('a,b\n1,2\n'), 'x.csv');
    expect(response.status).toBe(404);
    expect(response.body.field).toBe('fillLogId');
  });
});
