import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { createUser, type TestUser } from './support/users';

/** A latex-like sphere given by its mass, sized for 0.3 kg of free lift at a 120 m launch site. */
const sizingInputs = (payloadMassKg = 0.9) => ({
  shape: { shape: 'sphere' },
  envelopeMass: { kind: 'fixed', massKg: 0.6 },
  payloadMassKg,
  target: { kind: 'freeLift', freeLiftKg: 0.3 },
  gas: { gasId: 'helium' },
  ambient: { mode: 'standard', altitudeM: 120 },
});

describe('the design chain: sizing → flight profile → rules check', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let colleague: TestUser;
  const http = () => request(testApp.app.getHttpServer());

  const createSizing = async (user: TestUser, visibility = 'private') => {
    const response = await http()
      .post('/api/calculations')
      .set(user.auth)
      .send({ title: 'Spring pod', kind: 'envelope-sizing', inputs: sizingInputs(), visibility });
    expect(response.status).toBe(201);
    return response.body as { id: string; latest: { outputs: Record<string, { value: number }> } };
  };
  const continueAs = (user: TestUser, id: string, version: number, toKind: string) =>
    http()
      .post(`/api/calculations/${id}/versions/${version}/continue`)
      .set(user.auth)
      .send({ toKind });
  const detail = async (user: TestUser, id: string) =>
    (await http().get(`/api/calculations/${id}`).set(user.auth)).body;

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer']);
    colleague = await createUser(testApp.app, ['designer']);
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('continues a sizing as a flight profile and links the two both ways', async () => {
    const sizing = await createSizing(designer);
    const response = await continueAs(designer, sizing.id, 1, 'flight-profile');
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({
      kind: 'flight-profile',
      title: 'Spring pod → Flight profile',
      latestVersion: 1,
      source: {
        calculationId: sizing.id,
        title: 'Spring pod',
        kind: 'envelope-sizing',
        versionNumber: 1,
        newestVersionNumber: 1,
        needs: ['envelope.burstDiameterM', 'parachute.areaM2'],
      },
      continuations: [],
    });
    // The flight launches at the diameter the sizing solved for, recomputed by the server.
    expect(response.body.latest.inputs.envelope.launchDiameterM).toBe(
      sizing.latest.outputs.size?.value,
    );
    expect(response.body.latest.note).toMatch(/Continued from “Spring pod”, version 1/);
    const source = await detail(designer, sizing.id);
    expect(source.continuations).toEqual([
      { id: response.body.id, title: 'Spring pod → Flight profile', kind: 'flight-profile' },
    ]);
    expect(source.source).toBeNull();
    expect(source.continueAs).toEqual([{ toKind: 'flight-profile', title: 'Flight profile' }]);
  });

  it('continues a flight as a rules check with its payload as one package', async () => {
    const sizing = await createSizing(designer);
    const flight = (await continueAs(designer, sizing.id, 1, 'flight-profile')).body;
    const rules = await continueAs(designer, flight.id, 1, 'balloon-rules');
    expect(rules.status).toBe(201);
    expect(rules.body.latest.inputs.packages).toEqual([{ massKg: 0.9 }]);
    expect(rules.body.source).toMatchObject({ kind: 'flight-profile', needs: ['profileId'] });
  });

  it('says when the source has a newer version, until a save takes it', async () => {
    const sizing = await createSizing(designer);
    const flight = (await continueAs(designer, sizing.id, 1, 'flight-profile')).body;
    const saved = await http()
      .post(`/api/calculations/${sizing.id}/versions`)
      .set(designer.auth)
      .send({ baseVersion: 1, inputs: sizingInputs(1.2) });
    expect(saved.status).toBe(201);
    const behind = await detail(designer, flight.id);
    expect(behind.source).toMatchObject({ versionNumber: 1, newestVersionNumber: 2 });

    const inputs = {
      ...flight.latest.inputs,
      payloadMassKg: 1.2,
      envelope: { ...flight.latest.inputs.envelope, burstDiameterM: 5.5 },
      parachute: { areaM2: 1.1 },
    };
    const taken = await http()
      .post(`/api/calculations/${flight.id}/versions`)
      .set(designer.auth)
      .send({ baseVersion: 1, inputs, sourceVersion: 2 });
    expect(taken.status).toBe(201);
    const current = await detail(designer, flight.id);
    // The burst diameter and the canopy were given, so nothing is left to fill.
    expect(current.source).toMatchObject({ versionNumber: 2, newestVersionNumber: 2, needs: [] });
  });

  it('lets a gas plan fill the flight: its launch volume is the plan line’s', async () => {
    const sizing = await createSizing(designer);
    const flight = (await continueAs(designer, sizing.id, 1, 'flight-profile')).body;
    const response = await http()
      .post('/api/plans')
      .set(designer.auth)
      .send({
        title: 'Launch day',
        lines: [{ calculationId: flight.id, count: 2 }],
        fill: { temperatureK: 288.15, pressurePa: 101325 },
        cylinder: {
          gasId: 'helium',
          waterVolumeM3: 0.05,
          fillPressurePa: 2e7,
          temperatureK: 288.15,
        },
      });
    expect(response.status).toBe(201);
    const diameterM = flight.latest.inputs.envelope.launchDiameterM as number;
    // V = π·d³/6 of the launch sphere (CRC Standard Mathematical Tables, sphere).
    expect(response.body.result.lines[0].volumeM3).toBeCloseTo((Math.PI * diameterM ** 3) / 6, 9);
  });

  it('refuses a source version the source does not have', async () => {
    const sizing = await createSizing(designer);
    const flight = (await continueAs(designer, sizing.id, 1, 'flight-profile')).body;
    const response = await http()
      .post(`/api/calculations/${flight.id}/versions`)
      .set(designer.auth)
      .send({ baseVersion: 1, inputs: flight.latest.inputs, sourceVersion: 7 });
    expect(response.status).toBe(422);
    expect(response.body.field).toBe('sourceVersion');
  });

  it('answers 403 to a student and a reviewer, who may not create calculations', async () => {
    const sizing = await createSizing(designer, 'published');
    for (const roles of [['student'], ['reviewer']] as const) {
      const user = await createUser(testApp.app, [...roles]);
      expect((await detail(user, sizing.id)).continueAs).toEqual([]);
      const response = await continueAs(user, sizing.id, 1, 'flight-profile');
      expect(response.status).toBe(403);
      expect(response.body.message).toMatch(/designer or teacher/);
    }
  });

  it('answers 422 naming the kind for a kind the source does not continue into', async () => {
    const sizing = await createSizing(designer);
    const response = await continueAs(designer, sizing.id, 1, 'balloon-rules');
    expect(response.status).toBe(422);
    expect(response.body.field).toBe('toKind');
    expect(response.body.message).toMatch(/Envelope sizing does not continue into a Balloon rules/);
  });

  it('reports a source that cannot make the next kind on toKind, the one field the request has', async () => {
    const created = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .send({
        title: 'Heated pod',
        kind: 'envelope-sizing',
        inputs: { ...sizingInputs(), gas: { gasId: 'hot-air', superheatK: 80 } },
      });
    expect(created.status).toBe(201);
    const response = await continueAs(designer, created.body.id, 1, 'flight-profile');
    expect(response.status).toBe(422);
    expect(response.body.field).toBe('toKind');
    expect(response.body.message).toMatch(
      /version 1 cannot continue as a Flight profile: its gas\.gasId/,
    );
  });

  it('shows a source the reader may not open without its name, and hides private continuations', async () => {
    const sizing = await createSizing(designer, 'team');
    const flight = (await continueAs(colleague, sizing.id, 1, 'flight-profile')).body;
    const madePrivate = await http()
      .patch(`/api/calculations/${sizing.id}`)
      .set(designer.auth)
      .send({ visibility: 'private' });
    expect(madePrivate.status).toBe(200);
    expect((await detail(colleague, flight.id)).source).toEqual({
      calculationId: null,
      title: null,
      kind: 'envelope-sizing',
      versionNumber: 1,
      newestVersionNumber: null,
      needs: ['envelope.burstDiameterM', 'parachute.areaM2'],
    });
    // The colleague's flight is private to them: the sizing's owner does not see it listed.
    expect(madePrivate.body.continuations).toEqual([]);
  });
});
