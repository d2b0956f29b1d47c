import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { readOutbox } from './support/outbox';
import { createUser, type TestUser } from './support/users';

describe('review and sign-off', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let reviewer: TestUser;
  let secondReviewer: TestUser;
  let designerReviewer: TestUser;
  const http = () => request(testApp.app.getHttpServer());
  let payloadKg = 0.1;

  async function newCalculation(owner = designer): Promise<string> {
    // A payload of its own, so its content (and fingerprint) differ from the other tests'.
    payloadKg += 0.001;
    const inputs = liftCheckInputs({ payloadMassKg: payloadKg });
    const response = await http()
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: `Sphere ${randomUUID().slice(0, 6)}`, kind: 'lift-check', inputs });
    expect(response.status).toBe(201);
    return response.body.id as string;
  }

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer'], 'author');
    reviewer = await createUser(testApp.app, ['reviewer'], 'checker');
    secondReviewer = await createUser(testApp.app, ['reviewer'], 'second-checker');
    designerReviewer = await createUser(testApp.app, ['designer', 'reviewer'], 'both');
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('moves a version draft -> in review -> approved, mailing the reviewers and then the author', async () => {
    const id = await newCalculation();
    const submitted = await http()
      .post(`/api/calculations/${id}/versions/1/submit`)
      .set(designer.auth)
      .send({});
    expect(submitted.status).toBe(200);
    expect(submitted.body.status).toBe('in_review');
    const queue = await http().get('/api/reviews/queue').set(reviewer.auth);
    expect(queue.body.map((item: { calculationId: string }) => item.calculationId)).toContain(id);

    const approved = await http()
      .post(`/api/calculations/${id}/versions/1/approve`)
      .set(reviewer.auth)
      .send({ comment: 'Matches the weighed envelope.' });
    expect(approved.status).toBe(200);
    expect(approved.body.status).toBe('approved');
    expect(approved.body.reviews[0]).toMatchObject({
      decision: 'approved',
      comment: 'Matches the weighed envelope.',
      fingerprint: approved.body.fingerprint,
    });

    const mail = await readOutbox(testApp.app);
    const request = mail.find(
      (message) => message.subject.startsWith('Review requested') && message.text.includes(id),
    );
    expect(request?.to).toEqual(expect.arrayContaining([reviewer.email, secondReviewer.email]));
    expect(request?.to).not.toContain(designer.email);
    const decision = mail.find(
      (message) => message.subject.startsWith('Approved') && message.text.includes(id),
    );
    expect(decision?.to).toEqual([designer.email]);
  });

  it('keeps an approved version approved when the author edits: the edit is a new draft', async () => {
    const id = await newCalculation();
    await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({});
    await http().post(`/api/calculations/${id}/versions/1/approve`).set(reviewer.auth).send({});
    const edit = await http()
      .post(`/api/calculations/${id}/versions`)
      .set(designer.auth)
      .send({ baseVersion: 1, inputs: liftCheckInputs({ payloadMassKg: 0.3 }) });
    expect(edit.body).toMatchObject({ number: 2, status: 'draft' });
    const first = await http().get(`/api/calculations/${id}/versions/1`).set(designer.auth);
    expect(first.body.status).toBe('approved');
    expect(first.body.inputs.payloadMassKg).toBeCloseTo(payloadKg, 12);
    // An approved version cannot be sent for review or decided again.
    expect(
      (await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({}))
        .status,
    ).toBe(409);
    expect(
      (
        await http()
          .post(`/api/calculations/${id}/versions/1/send-back`)
          .set(reviewer.auth)
          .send({ comment: 'late' })
      ).status,
    ).toBe(409);
  });

  it('lists the reviewers a version can be submitted to, by name, never the asker', async () => {
    const answer = await http().get('/api/reviewers').set(designerReviewer.auth);
    expect(answer.status).toBe(200);
    const ids = answer.body.map((person: { id: string }) => person.id);
    expect(ids).toEqual(expect.arrayContaining([reviewer.id, secondReviewer.id]));
    expect(ids).not.toContain(designerReviewer.id);
    expect(ids).not.toContain(designer.id);
    expect(Object.keys(answer.body[0]).sort()).toEqual(['displayName', 'id']);
  });

  it('refuses an approval with a time zone that does not exist, naming timeZone', async () => {
    const id = await newCalculation();
    await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({});
    const answer = await http()
      .post(`/api/calculations/${id}/versions/1/approve`)
      .set(reviewer.auth)
      .send({ timeZone: 'Mars/Olympus_Mons' });
    expect(answer.status).toBe(400);
    expect(answer.body.field).toBe('timeZone');
  });

  it('never lets authors review their own version', async () => {
    const id = await newCalculation(designerReviewer);
    await http()
      .post(`/api/calculations/${id}/versions/1/submit`)
      .set(designerReviewer.auth)
      .send({});
    const own = await http()
      .post(`/api/calculations/${id}/versions/1/approve`)
      .set(designerReviewer.auth)
      .send({});
    expect(own.status).toBe(403);
    const queue = await http().get('/api/reviews/queue').set(designerReviewer.auth);
    expect(queue.body.map((item: { calculationId: string }) => item.calculationId)).not.toContain(
      id,
    );
    const named = await http()
      .post(`/api/calculations/${await newCalculation(designerReviewer)}/versions/1/submit`)
      .set(designerReviewer.auth)
      .send({ reviewerId: designerReviewer.id });
    expect(named.status).toBe(400);
    expect(named.body.field).toBe('reviewerId');
  });

  it('keeps a version asked of one reviewer out of the others’ hands', async () => {
    const id = await newCalculation();
    await http()
      .post(`/api/calculations/${id}/versions/1/submit`)
      .set(designer.auth)
      .send({ reviewerId: secondReviewer.id });
    expect(
      (await http().post(`/api/calculations/${id}/versions/1/approve`).set(reviewer.auth).send({}))
        .status,
    ).toBe(403);
    const queue = await http().get('/api/reviews/queue').set(reviewer.auth);
    expect(queue.body.map((item: { calculationId: string }) => item.calculationId)).not.toContain(
      id,
    );
    expect(
      (
        await http()
          .post(`/api/calculations/${id}/versions/1/approve`)
          .set(secondReviewer.auth)
          .send({})
      ).status,
    ).toBe(200);
  });

  it('needs a comment to send a version back, and tells the author', async () => {
    const id = await newCalculation();
    await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({});
    const empty = await http()
      .post(`/api/calculations/${id}/versions/1/send-back`)
      .set(reviewer.auth)
      .send({ comment: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.field).toBe('comment');
    const sent = await http()
      .post(`/api/calculations/${id}/versions/1/send-back`)
      .set(reviewer.auth)
      .send({ comment: 'Add the tether mass.' });
    expect(sent.body.status).toBe('changes_requested');
    const detail = await http().get(`/api/calculations/${id}`).set(designer.auth);
    expect(detail.body.status).toBe('changes_requested');
    const mail = await readOutbox(testApp.app);
    expect(
      mail.find(
        (message) => message.subject.startsWith('Changes requested') && message.text.includes(id),
      )?.text,
    ).toContain('Add the tether mass.');
  });

  describe('GET /api/verify/:fingerprint', () => {
    it('confirms an approved version to anyone, by whom and when, and that the engine reproduces it', async () => {
      const id = await newCalculation();
      await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({});
      const approved = await http()
        .post(`/api/calculations/${id}/versions/1/approve`)
        .set(reviewer.auth)
        .send({ comment: 'ok' });
      const answer = await http().get(`/api/verify/${approved.body.fingerprint.toUpperCase()}`);
      expect(answer.status).toBe(200);
      expect(answer.body).toMatchObject({
        match: true,
        version: 1,
        reproduces: true,
        differences: [],
        calculation: { kind: 'lift-check' },
      });
      expect(answer.body.approvedBy.id).toBe(reviewer.id);
      expect(answer.body.approvals).toHaveLength(1);
      // Which calculation it is, only a reader of it learns.
      expect(answer.body.calculation.id).toBeUndefined();
      const asOwner = await http()
        .get(`/api/verify/${approved.body.fingerprint}`)
        .set(designer.auth);
      expect(asOwner.body.calculation.id).toBe(id);
      expect(asOwner.body.comment).toBe('ok');
    });

    it('names a private calculation only to those who may read it, with the title it was approved under', async () => {
      const stranger = await createUser(testApp.app, ['designer'], 'stranger');
      const id = await newCalculation();
      const titled = await http()
        .patch(`/api/calculations/${id}`)
        .set(designer.auth)
        .send({ title: 'Envelope A, as approved', visibility: 'private' });
      expect(titled.status).toBe(200);
      await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({});
      const approved = await http()
        .post(`/api/calculations/${id}/versions/1/approve`)
        .set(reviewer.auth)
        .send({ comment: 'Private remark about the client' });
      const renamed = await http()
        .patch(`/api/calculations/${id}`)
        .set(designer.auth)
        .send({ title: 'Renamed afterwards' });
      expect(renamed.status).toBe(200);
      const path = `/api/verify/${approved.body.fingerprint}`;

      for (const asker of [undefined, stranger]) {
        const answer = asker ? await http().get(path).set(asker.auth) : await http().get(path);
        const text = JSON.stringify(answer.body);
        expect(answer.body.match).toBe(true);
        expect(text).not.toContain(id);
        expect(text).not.toContain('Envelope A');
        expect(text).not.toContain('Renamed');
        expect(text).not.toContain('Private remark');
        expect(answer.body.approvals[0].calculation).toBeNull();
      }
      const owner = await http().get(path).set(designer.auth);
      expect(owner.body.calculation).toMatchObject({ id, title: 'Envelope A, as approved' });
      expect(owner.body.approvals[0].calculation.title).toBe('Envelope A, as approved');
      const sheet = await http()
        .get(`/api/calculations/${id}/versions/1/reviews`)
        .set(designer.auth);
      expect(sheet.body.reviews.at(-1).calculationTitle).toBe('Envelope A, as approved');
      // A bad token on the public route is simply anonymous, not a 401.
      const badToken = await http().get(path).set('Authorization', 'Bearer not-a-token');
      expect(badToken.status).toBe(200);
      expect(badToken.body.calculation.id).toBeUndefined();
    });

    it('lists every approval of the same content under one fingerprint', async () => {
      const twins = [await newCalculation(), await newCalculation()];
      const db = testApp.app.get(DataSource);
      // Give the second the first one's content by saving the same inputs as its version 2.
      const first = await http().get(`/api/calculations/${twins[0]}/versions/1`).set(designer.auth);
      const copy = await http()
        .post(`/api/calculations/${twins[1]}/versions`)
        .set(designer.auth)
        .send({ baseVersion: 1, inputs: first.body.inputs });
      expect(copy.body.fingerprint).toBe(first.body.fingerprint);
      for (const [id, n] of [
        [twins[0], 1],
        [twins[1], 2],
      ] as const) {
        await http()
          .post(`/api/calculations/${id}/versions/${n}/submit`)
          .set(designer.auth)
          .send({});
        await http()
          .post(`/api/calculations/${id}/versions/${n}/approve`)
          .set(reviewer.auth)
          .send({});
      }
      const answer = await http().get(`/api/verify/${first.body.fingerprint}`).set(designer.auth);
      expect(
        answer.body.approvals
          .map((approval: { calculation: { id: string } }) => approval.calculation.id)
          .sort(),
      ).toEqual([...twins].sort());
      expect(db).toBeDefined();
    });

    it('says no for an unknown or unapproved fingerprint, and 400 for something that is not one', async () => {
      const id = await newCalculation();
      const draft = await http().get(`/api/calculations/${id}/versions/1`).set(designer.auth);
      expect((await http().get(`/api/verify/${draft.body.fingerprint}`)).body.match).toBe(false);
      expect((await http().get(`/api/verify/${'0'.repeat(64)}`)).body.match).toBe(false);
      const bad = await http().get('/api/verify/not-a-hash');
      expect(bad.status).toBe(400);
      expect(bad.body.field).toBe('fingerprint');
    });

    it('reports when the current engine no longer gives the approved outputs', async () => {
      // An approved version whose stored outputs differ from what the engine computes, as after
      // an engine change: written straight into the database.
      const id = await newCalculation();
      const db = testApp.app.get(DataSource);
      const [row] = (await db.query(`SELECT * FROM calculation_version WHERE calculation_id = ?`, [
        id,
      ])) as Record<string, string>[];
      const outputs = JSON.parse(row?.outputs ?? '{}');
      outputs.freeLift.value += 0.001;
      const versionId = randomUUID();
      await db.query(
        `INSERT INTO calculation_version (id, calculation_id, number, inputs, outputs, steps, warnings, engine_version, author_id, note, fingerprint, status)
         VALUES (?, ?, 2, ?, ?, '[]', '[]', '0.0.1', ?, '', ?, 'approved')`,
        [versionId, id, row?.inputs, JSON.stringify(outputs), designer.id, 'f'.repeat(64)],
      );
      await db.query(
        `INSERT INTO review (id, version_id, reviewer_id, decision, comment, fingerprint) VALUES (?, ?, ?, 'approved', '', ?)`,
        [randomUUID(), versionId, reviewer.id, 'f'.repeat(64)],
      );
      const answer = await http().get(`/api/verify/${'f'.repeat(64)}`);
      expect(answer.body).toMatchObject({
        match: true,
        reproduces: false,
        engineVersionAtApproval: '0.0.1',
      });
      expect(
        answer.body.differences.map((difference: { name: string }) => difference.name),
      ).toEqual(['freeLift']);
    });
  });

  it('audits submit, approve and send back', async () => {
    const { AuditService } = await import('../src/audit/audit.service');
    const { items } = await testApp.app.get(AuditService).list({ page: 1, pageSize: 200 });
    const actions = new Set(items.map((entry) => entry.action));
    for (const action of [
      'version.submit',
      'version.approve',
      'version.send-back',
      'calculation.create',
      'calculation.save',
    ])
      expect(actions.has(action), action).toBe(true);
  });
});
