import { evaluate } from '@loftwright/buoyancy';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

describe('calculations', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let other: TestUser;
  const http = () => request(testApp.app.getHttpServer());

  const create = (user: TestUser, body: Record<string, unknown> = {}) =>
    http()
      .post('/api/calculations')
      .set(user.auth)
      .send({ title: 'Survey sphere', kind: 'lift-check', inputs: liftCheckInputs(), ...body });

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer']);
    other = await createUser(testApp.app, ['designer']);
  });
  afterAll(async () => {
    await testApp.close();
  });

  describe('POST /api/calculations', () => {
    it('stores version 1 with outputs recomputed by the server, the engine version and a fingerprint', async () => {
      const response = await create(designer, { tags: ['spring', 'spring'] });
      expect(response.status).toBe(201);
      expect(response.body).toMatchObject({
        title: 'Survey sphere',
        kind: 'lift-check',
        latestVersion: 1,
        status: 'draft',
        visibility: 'private',
        tags: ['spring'],
      });
      const version = response.body.latest;
      const expected = evaluate('lift-check', liftCheckInputs());
      expect(version.outputs.freeLift.value).toBe(expected.outputs.freeLift?.value);
      expect(version.steps).toHaveLength(expected.steps.length);
      expect(version.fingerprint).toMatch(/^[0-9a-f]{64}$/);
      expect(version.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
      // Defaults are stored as the engine read them.
      expect(version.inputs.gas).toMatchObject({ gasId: 'helium', purity: 1, superheatK: 0 });
    });

    it('never takes numbers from the client: an outputs field is refused, not stored', async () => {
      const withOutputs = await create(designer, { outputs: { freeLift: { value: 99 } } });
      expect(withOutputs.status).toBe(400);
      expect(withOutputs.body.field).toBe('outputs');
      const smuggled = await create(designer, { inputs: { ...liftCheckInputs(), freeLift: 99 } });
      expect(smuggled.status).toBe(422);
      expect(smuggled.body.field).toBe('inputs');
    });

    it('answers 422 naming the field inside inputs for a value out of the model’s range', async () => {
      const response = await create(designer, {
        inputs: liftCheckInputs({ ambient: { mode: 'standard', altitudeM: 120000 } }),
      });
      expect(response.status).toBe(422);
      expect(response.body.field).toBe('inputs.ambient.altitudeM');
      expect(response.body.issues[0].range).toEqual({ min: -5000, max: 86000, unit: 'm' });
    });

    it('keeps a seldom-met value as typed and records its "check this" note with the version', async () => {
      const response = await create(designer, {
        inputs: liftCheckInputs({ envelope: { shape: 'sphere', diameterM: 120 } }),
      });
      expect(response.status).toBe(201);
      const version = response.body.latest;
      expect(version.inputs.envelope.diameterM).toBe(120);
      expect(version.warnings).toContainEqual({
        code: 'check-this',
        severity: 'note',
        field: 'envelope.diameterM',
        message: expect.stringMatching(/^Check this: Diameter is 120 m, above the usual 100 m/),
      });
      // Read back, the note is still there: it is part of the stored version.
      const stored = await http().get(`/api/calculations/${response.body.id}`).set(designer.auth);
      expect(
        stored.body.latest.warnings.filter((w: { code: string }) => w.code === 'check-this'),
      ).toHaveLength(1);
    });

    it('refuses users without an author role', async () => {
      const reviewer = await createUser(testApp.app, ['reviewer']);
      expect((await create(reviewer)).status).toBe(403);
    });
  });

  describe('POST /api/calculations/:id/versions', () => {
    it('appends version n+1 based on the newest, and 409s a stale base without losing either text', async () => {
      const id = (await create(designer)).body.id as string;
      const second = await http()
        .post(`/api/calculations/${id}/versions`)
        .set(designer.auth)
        .send({
          baseVersion: 1,
          inputs: liftCheckInputs({ payloadMassKg: 0.25 }),
          note: 'heavier',
        });
      expect(second.status).toBe(201);
      expect(second.body).toMatchObject({ number: 2, note: 'heavier', status: 'draft' });

      const staleInputs = liftCheckInputs({ payloadMassKg: 0.3 });
      const stale = await http()
        .post(`/api/calculations/${id}/versions`)
        .set(designer.auth)
        .send({ baseVersion: 1, inputs: staleInputs, note: 'mine' });
      expect(stale.status).toBe(409);
      expect(stale.body.field).toBe('baseVersion');
      expect(stale.body.latest.number).toBe(2);
      expect(stale.body.latest.inputs.payloadMassKg).toBe(0.25);
      expect(stale.body.yours).toEqual({ baseVersion: 1, inputs: staleInputs, note: 'mine' });

      const detail = await http().get(`/api/calculations/${id}`).set(designer.auth);
      expect(detail.body.versions.map((version: { number: number }) => version.number)).toEqual([
        1, 2,
      ]);
    });

    it('lets exactly one of several concurrent saves from the same base win', async () => {
      const id = (await create(designer)).body.id as string;
      const attempts = await Promise.all(
        [0.21, 0.22, 0.23, 0.24, 0.25].map((payloadMassKg) =>
          http()
            .post(`/api/calculations/${id}/versions`)
            .set(designer.auth)
            .send({
              baseVersion: 1,
              inputs: liftCheckInputs({ payloadMassKg }),
              note: String(payloadMassKg),
            }),
        ),
      );
      const statuses = attempts.map((attempt) => attempt.status).sort();
      expect(statuses).toEqual([201, 409, 409, 409, 409]);
      const losers = attempts.filter((attempt) => attempt.status === 409);
      // Every losing text comes back to its sender.
      expect(new Set(losers.map((loser) => loser.body.yours.note)).size).toBe(4);
      const versions = await testApp.app
        .get(DataSource)
        .query(`SELECT number FROM calculation_version WHERE calculation_id = ?`, [id]);
      expect(versions).toHaveLength(2);
    });

    it('is forbidden to anyone but the owner (404 when they cannot even see it)', async () => {
      const id = (await create(designer)).body.id as string;
      const response = await http()
        .post(`/api/calculations/${id}/versions`)
        .set(other.auth)
        .send({ baseVersion: 1, inputs: liftCheckInputs() });
      expect(response.status).toBe(404);
      await http().patch(`/api/calculations/${id}`).set(designer.auth).send({ visibility: 'team' });
      const visible = await http()
        .post(`/api/calculations/${id}/versions`)
        .set(other.auth)
        .send({ baseVersion: 1, inputs: liftCheckInputs() });
      expect(visible.status).toBe(403);
    });
  });

  describe('stored versions', () => {
    it('cannot be changed or deleted, even by SQL', async () => {
      const id = (await create(designer)).body.id as string;
      const db = testApp.app.get(DataSource);
      await expect(
        db.query(`UPDATE calculation_version SET inputs = '{}' WHERE calculation_id = ?`, [id]),
      ).rejects.toThrow(/immutable/);
      await expect(
        db.query(`DELETE FROM calculation_version WHERE calculation_id = ?`, [id]),
      ).rejects.toThrow(/never deleted/);
    });

    it('GET .../versions/:a/diff/:b lists changed inputs and outputs', async () => {
      const id = (await create(designer)).body.id as string;
      await http()
        .post(`/api/calculations/${id}/versions`)
        .set(designer.auth)
        .send({
          baseVersion: 1,
          inputs: liftCheckInputs({
            payloadMassKg: 0.4,
            envelope: { shape: 'sphere', diameterM: 1.2 },
          }),
        });
      const diff = await http().get(`/api/calculations/${id}/versions/1/diff/2`).set(designer.auth);
      expect(diff.status).toBe(200);
      expect(diff.body.inputs).toEqual([
        { path: 'envelope.diameterM', from: 1, to: 1.2 },
        { path: 'payloadMassKg', from: 0.2, to: 0.4 },
      ]);
      const names = diff.body.outputs.map((change: { name: string }) => change.name);
      expect(names).toEqual(expect.arrayContaining(['freeLift', 'volume', 'grossLift']));
      expect(names).not.toContain('airDensity');
      expect(
        (await http().get(`/api/calculations/${id}/versions/1/diff/9`).set(designer.auth)).status,
      ).toBe(404);
    });
  });

  describe('GET /api/calculations', () => {
    it('pages, sorts, filters by kind, status, owner, tag and text, and shows only what the user may see', async () => {
      const mine = await createUser(testApp.app, ['designer']);
      const titles = ['Alpha pod', 'Bravo sled', 'Charlie kite'];
      for (const [index, title] of titles.entries()) {
        await create(mine, {
          title,
          tags: index === 1 ? ['sled'] : [],
          kind: index === 2 ? 'envelope-geometry' : 'lift-check',
          inputs: index === 2 ? { envelope: { shape: 'sphere', diameterM: 2 } } : liftCheckInputs(),
        });
      }
      const list = (query: string, user = mine) =>
        http().get(`/api/calculations?owner=me&${query}`).set(user.auth);
      const page = await list('pageSize=2&sort=title');
      expect(page.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
      expect(page.body.items.map((item: { title: string }) => item.title)).toEqual([
        'Alpha pod',
        'Bravo sled',
      ]);
      expect(
        (await list('page=2&pageSize=2&sort=title')).body.items.map(
          (item: { title: string }) => item.title,
        ),
      ).toEqual(['Charlie kite']);
      expect((await list('sort=-title')).body.items[0].title).toBe('Charlie kite');
      expect((await list('kind=envelope-geometry')).body.total).toBe(1);
      expect((await list('tag=sled')).body.items[0].title).toBe('Bravo sled');
      expect((await list('q=brav')).body.total).toBe(1);
      expect((await list('status=approved')).body.total).toBe(0);
      // Another designer sees none of these private calculations.
      const theirs = await http().get(`/api/calculations?owner=${mine.id}`).set(other.auth);
      expect(theirs.body.total).toBe(0);
      const bad = await list('pageSize=1000');
      expect(bad.status).toBe(400);
      expect(bad.body.field).toBe('pageSize');
    });
  });

  describe('DELETE /api/calculations/:id', () => {
    it('archives for the owner: gone from lists, still there for the owner, never deleted', async () => {
      const id = (await create(designer, { title: 'To archive' })).body.id as string;
      expect((await http().delete(`/api/calculations/${id}`).set(other.auth)).status).toBe(404);
      expect((await http().delete(`/api/calculations/${id}`).set(designer.auth)).status).toBe(204);
      const listed = await http().get('/api/calculations?q=archive').set(designer.auth);
      expect(listed.body.items.map((item: { id: string }) => item.id)).not.toContain(id);
      const detail = await http().get(`/api/calculations/${id}`).set(designer.auth);
      expect(detail.body.archived).toBe(true);
      const rows = await testApp.app
        .get(DataSource)
        .query(`SELECT id FROM calculation WHERE id = ?`, [id]);
      expect(rows).toHaveLength(1);
    });
  });

  describe('POST /api/evaluate', () => {
    it('evaluates any kind without saving, with no sign-in needed', async () => {
      const response = await http()
        .post('/api/evaluate')
        .send({ kind: 'lift-check', inputs: liftCheckInputs() });
      expect(response.status).toBe(200);
      expect(response.body.outputs.freeLift.value).toBe(
        evaluate('lift-check', liftCheckInputs()).outputs.freeLift?.value,
      );
      expect(response.body.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    });

    it('maps the engine’s InputError to 422 naming the field', async () => {
      const response = await http()
        .post('/api/evaluate')
        .send({ kind: 'lift-check', inputs: liftCheckInputs({ payloadMassKg: -1 }) });
      expect(response.status).toBe(422);
      expect(response.body).toMatchObject({
        field: 'inputs.payloadMassKg',
        error: 'Unprocessable Entity',
      });
      expect(response.body.issues[0].range).toEqual({ min: 0, max: 10000, unit: 'kg' });
    });
  });
});
