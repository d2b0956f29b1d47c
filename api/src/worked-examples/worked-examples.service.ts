import type { ExampleDetail, ExampleSummary, Submission } from '@loftwright/contract';
import type { CalculationWarning, DerivationStep } from '@loftwright/buoyancy';
import {
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { checkExerciseAnswers, evaluate, type OutputQuantity } from '@loftwright/buoyancy';
import { randomUUID } from 'node:crypto';
import { Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { CalculationsService } from '../calculations/calculations.service';
import { ClassroomsService, mayPublishTo, requireTeaching } from '../classrooms/classrooms.service';
import { fieldIssuesException } from '../common/errors/field-issues';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { UsersService } from '../users/users.service';
import type {
  ExampleSettingsDto,
  ExerciseSettingsDto,
  PublishExampleDto,
} from './dto/worked-example.dto';
import {
  answersRevealed,
  type ExampleContent,
  maskForExercise,
  settingsIssues,
} from './example-content';
import { ExerciseSubmission } from './exercise-submission.entity';
import { type ExerciseSettings, WorkedExample } from './worked-example.entity';

const NOT_VISIBLE = 'This example does not exist or you may not see it.';

/** The settings as stored: copies, so nothing of the request object is kept by reference. */
const exerciseSettings = (dto: ExerciseSettingsDto | null | undefined): ExerciseSettings | null =>
  dto
    ? {
        hiddenOutputs: [...dto.hiddenOutputs],
        tolerancePercent: dto.tolerancePercent,
        reveal: dto.reveal ?? 'after-correct',
        ...(dto.reveal === 'after-attempts'
          ? { revealAfterAttempts: dto.revealAfterAttempts }
          : {}),
      }
    : null;

/** Every step in full, as the teacher and a student who has answered see them. */
const shownSteps = (example: WorkedExample) =>
  (example.steps as ExampleContent['steps']).map((step) => ({ ...step, hidden: false }));

/** The teacher's export of an exercise's attempts. */
export interface SubmissionTable {
  example: WorkedExample;
  steps: readonly DerivationStep[];
  rows: Submission[];
}

@Injectable()
export class WorkedExamplesService {
  constructor(
    @InjectRepository(WorkedExample) private readonly examples: Repository<WorkedExample>,
    @InjectRepository(ExerciseSubmission)
    private readonly submissions: Repository<ExerciseSubmission>,
    private readonly classrooms: ClassroomsService,
    private readonly calculations: CalculationsService,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  private content(example: WorkedExample) {
    return {
      inputs: example.inputs,
      outputs: example.outputs as Record<string, OutputQuantity>,
      steps: example.steps,
      warnings: example.warnings as CalculationWarning[],
    };
  }

  /** The example and how the user stands towards its class; one 404 for missing and not allowed. */
  private async findVisible(user: AuthUser, id: string) {
    const example = await this.examples.findOneBy({ id });
    if (!example) throw new NotFoundException({ message: NOT_VISIBLE, field: 'id' });
    const found = await this.classrooms.findVisible(user, example.classroomId).catch(() => {
      throw new NotFoundException({ message: NOT_VISIBLE, field: 'id' });
    });
    return { example, ...found };
  }

  private async findTaught(user: AuthUser, id: string) {
    const found = await this.findVisible(user, id);
    requireTeaching(found.standing);
    return found;
  }

  private summary(example: WorkedExample) {
    return {
      id: example.id,
      classroomId: example.classroomId,
      title: example.title,
      kind: example.kind,
      calculationId: example.calculationId,
      versionNumber: example.versionNumber,
      fingerprint: example.fingerprint,
      isExercise: example.exercise !== null,
      tolerancePercent: example.exercise?.tolerancePercent ?? null,
      publishedAt: new Date(example.publishedAt).toISOString(),
      updatedAt: new Date(example.updatedAt).toISOString(),
    };
  }

  async publish(
    user: AuthUser,
    classroomId: string,
    dto: PublishExampleDto,
  ): Promise<ExampleDetail> {
    const { classroom, standing } = await this.classrooms.findVisible(user, classroomId);
    requireTeaching(standing);
    if (!hasRole(user, 'teacher')) {
      throw new ForbiddenException({ message: 'Publishing to a class needs the teacher role.' });
    }
    if (!mayPublishTo(user, classroom, standing)) {
      throw new ConflictException({
        message: 'The class is closed: nothing more is published to it.',
        field: 'id',
      });
    }
    const calculation = await this.calculations.findReadable(user, dto.calculationId).catch(() => {
      throw new NotFoundException({
        message: 'calculationId names no calculation you may see.',
        field: 'calculationId',
      });
    });
    const version = await this.calculations
      .findVersion(calculation.id, dto.versionNumber)
      .catch(() => {
        throw new NotFoundException({
          message: `versionNumber: "${calculation.title}" has no version ${dto.versionNumber}.`,
          field: 'versionNumber',
        });
      });
    // A class is shown either the teacher's own work or a version a reviewer signed off.
    if (calculation.ownerId !== user.id && version.status !== 'approved') {
      throw new ForbiddenException({
        message: `versionNumber: version ${version.number} of "${calculation.title}" is not yours and not approved; only your own calculations or approved versions can be published.`,
        field: 'versionNumber',
      });
    }
    const content: ExampleContent = {
      inputs: version.inputs,
      outputs: version.outputs as Record<string, OutputQuantity>,
      steps: version.steps as ExampleContent['steps'],
    };
    const issues = settingsIssues(content, dto);
    if (issues.length > 0) throw fieldIssuesException(issues);
    const id = randomUUID();
    await this.writeLock.transaction(async (manager) => {
      await insertRow(manager.getRepository(WorkedExample), {
        id,
        classroomId: classroom.id,
        teacherId: user.id,
        title: dto.title?.trim() || calculation.title,
        intro: dto.intro ?? '',
        calculationId: calculation.id,
        versionNumber: version.number,
        kind: calculation.kind,
        inputs: version.inputs,
        outputs: version.outputs,
        steps: version.steps,
        warnings: version.warnings,
        series: version.series ?? null,
        engineVersion: version.engineVersion,
        fingerprint: version.fingerprint,
        stepNotes: { ...(dto.stepNotes ?? {}) },
        tryRanges: { ...(dto.tryRanges ?? {}) },
        chartStepId: dto.chartStepId ?? null,
        exercise: exerciseSettings(dto.exercise),
        // To the millisecond, so examples published within one second keep their order.
        publishedAt: new Date(),
      });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'example.publish',
          targetType: 'worked_example',
          targetId: id,
          detail: {
            classroomId: classroom.id,
            calculationId: calculation.id,
            versionNumber: version.number,
          },
        },
        manager,
      );
    });
    return this.get(user, id);
  }

  async listForClass(user: AuthUser, classroomId: string): Promise<ExampleSummary[]> {
    const { standing } = await this.classrooms.findVisible(user, classroomId);
    const rows = await this.examples.find({
      where: { classroomId },
      order: { publishedAt: 'ASC' },
    });
    if (standing !== 'student') return rows.map((row) => this.summary(row));
    const mine = await this.submissions.findBy({ studentId: user.id });
    return rows.map((row) => {
      const attempts = mine.filter((submission) => submission.exampleId === row.id);
      const latest = attempts.sort((a, b) => b.attempt - a.attempt)[0];
      return {
        ...this.summary(row),
        myAttempts: attempts.length,
        myLatestAllCorrect: latest ? latest.allCorrect : null,
      };
    });
  }

  /**
   * The example as the user may see it. Teachers see everything. A student sees an exercise with
   * its answers blanked until their first submission, then in full with their attempts.
   */
  async get(user: AuthUser, id: string): Promise<ExampleDetail> {
    const { example, classroom, standing } = await this.findVisible(user, id);
    const teacher = await this.users.findById(example.teacherId);
    const base = {
      ...this.summary(example),
      classroomTitle: classroom.title,
      classroomClosed: classroom.closedAt !== null,
      teacher: { id: example.teacherId, displayName: teacher?.displayName ?? 'unknown user' },
      intro: example.intro,
      engineVersion: example.engineVersion,
      inputs: example.inputs,
      warnings: example.warnings,
      stepNotes: example.stepNotes,
      tryRanges: example.tryRanges,
      chartStepId: example.chartStepId,
      exercise: example.exercise,
      standing,
    };
    const full = {
      outputs: example.outputs,
      steps: shownSteps(example),
      series: example.series,
      revealed: true,
    };
    if (standing !== 'student') return { ...base, ...full, questions: [], mySubmissions: [] };
    const attempts = await this.submissions.find({
      where: { exampleId: id, studentId: user.id },
      order: { attempt: 'DESC' },
    });
    const revealed =
      !example.exercise || answersRevealed(example.exercise, attempts, classroom.closedAt !== null);
    const mySubmissions = attempts.map((attempt) => this.submissionView(attempt, null, revealed));
    if (example.exercise && !revealed) {
      const masked = maskForExercise(this.content(example), example.exercise);
      return {
        ...base,
        warnings: masked.warnings,
        outputs: masked.outputs,
        steps: masked.steps,
        series: null,
        revealed: false,
        questions: masked.questions,
        mySubmissions,
      };
    }
    return {
      ...base,
      ...full,
      questions: example.exercise
        ? maskForExercise(this.content(example), example.exercise).questions
        : [],
      mySubmissions,
    };
  }

  async update(user: AuthUser, id: string, dto: ExampleSettingsDto): Promise<ExampleDetail> {
    const { example } = await this.findTaught(user, id);
    const issues = settingsIssues(this.content(example), dto);
    if (issues.length > 0) throw fieldIssuesException(issues);
    const changes: Partial<WorkedExample> = {};
    if (dto.title !== undefined) changes.title = dto.title.trim();
    if (dto.intro !== undefined) changes.intro = dto.intro;
    if (dto.stepNotes !== undefined) changes.stepNotes = { ...dto.stepNotes };
    if (dto.tryRanges !== undefined) changes.tryRanges = { ...dto.tryRanges };
    if (dto.chartStepId !== undefined) changes.chartStepId = dto.chartStepId;
    if (dto.exercise !== undefined) {
      changes.exercise = exerciseSettings(dto.exercise);
    }
    if (Object.keys(changes).length > 0) {
      await this.writeLock.transaction(async (manager) => {
        await manager.getRepository(WorkedExample).update({ id }, changes as never);
        await this.audit.record(
          {
            actorId: user.id,
            action: 'example.update',
            targetType: 'worked_example',
            targetId: id,
            detail: { changed: Object.keys(changes) },
          },
          manager,
        );
      });
    }
    return this.get(user, id);
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    await this.findTaught(user, id);
    await this.writeLock.transaction(async (manager) => {
      await manager.getRepository(WorkedExample).delete({ id });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'example.remove',
          targetType: 'worked_example',
          targetId: id,
        },
        manager,
      );
    });
  }

  /**
   * One attempt. Until the answers are revealed to its student, the engine's values are left out
   * of it: the expected value and the relative error (from which, with the answer, the expected
   * value follows); right or wrong, and the step where it went wrong, stay.
   */
  private submissionView(
    submission: ExerciseSubmission,
    student: { id: string; displayName: string } | null,
    revealed = true,
  ): Submission {
    const check = submission.check;
    return {
      id: submission.id,
      exampleId: submission.exampleId,
      student: student ?? { id: submission.studentId, displayName: '' },
      attempt: submission.attempt,
      answers: submission.answers,
      check: revealed
        ? submission.check
        : {
            ...check,
            answers: check.answers.map((answer) => ({
              ...answer,
              expected: null,
              relativeError: null,
            })),
          },
      correctCount: submission.correctCount,
      answerCount: submission.answerCount,
      allCorrect: submission.allCorrect,
      submittedAt: new Date(submission.submittedAt).toISOString(),
    };
  }

  /**
   * A student's answers, checked against the engine's value recomputed from the example's inputs
   * (never against numbers a client sent or stored ones), at the exercise's tolerance.
   */
  async submit(user: AuthUser, id: string, answers: Record<string, unknown>): Promise<Submission> {
    const { example, classroom, standing } = await this.findVisible(user, id);
    if (standing !== 'student') {
      throw new ForbiddenException({ message: 'Only students of the class submit answers.' });
    }
    if (!example.exercise) {
      throw new ConflictException({
        message: 'This worked example is not an exercise; there is nothing to submit.',
        field: 'id',
      });
    }
    if (classroom.closedAt) {
      throw new ConflictException({
        message: 'The class is closed and takes no more answers.',
        field: 'id',
      });
    }
    const hidden = example.exercise.hiddenOutputs;
    const issues = [
      ...Object.keys(answers)
        .filter((name) => !hidden.includes(name))
        .map((name) => ({
          field: `answers.${name}`,
          reason: `is not asked for (the exercise asks for ${hidden.join(', ')})`,
        })),
      ...Object.entries(answers)
        .filter(
          ([name, value]) =>
            hidden.includes(name) &&
            value !== null &&
            !(typeof value === 'number' && Number.isFinite(value)),
        )
        .map(([name]) => ({ field: `answers.${name}`, reason: 'must be a number or null' })),
    ];
    if (issues.length > 0) throw fieldIssuesException(issues);
    const given = Object.fromEntries(
      hidden.map((name) => [name, typeof answers[name] === 'number' ? answers[name] : null]),
    );
    const recomputed = evaluate(example.kind, example.inputs);
    const check = checkExerciseAnswers(
      recomputed,
      hidden,
      given,
      example.exercise.tolerancePercent / 100,
    );
    const { tolerancePercent } = example.exercise;
    const submissionId = randomUUID();
    await this.writeLock.transaction(async (manager) => {
      const submissions = manager.getRepository(ExerciseSubmission);
      const attempt = (await submissions.countBy({ exampleId: id, studentId: user.id })) + 1;
      await insertRow(submissions, {
        id: submissionId,
        exampleId: id,
        studentId: user.id,
        attempt,
        answers: given,
        check: { ...check, tolerancePercent },
        correctCount: check.correctCount,
        answerCount: check.answers.length,
        allCorrect: check.allCorrect,
        // Set here, to the millisecond, so attempts within one second keep their order.
        submittedAt: new Date(),
      });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'example.submit',
          targetType: 'worked_example',
          targetId: id,
          detail: { correct: check.correctCount, of: check.answers.length },
        },
        manager,
      );
    });
    const saved = await this.submissions.findOneByOrFail({ id: submissionId });
    const attempts = await this.submissions.findBy({ exampleId: id, studentId: user.id });
    const revealed = answersRevealed(example.exercise, attempts, classroom.closedAt !== null);
    return this.submissionView(saved, { id: user.id, displayName: user.displayName }, revealed);
  }

  /** Every attempt for the teacher; a student's own attempts for a student. */
  async listSubmissions(user: AuthUser, id: string): Promise<Submission[]> {
    const { example, classroom, standing } = await this.findVisible(user, id);
    const rows = await this.submissions.find({
      where: standing === 'student' ? { exampleId: id, studentId: user.id } : { exampleId: id },
      order: { submittedAt: 'ASC', attempt: 'ASC' },
    });
    const names = await this.users.names(rows.map((row) => row.studentId));
    const revealed =
      standing !== 'student' ||
      !example.exercise ||
      answersRevealed(example.exercise, rows, classroom.closedAt !== null);
    return rows.map((row) => this.submissionView(row, names(row.studentId), revealed));
  }

  /** The rows of the teacher's submissions export, with the example they answer. */
  async submissionTable(user: AuthUser, id: string): Promise<SubmissionTable> {
    const { example } = await this.findTaught(user, id);
    return {
      example,
      steps: example.steps as ExampleContent['steps'],
      rows: await this.listSubmissions(user, id),
    };
  }
}
