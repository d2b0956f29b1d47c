import { evaluate } from '@loftwright/buoyancy';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

/** Every number anywhere in a JSON answer. */
function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (value === null || typeof value !== 'object') return [];
  return Object.values(value).flatMap(numbersIn);
}

// The same quantity as a person may meet it: in kg, g, as a force in N, or in pounds.
const FACTORS = [1, 1000, 0.001, 9.80665, 1 / 9.80665, 2.2046226218, 1 / 2.2046226218];

describe('hidden exercise answers, withheld by derivation until the teacher’s rule reveals them', () => {
  let testApp: TestApp;
  let teacher: TestUser;
  const http = () => request(testApp.app.getHttpServer());
  const inputs = liftCheckInputs();
  const engine = evaluate('lift-check', inputs);
  const gross = engine.outputs.grossLift?.value ?? Number.NaN;
  let calculationId = '';

  const student = async (classId: string, joinCode: string, name: string) => {
    const pupil = await createUser(testApp.app, ['student'], name);
    const joined = await http().post('/api/classes/join').set(pupil.auth).send({ code: joinCode });
    expect(joined.status).toBeLessThan(300);
    expect(classId).toBeTruthy();
    return pupil;
  };
  const newClassWithExercise = async (exercise: Record<string, unknown>) => {
    const created = await http().post('/api/classes').set(teacher.auth).send({ title: 'Lift' });
    const published = await http()
      .post(`/api/classes/${created.body.id}/examples`)
      .set(teacher.auth)
      .send({ calculationId, versionNumber: 1, title: 'Work it out', exercise });
    expect(published.status).toBe(201);
    return {
      classId: created.body.id as string,
      code: created.body.joinCode as string,
      exampleId: published.body.id as string,
    };
  };

  beforeAll(async () => {
    testApp = await createTestApp();
    teacher = await createUser(testApp.app, ['teacher'], 'teacher');
    calculationId = (
      await http()
        .post('/api/calculations')
        .set(teacher.auth)
        .send({ title: 'Metre sphere', kind: 'lift-check', inputs })
    ).body.id;
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('shows a student who has not answered no number derived from the hidden gross lift, in any unit', async () => {
    const { classId, code, exampleId } = await newClassWithExercise({
      hiddenOutputs: ['grossLift'],
      tolerancePercent: 2,
    });
    const pupil = await student(classId, code, 'fresh');
    const seen = await http().get(`/api/examples/${exampleId}`).set(pupil.auth);
    expect(seen.body.revealed).toBe(false);
    // Everything the engine computes from the gross lift: net and free lift, their forces.
    const derived = ['grossLift', 'netLift', 'freeLift', 'freeLiftForce']
      .map((name) => engine.outputs[name]?.value)
      .filter((value): value is number => value !== undefined);
    expect(derived.length).toBeGreaterThanOrEqual(3);
    const leaks = numbersIn(seen.body).filter((shown) =>
      derived.some((secret) =>
        FACTORS.some(
          (factor) =>
            Math.abs(shown - secret * factor) <= 1e-9 * Math.abs(secret * factor) && shown !== 0,
        ),
      ),
    );
    expect(leaks).toEqual([]);
    // The inputs of the hidden step stay shown: the student needs them.
    const grossIndex = seen.body.steps.findIndex(
      (step: { id: string }) => step.id === engine.outputs.grossLift?.stepId,
    );
    expect(seen.body.steps[grossIndex - 1].result.value).not.toBeNull();
  });

  it('keeps the values back after a wrong attempt, and reveals them after a right one', async () => {
    const { classId, code, exampleId } = await newClassWithExercise({
      hiddenOutputs: ['grossLift'],
      tolerancePercent: 2,
    });
    const pupil = await student(classId, code, 'trier');
    const submit = (value: number) =>
      http()
        .post(`/api/examples/${exampleId}/submissions`)
        .set(pupil.auth)
        .send({ answers: { grossLift: value } });
    const wrong = await submit(gross * 1.5);
    expect(wrong.body.allCorrect).toBe(false);
    expect(wrong.body.check.answers[0]).toMatchObject({ expected: null, relativeError: null });
    const after = await http().get(`/api/examples/${exampleId}`).set(pupil.auth);
    expect(after.body.revealed).toBe(false);
    expect(JSON.stringify(after.body)).not.toContain(String(gross));
    const own = await http().get(`/api/examples/${exampleId}/submissions`).set(pupil.auth);
    expect(own.body[0].check.answers[0].expected).toBeNull();

    const right = await submit(gross);
    expect(right.body.allCorrect).toBe(true);
    expect(right.body.check.answers[0].expected).toBeCloseTo(gross, 12);
    const revealed = await http().get(`/api/examples/${exampleId}`).set(pupil.auth);
    expect(revealed.body.revealed).toBe(true);
    expect(revealed.body.outputs.grossLift.value).toBeCloseTo(gross, 12);
  });

  it('reveals after the teacher’s number of attempts, or only when the class closes', async () => {
    const afterTwo = await newClassWithExercise({
      hiddenOutputs: ['grossLift'],
      tolerancePercent: 2,
      reveal: 'after-attempts',
      revealAfterAttempts: 2,
    });
    const pupil = await student(afterTwo.classId, afterTwo.code, 'two-tries');
    const submitWrong = (exampleId: string, who: TestUser) =>
      http()
        .post(`/api/examples/${exampleId}/submissions`)
        .set(who.auth)
        .send({ answers: { grossLift: gross * 3 } });
    await submitWrong(afterTwo.exampleId, pupil);
    expect(
      (await http().get(`/api/examples/${afterTwo.exampleId}`).set(pupil.auth)).body.revealed,
    ).toBe(false);
    await submitWrong(afterTwo.exampleId, pupil);
    expect(
      (await http().get(`/api/examples/${afterTwo.exampleId}`).set(pupil.auth)).body.revealed,
    ).toBe(true);

    const atClose = await newClassWithExercise({
      hiddenOutputs: ['grossLift'],
      tolerancePercent: 2,
      reveal: 'when-closed',
    });
    const late = await student(atClose.classId, atClose.code, 'at-close');
    const right = await http()
      .post(`/api/examples/${atClose.exampleId}/submissions`)
      .set(late.auth)
      .send({ answers: { grossLift: gross } });
    expect(right.body.allCorrect).toBe(true);
    expect(right.body.check.answers[0].expected).toBeNull();
    expect(
      (await http().get(`/api/examples/${atClose.exampleId}`).set(late.auth)).body.revealed,
    ).toBe(false);
    const closed = await http()
      .post(`/api/classes/${atClose.classId}/close`)
      .set(teacher.auth)
      .send({});
    expect(closed.status).toBeLessThan(300);
    const seen = await http().get(`/api/examples/${atClose.exampleId}`).set(late.auth);
    expect(seen.body.revealed).toBe(true);
    expect(seen.body.mySubmissions[0].check.answers[0].expected).toBeCloseTo(gross, 12);
  });

  it('needs the number of attempts when the rule counts them', async () => {
    const created = await http().post('/api/classes').set(teacher.auth).send({ title: 'Bad' });
    const refused = await http()
      .post(`/api/classes/${created.body.id}/examples`)
      .set(teacher.auth)
      .send({
        calculationId,
        versionNumber: 1,
        title: 'Missing count',
        exercise: { hiddenOutputs: ['grossLift'], tolerancePercent: 2, reveal: 'after-attempts' },
      });
    expect(refused.status).toBe(400);
    expect(refused.body.field).toBe('exercise.revealAfterAttempts');
  });
});
