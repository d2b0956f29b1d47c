import type {
  AnswerCheck,
  CalculationWarning,
  DataSeries,
  DerivationStep,
  ExerciseCheck,
  OutputQuantity,
} from '@loftwright/buoyancy';
import type { UserRef } from './common.js';

/** How the signed-in person stands towards a class. */
export type ClassroomStanding = 'teacher' | 'student' | 'admin';

/** A class as GET /api/classes lists it. */
export interface ClassSummary {
  id: string;
  title: string;
  teacherId: string;
  closed: boolean;
  closedAt: string | null;
  createdAt: string;
  standing: ClassroomStanding;
  studentCount: number;
  /** Only for the teacher (and admins): handing the code on is the teacher's decision. */
  joinCode?: string;
  joinUrl?: string;
  joinCodeExpiresAt?: string;
}

/** GET /api/classes/:id; the student list only for the teacher and admins. */
export interface ClassDetail extends ClassSummary {
  teacher: UserRef;
  students?: (UserRef & { joinedAt: string })[];
  /** What the signed-in person may do with the class, as the API decides. */
  permissions: { publish: boolean };
}

/** POST /api/classes */
export interface CreateClassBody {
  title: string;
  joinCodeValidDays?: number;
}

/** POST /api/classes/:id/join-code */
export interface RenewJoinCodeBody {
  joinCodeValidDays?: number;
}

/** POST /api/classes/join */
export interface JoinClassBody {
  code: string;
}

/**
 * When a student who has answered sees the engine's values: after a right answer, after a right
 * answer or a number of attempts, or only once the class is closed (a closed class shows them
 * under every rule).
 */
export const REVEAL_RULES = ['after-correct', 'after-attempts', 'when-closed'] as const;
export type RevealRule = (typeof REVEAL_RULES)[number];

/** What makes an example an exercise: the outputs students work out, and how close counts. */
export interface ExerciseSettings {
  hiddenOutputs: string[];
  tolerancePercent: number;
  /** Absent on exercises set before the rule existed: they reveal after a right answer. */
  reveal?: RevealRule;
  /** With 'after-attempts': how many attempts reveal the values. */
  revealAfterAttempts?: number;
}

/** Limits a teacher sets on an input for "try it yourself", in the input's SI unit. */
export type TryRanges = Record<string, { min: number; max: number }>;

/** A worked example as a class's list shows it. */
export interface ExampleSummary {
  id: string;
  classroomId: string;
  title: string;
  kind: string;
  calculationId: string;
  versionNumber: number;
  fingerprint: string;
  isExercise: boolean;
  tolerancePercent: number | null;
  publishedAt: string;
  updatedAt: string;
  /** For a student: how many times they answered, and whether the latest was all right. */
  myAttempts?: number;
  myLatestAllCorrect?: boolean | null;
}

/** A step as the class sees it; in an exercise not yet answered, hidden numbers are null. */
export type ExampleStep = Omit<DerivationStep, 'result' | 'values'> & {
  result: Omit<DerivationStep['result'], 'value'> & { value: number | null };
  values: readonly (Omit<DerivationStep['values'][number], 'value'> & { value: number | null })[];
  hidden: boolean;
};

/** A result an exercise asks for, and the step that computes it. */
export interface Question {
  output: string;
  label: string;
  unit: string;
  stepId: string;
}

/** An answer's check; the engine's value and the error stay null until revealed. */
export type RevealableAnswerCheck = Omit<AnswerCheck, 'expected' | 'relativeError'> & {
  expected: number | null;
  relativeError: number | null;
};

/** One attempt at an exercise. */
export interface Submission {
  id: string;
  exampleId: string;
  student: UserRef;
  attempt: number;
  answers: Record<string, number | null>;
  check: Omit<ExerciseCheck, 'answers'> & {
    tolerancePercent: number;
    answers: readonly RevealableAnswerCheck[];
  };
  correctCount: number;
  answerCount: number;
  allCorrect: boolean;
  submittedAt: string;
}

/** GET /api/examples/:id: the example as the reader may see it. */
export interface ExampleDetail extends ExampleSummary {
  classroomTitle: string;
  classroomClosed: boolean;
  teacher: UserRef;
  intro: string;
  engineVersion: string;
  inputs: Record<string, unknown>;
  outputs: Record<string, OutputQuantity>;
  steps: ExampleStep[];
  warnings: readonly CalculationWarning[];
  series: Record<string, DataSeries> | null;
  stepNotes: Record<string, string>;
  tryRanges: TryRanges;
  chartStepId: string | null;
  exercise: ExerciseSettings | null;
  standing: ClassroomStanding;
  /** False while a student has not yet answered the exercise. */
  revealed: boolean;
  questions: Question[];
  mySubmissions: Submission[];
}

/** PATCH /api/examples/:id: what a teacher may set around the fixed content. */
export interface ExampleSettings {
  title?: string;
  intro?: string;
  stepNotes?: Record<string, string>;
  tryRanges?: TryRanges;
  chartStepId?: string | null;
  exercise?: ExerciseSettings | null;
}

/** POST /api/classes/:id/examples */
export interface PublishExampleBody extends ExampleSettings {
  calculationId: string;
  versionNumber: number;
}

/** POST /api/examples/:id/submissions */
export interface SubmitAnswersBody {
  answers: Record<string, number | null>;
}
