import { evaluate } from '@loftwright/buoyancy';
import Papa from 'papaparse';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

interface ClassView {
  id: string;
  joinCode: string;
}

describe('worked examples and exercises', () => {
  let testApp: TestApp;
  let teacher: TestUser;
  let otherTeacher: TestUser;
  let designer: TestUser;
  let reviewer: TestUser;
  let pupil: TestUser;
  let pupilB: TestUser;
  let classA: ClassView;
  let classB: ClassView;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());
  const inputs = liftCheckInputs();
  const engine = evaluate('lift-check', inputs);
  const gross = engine.outputs.grossLift?.value ?? Number.NaN;
  const free = engine.outputs.freeLift?.value ?? Number.NaN;

  const newClass = async (owner: TestUser, title: string) =>
    (await http().post('/api/classes').set(owner.auth).send({ title })).body as ClassView;
  const join = (who: TestUser, code: string) =>
    http().post('/api/classes/join').set(who.auth).send({ code });

  beforeAll(async () => {
    testApp = await createTestApp();
    teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    otherTeacher = await createUser(testApp.app, ['teacher'], 'other-teacher');
    designer = await createUser(testApp.app, ['designer'], 'designer');
    reviewer = await createUser(testApp.app, ['reviewer'], 'reviewer');
    pupil = await createUser(testApp.app, ['student'], 'pupil');
    pupilB = await createUser(testApp.app, ['student'], 'pupil-b');
    classA = await newClass(teacher, 'Class A');
    classB = await newClass(teacher, 'Class B');
    await join(pupil, classA.joinCode);
    await join(pupilB, classB.joinCode);
    const created = await http()
      .post('/api/calculations')
      .set(teacher.auth)
      .send({ title: 'Metre sphere', kind: 'lift-check', inputs });
    calculationId = created.body.id;
  });

  afterAll(async () => {
    await testApp.close();
  });

  const publish = (classId: string, body: Record<string, unknown>, who = teacher) =>
    http()
      .post(`/api/classes/${classId}/examples`)
      .set(who.auth)
      .send({ calculationId, versionNumber: 1, ...body });

  it('publishes a copy of the exact version that later versions do not change', async () => {
    const published = await publish(classA.id, {
      title: 'Lift of a metre sphere',
      intro: 'Checked against a density table.',
      stepNotes: { [engine.steps[0]?.id ?? '']: 'Start with the air.' },
      tryRanges: { 'envelope.diameterM': { min: 0.5, max: 2 } },
    });
    expect(published.status).toBe(201);
    expect(published.body).toMatchObject({ versionNumber: 1, isExercise: false, revealed: true });
    expect(published.body.outputs.grossLift.value).toBeCloseTo(gross, 12);

    const saved = await http()
      .post(`/api/calculations/${calculationId}/versions`)
      .set(teacher.auth)
      .send({ baseVersion: 1, inputs: liftCheckInputs({ payloadMassKg: 0.05 }) });
    expect(saved.status).toBe(201);
    const seen = await http().get(`/api/examples/${published.body.id}`).set(pupil.auth);
    expect(seen.status).toBe(200);
    expect(seen.body.inputs.payloadMassKg).toBe(0.2);
    expect(seen.body.outputs.freeLift.value).toBeCloseTo(free, 12);

    // The copied content is protected in the database as well.
    const database = testApp.app.get(DataSource);
    await expect(
      database.query(`UPDATE worked_example SET inputs = '{}' WHERE id = ?`, [published.body.id]),
    ).rejects.toThrow(/immutable/);
  });

  it('publishes only the teacher’s own calculations or approved versions they may read', async () => {
    const designed = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .send({ title: 'Team sphere', kind: 'lift-check', inputs, visibility: 'team' });
    const id = designed.body.id as string;
    const draft = await publish(classA.id, { calculationId: id });
    expect(draft.status).toBe(403);
    expect(draft.body.field).toBe('versionNumber');
    await http().post(`/api/calculations/${id}/versions/1/submit`).set(designer.auth).send({});
    const approved = await http()
      .post(`/api/calculations/${id}/versions/1/approve`)
      .set(reviewer.auth)
      .send({ comment: 'Fine for teaching' });
    expect(approved.status).toBe(200);
    expect((await publish(classA.id, { calculationId: id })).status).toBe(201);

    const privateOne = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .send({ title: 'Private', kind: 'lift-check', inputs });
    const hidden = await publish(classA.id, { calculationId: privateOne.body.id });
    expect(hidden.status).toBe(404);
    expect(hidden.body.field).toBe('calculationId');
    const noVersion = await publish(classA.id, { versionNumber: 9 });
    expect(noVersion.status).toBe(404);
    expect(noVersion.body.field).toBe('versionNumber');
    // Not the other teacher's class, and not a student's business.
    expect((await publish(classA.id, {}, otherTeacher)).status).toBe(404);
    expect((await publish(classA.id, {}, pupil)).status).toBe(403);
  });

  it('names the field when the settings do not fit the calculation', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ stepNotes: { 'no-such-step': 'x' } }, 'stepNotes.no-such-step'],
      [{ tryRanges: { 'envelope.shape': { min: 0, max: 1 } } }, 'tryRanges.envelope.shape'],
      [{ tryRanges: { 'envelope.diameterM': { min: 2, max: 1 } } }, 'tryRanges.envelope.diameterM'],
      [{ tryRanges: { 'envelope.diameterM': { min: 2, max: 3 } } }, 'tryRanges.envelope.diameterM'],
      [{ chartStepId: 'nowhere' }, 'chartStepId'],
      [{ exercise: { hiddenOutputs: ['nope'], tolerancePercent: 2 } }, 'exercise.hiddenOutputs'],
      [
        { exercise: { hiddenOutputs: ['grossLift'], tolerancePercent: 0 } },
        'exercise.tolerancePercent',
      ],
      [{ exercise: { hiddenOutputs: [], tolerancePercent: 2 } }, 'exercise.hiddenOutputs'],
    ];
    for (const [body, field] of cases) {
      const response = await publish(classA.id, body);
      expect(response.status, JSON.stringify(body)).toBe(400);
      expect(response.body.field, JSON.stringify(body)).toBe(field);
    }
  });

  describe('an exercise', () => {
    let exerciseId: string;

    beforeAll(async () => {
      const published = await publish(classA.id, {
        title: 'Work out the lift',
        exercise: { hiddenOutputs: ['grossLift', 'freeLift'], tolerancePercent: 2 },
      });
      expect(published.status).toBe(201);
      exerciseId = published.body.id;
    });

    it('keeps the answers from a student until they submit', async () => {
      const seen = await http().get(`/api/examples/${exerciseId}`).set(pupil.auth);
      expect(seen.body.revealed).toBe(false);
      expect(seen.body.outputs.grossLift).toBeUndefined();
      expect(seen.body.outputs.freeLift).toBeUndefined();
      expect(seen.body.questions.map((q: { output: string }) => q.output)).toEqual([
        'grossLift',
        'freeLift',
      ]);
      const text = JSON.stringify(seen.body);
      expect(text).not.toContain(String(gross));
      expect(text).not.toContain(String(free));
      const hiddenStep = seen.body.steps.find(
        (step: { id: string }) => step.id === engine.outputs.grossLift?.stepId,
      );
      expect(hiddenStep).toMatchObject({ hidden: true, result: { value: null } });
      // The teacher sees it all.
      const teacherView = await http().get(`/api/examples/${exerciseId}`).set(teacher.auth);
      expect(teacherView.body.outputs.grossLift.value).toBeCloseTo(gross, 12);
    });

    it('checks answers at the tolerance edges against the recomputed value', async () => {
      const submit = (answers: Record<string, unknown>) =>
        http().post(`/api/examples/${exerciseId}/submissions`).set(pupil.auth).send({ answers });
      const atEdge = await submit({ grossLift: gross * 1.02, freeLift: free * 0.98 });
      expect(atEdge.status).toBe(201);
      expect(atEdge.body).toMatchObject({ attempt: 1, allCorrect: true, correctCount: 2 });

      const beyond = await submit({ grossLift: gross * 1.0201, freeLift: free });
      expect(beyond.body).toMatchObject({ attempt: 2, allCorrect: false, correctCount: 1 });
      expect(beyond.body.check.firstWrongStepId).toBe(engine.outputs.grossLift?.stepId);

      const laterWrong = await submit({ grossLift: gross, freeLift: free * 0.9799 });
      expect(laterWrong.body.check.firstWrongStepId).toBe(engine.outputs.freeLift?.stepId);

      // After a submission the student sees the whole derivation.
      const seen = await http().get(`/api/examples/${exerciseId}`).set(pupil.auth);
      expect(seen.body.revealed).toBe(true);
      expect(seen.body.outputs.grossLift.value).toBeCloseTo(gross, 12);
      expect(seen.body.mySubmissions).toHaveLength(3);
    });

    it('refuses answers it did not ask for, non-numbers, and submissions by non-students', async () => {
      const extra = await http()
        .post(`/api/examples/${exerciseId}/submissions`)
        .set(pupil.auth)
        .send({ answers: { netLift: 1 } });
      expect(extra.status).toBe(400);
      expect(extra.body.field).toBe('answers.netLift');
      const text = await http()
        .post(`/api/examples/${exerciseId}/submissions`)
        .set(pupil.auth)
        .send({ answers: { grossLift: 'about one' } });
      expect(text.status).toBe(400);
      expect(text.body.field).toBe('answers.grossLift');
      const byTeacher = await http()
        .post(`/api/examples/${exerciseId}/submissions`)
        .set(teacher.auth)
        .send({ answers: { grossLift: 1 } });
      expect(byTeacher.status).toBe(403);
    });

    it('keeps one class’s examples and submissions from students of another', async () => {
      const list = await http().get(`/api/classes/${classA.id}/examples`).set(pupilB.auth);
      expect(list.status).toBe(404);
      const example = await http().get(`/api/examples/${exerciseId}`).set(pupilB.auth);
      expect(example.status).toBe(404);
      const submissions = await http()
        .get(`/api/examples/${exerciseId}/submissions`)
        .set(pupilB.auth);
      expect(submissions.status).toBe(404);
      const submit = await http()
        .post(`/api/examples/${exerciseId}/submissions`)
        .set(pupilB.auth)
        .send({ answers: { grossLift: gross } });
      expect(submit.status).toBe(404);
      const exported = await http()
        .get(`/api/examples/${exerciseId}/submissions/export`)
        .set(otherTeacher.auth);
      expect(exported.status).toBe(404);
      // Class B's own list does not show class A's examples.
      const own = await http().get(`/api/classes/${classB.id}/examples`).set(pupilB.auth);
      expect(own.body).toEqual([]);
    });

    it('gives a student their own attempts only and the teacher every attempt, also as CSV', async () => {
      const classmate = await createUser(testApp.app, ['student'], 'classmate');
      await join(classmate, classA.joinCode);
      await http()
        .post(`/api/examples/${exerciseId}/submissions`)
        .set(classmate.auth)
        .send({ answers: { grossLift: gross, freeLift: null } });
      const mine = await http().get(`/api/examples/${exerciseId}/submissions`).set(classmate.auth);
      expect(mine.body).toHaveLength(1);
      const all = await http().get(`/api/examples/${exerciseId}/submissions`).set(teacher.auth);
      expect(all.body).toHaveLength(4);

      const csv = await http()
        .get(`/api/examples/${exerciseId}/submissions/export?format=csv`)
        .set(teacher.auth);
      expect(csv.status).toBe(200);
      expect(csv.headers['content-type']).toMatch(/text\/csv/);
      const rows = Papa.parse<Record<string, string>>(csv.text.replace(/^\uFEFF/, ''), {
        header: true,
        skipEmptyLines: true,
      }).data;
      expect(rows).toHaveLength(4);
      const last = rows[3] as Record<string, string>;
      expect(last['Student']).toMatch(/classmate/);
      expect(last['freeLift right']).toBe('wrong');
      expect(last['grossLift right']).toBe('right');
      expect(Number(last['grossLift engine (kg)'])).toBeCloseTo(gross, 9);
      expect(last['First step gone wrong']).toMatch(/^\d+\. /);
    });

    it('takes no submissions once the class is closed', async () => {
      await http().post(`/api/classes/${classA.id}/close`).set(teacher.auth);
      const late = await http()
        .post(`/api/examples/${exerciseId}/submissions`)
        .set(pupil.auth)
        .send({ answers: { grossLift: gross, freeLift: free } });
      expect(late.status).toBe(409);
      // Students keep reading a closed class.
      const seen = await http().get(`/api/examples/${exerciseId}`).set(pupil.auth);
      expect(seen.status).toBe(200);
    });
  });

  it('lets the teacher change the words and settings, not the content', async () => {
    const published = await publish(classB.id, { title: 'Before' });
    const patched = await http()
      .patch(`/api/examples/${published.body.id}`)
      .set(teacher.auth)
      .send({ title: 'After', exercise: { hiddenOutputs: ['netLift'], tolerancePercent: 5 } });
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject({ title: 'After', isExercise: true, tolerancePercent: 5 });
    const smuggled = await http()
      .patch(`/api/examples/${published.body.id}`)
      .set(teacher.auth)
      .send({ inputs: {} });
    expect(smuggled.status).toBe(400);
    const byStudent = await http()
      .patch(`/api/examples/${published.body.id}`)
      .set(pupilB.auth)
      .send({ title: 'Mine' });
    expect(byStudent.status).toBe(403);
    const removed = await http().delete(`/api/examples/${published.body.id}`).set(teacher.auth);
    expect(removed.status).toBe(204);
    expect((await http().get(`/api/examples/${published.body.id}`).set(teacher.auth)).status).toBe(
      404,
    );
  });
});
