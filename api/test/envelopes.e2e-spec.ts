import { evaluate } from '@loftwright/buoyancy';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

const AMBIENT = { temperatureK: 286.15, pressurePa: 100900, relativeHumidity: 0.7 };
const practice = (overrides: Record<string, unknown> = {}) => ({
  name: 'Club sphere 600 g',
  kind: 'extensible',
  massKg: 0.6,
  burstDiameterM: 6,
  dragCoefficient: 0.35,
  film: 'natural latex',
  notes: 'Weighed on the club scale.',
  ...overrides,
});

describe('the envelope library', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let reviewer: TestUser;
  let teacher: TestUser;
  let student: TestUser;
  let admin: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer'], 'designer');
    reviewer = await createUser(testApp.app, ['reviewer'], 'reviewer');
    teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    student = await createUser(testApp.app, ['student'], 'student');
    admin = await createUser(testApp.app, ['admin'], 'admin');
    const created = await http().post('/api/calculations').set(designer.auth).send({
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

  it('starts with invented starter envelopes, each marked as an example', async () => {
    const list = await http().get('/api/envelopes').set(reviewer.auth);
    expect(list.status).toBe(200);
    const names = (list.body as { name: string }[]).map((envelope) => envelope.name);
    expect(names).toEqual(
      expect.arrayContaining(['Practice sphere 100 g', 'Practice sphere 300 g']),
    );
    for (const envelope of list.body as { notes: string; permissions: object }[]) {
      expect(envelope.notes).toMatch(/^Example values/);
      // A reviewer reads the library but does not change it.
      expect(envelope.permissions).toEqual({ edit: false, remove: false });
    }
    const sphere = (list.body as { name: string }[]).find(
      (envelope) => envelope.name === 'Practice sphere 300 g',
    );
    expect(sphere).toMatchObject({ kind: 'extensible', massKg: 0.3, ratedSuperpressurePa: null });
  });

  it('keeps the library from students, and its changes for designers and admins', async () => {
    expect((await http().get('/api/envelopes').set(student.auth)).status).toBe(403);
    expect((await http().get('/api/envelopes').set(teacher.auth)).status).toBe(200);
    expect((await http().post('/api/envelopes').set(teacher.auth).send(practice())).status).toBe(
      403,
    );
    expect((await http().post('/api/envelopes').set(reviewer.auth).send(practice())).status).toBe(
      403,
    );
    const byAdmin = await http()
      .post('/api/envelopes')
      .set(admin.auth)
      .send(practice({ name: 'Admin sphere' }));
    expect(byAdmin.status).toBe(201);
    expect(byAdmin.body.permissions).toEqual({ edit: true, remove: true });
  });

  it.each([
    [{ massKg: -0.1 }, 'massKg', /Mass must be at least 0 kg/],
    [{ massKg: 'heavy' }, 'massKg', /Mass must be a number/],
    [{ burstDiameterM: undefined }, 'burstDiameterM', /Burst diameter is needed/],
    [{ burstDiameterM: 80 }, 'burstDiameterM', /Burst diameter must be at most 50 m/],
    [{ dragCoefficient: 9 }, 'dragCoefficient', /Drag coefficient must be at most 2/],
    [{ kind: 'fixed' }, 'ratedSuperpressurePa', /Rated superpressure is needed/],
    [{ kind: 'floppy' }, 'kind', /Kind must be extensible or fixed/],
    [{ name: '  ' }, 'name', /Name is needed/],
  ])('refuses %o with a 400 naming %s by its label', async (overrides, field, reason) => {
    const response = await http()
      .post('/api/envelopes')
      .set(designer.auth)
      .send(practice(overrides));
    expect(response.status).toBe(400);
    expect(response.body.issues).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ field, reason: expect.stringMatching(reason) }),
      ]),
    );
  });

  it('changes an envelope from the version it started from, and refuses a stale one with 409', async () => {
    const created = await http().post('/api/envelopes').set(designer.auth).send(practice());
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ version: 1, fillCount: 0, history: [] });
    const id = created.body.id as string;
    const first = await http()
      .put(`/api/envelopes/${id}`)
      .set(designer.auth)
      .send({ ...practice({ massKg: 0.62 }), version: 1 });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ version: 2, massKg: 0.62 });
    const stale = await http()
      .put(`/api/envelopes/${id}`)
      .set(admin.auth)
      .send({ ...practice({ massKg: 0.7 }), version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ field: 'version', latest: { version: 2, massKg: 0.62 } });
    // A fixed envelope keeps its rating and drops the burst diameter it has no use for.
    const fixed = await http()
      .put(`/api/envelopes/${id}`)
      .set(designer.auth)
      .send({
        ...practice({ kind: 'fixed', burstDiameterM: undefined, ratedSuperpressurePa: 1200 }),
        version: 2,
      });
    expect(fixed.status).toBe(200);
    expect(fixed.body).toMatchObject({
      kind: 'fixed',
      burstDiameterM: null,
      ratedSuperpressurePa: 1200,
    });
    const trail = await http().get('/api/admin/audit?action=envelope.update').set(admin.auth);
    expect(trail.body.items).toHaveLength(2);
    expect(trail.body.items[0].summary).toMatch(/changed a library envelope/);
  });

  it('lists the fills that name an envelope, measured against predicted, and keeps it while they do', async () => {
    const created = await http()
      .post('/api/envelopes')
      .set(designer.auth)
      .send(practice({ name: 'Filled sphere' }));
    const envelopeId = created.body.id as string;
    const logged = await http()
      .post(`/api/calculations/${calculationId}/versions/1/fill-logs`)
      .set(designer.auth)
      .send({
        filledAt: '2026-11-28T09:40:00Z',
        place: 'North hut',
        envelopeId,
        gasSource: 'cylinder',
        ambient: AMBIENT,
        readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.31 }],
      });
    expect(logged.status).toBe(201);
    expect(logged.body.envelopeId).toBe(envelopeId);

    const detail = await http().get(`/api/envelopes/${envelopeId}`).set(reviewer.auth);
    expect(detail.status).toBe(200);
    expect(detail.body.fillCount).toBe(1);
    expect(detail.body.history).toHaveLength(1);
    const [fill] = detail.body.history;
    expect(fill).toMatchObject({
      fillLogId: logged.body.id,
      calculationTitle: 'Tethered sphere',
      versionNumber: 1,
      place: 'North hut',
    });
    // Measured with ballast: ballast − scale = 0.500 − 0.310 = 0.190 kg.
    expect(fill.measuredNetLiftKg).toBeCloseTo(0.19, 12);
    // Predicted: the lift check of version 1 with no payload in the logged air, recomputed here
    // with the engine independently of the fill-log and library code paths.
    const predicted = evaluate('lift-check', {
      ...liftCheckInputs(),
      payloadMassKg: 0,
      ambient: {
        mode: 'measured',
        temperatureK: AMBIENT.temperatureK,
        pressurePa: AMBIENT.pressurePa,
        humidity: { kind: 'relative', relativeHumidity: AMBIENT.relativeHumidity },
      },
    }).outputs.netLift?.value;
    expect(fill.predictedNetLiftKg).toBeCloseTo(predicted ?? Number.NaN, 12);
    // A student, who may not read the library, learns nothing of it.
    expect((await http().get(`/api/envelopes/${envelopeId}`).set(student.auth)).status).toBe(403);

    expect(detail.body.permissions).toEqual({ edit: false, remove: false });
    const refused = await http().delete(`/api/envelopes/${envelopeId}`).set(designer.auth);
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/named by 1 fill log/);

    // Unlinking the log frees the envelope.
    const unlinked = await http()
      .patch(`/api/fill-logs/${logged.body.id}`)
      .set(designer.auth)
      .send({ envelopeId: null });
    expect(unlinked.status).toBe(200);
    expect(unlinked.body.envelopeId).toBeNull();
    expect((await http().delete(`/api/envelopes/${envelopeId}`).set(designer.auth)).status).toBe(
      204,
    );
    expect((await http().get(`/api/envelopes/${envelopeId}`).set(designer.auth)).status).toBe(404);
  });

  it('counts for each reader only the fills of calculations they may open, yet keeps a filled envelope', async () => {
    const created = await http()
      .post('/api/envelopes')
      .set(designer.auth)
      .send(practice({ name: 'Privately filled sphere' }));
    const envelopeId = created.body.id as string;
    const own = await http().post('/api/calculations').set(designer.auth).send({
      title: 'Private trial',
      kind: 'lift-check',
      inputs: liftCheckInputs(),
      visibility: 'private',
    });
    const logged = await http()
      .post(`/api/calculations/${own.body.id}/versions/1/fill-logs`)
      .set(designer.auth)
      .send({
        filledAt: '2026-11-29T10:00:00Z',
        envelopeId,
        gasSource: 'cylinder',
        ambient: AMBIENT,
        readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.3 }],
      });
    expect(logged.status).toBe(201);
    const colleague = await createUser(testApp.app, ['designer'], 'colleague');
    const seenByOwner = await http().get(`/api/envelopes/${envelopeId}`).set(designer.auth);
    const seenByColleague = await http().get(`/api/envelopes/${envelopeId}`).set(colleague.auth);
    expect(seenByOwner.body).toMatchObject({
      fillCount: 1,
      history: [{ fillLogId: logged.body.id }],
    });
    // The colleague may not open the private calculation, so learns nothing of its fill ...
    expect(seenByColleague.body).toMatchObject({ fillCount: 0, history: [] });
    // ... yet may not remove an envelope whose history someone else keeps.
    expect(seenByColleague.body.permissions).toEqual({ edit: true, remove: false });
  });

  it('refuses a fill log naming an envelope the library does not hold, naming the field', async () => {
    const response = await http()
      .post(`/api/calculations/${calculationId}/versions/1/fill-logs`)
      .set(designer.auth)
      .send({
        filledAt: '2026-11-28T09:40:00Z',
        envelopeId: '00000000-0000-4000-8000-000000000000',
        gasSource: 'cylinder',
        ambient: AMBIENT,
        readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.31 }],
      });
    expect(response.status).toBe(422);
    expect(response.body.field).toBe('envelopeId');
    const malformed = await http()
      .post(`/api/calculations/${calculationId}/versions/1/fill-logs`)
      .set(designer.auth)
      .send({ envelopeId: 'not-an-id' });
    expect(malformed.status).toBe(400);
    expect(JSON.stringify(malformed.body.issues)).toMatch(/Envelope must be an envelope/);
  });

  it('answers 404 for an envelope that does not exist and 400 for an id that is not one', async () => {
    const missing = await http()
      .get('/api/envelopes/00000000-0000-4000-8000-000000000000')
      .set(designer.auth);
    expect(missing.status).toBe(404);
    expect((await http().get('/api/envelopes/nope').set(designer.auth)).status).toBe(400);
  });
});
