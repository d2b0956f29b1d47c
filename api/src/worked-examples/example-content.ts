import type { CalculationWarning, DerivationStep, OutputQuantity } from '@loftwright/buoyancy';
import { isWithheldValue, numberAtPath, withheldByDerivation } from '@loftwright/buoyancy';
import type { ExampleStep, ExerciseSettings, Question } from '@loftwright/contract';

export interface ExampleContent {
  inputs: unknown;
  outputs: Record<string, OutputQuantity>;
  steps: readonly DerivationStep[];
}

/** A problem with a teacher's settings, named by field, for a 400 answer. */
export interface SettingsIssue {
  field: string;
  reason: string;
}

/** Checks a teacher's notes, ranges, chart step and exercise against the example's own content. */
export function settingsIssues(
  content: ExampleContent,
  settings: {
    stepNotes?: Record<string, unknown>;
    tryRanges?: Record<string, unknown>;
    chartStepId?: string | null;
    exercise?: ExerciseSettings | null;
  },
): SettingsIssue[] {
  const issues: SettingsIssue[] = [];
  const stepIds = new Set(content.steps.map((step) => step.id));
  for (const [stepId, note] of Object.entries(settings.stepNotes ?? {})) {
    if (!stepIds.has(stepId)) {
      issues.push({ field: `stepNotes.${stepId}`, reason: 'names no step of this calculation' });
    } else if (typeof note !== 'string' || note.length > 2000) {
      issues.push({
        field: `stepNotes.${stepId}`,
        reason: 'must be text of at most 2000 characters',
      });
    }
  }
  for (const [path, raw] of Object.entries(settings.tryRanges ?? {})) {
    const field = `tryRanges.${path}`;
    const value = numberAtPath(content.inputs, path);
    const range = raw as { min?: unknown; max?: unknown } | null;
    if (value === undefined) {
      issues.push({ field, reason: 'names no numeric input of this calculation' });
      continue;
    }
    const { min, max } = range ?? {};
    if (typeof min !== 'number' || typeof max !== 'number' || !Number.isFinite(min + max)) {
      issues.push({ field, reason: 'needs a numeric min and max, in the input’s SI unit' });
    } else if (!(min < max)) {
      issues.push({ field, reason: `min (${min}) must be below max (${max})` });
    } else if (value < min || value > max) {
      issues.push({
        field,
        reason: `the example’s own value ${value} lies outside ${min} … ${max}`,
      });
    }
  }
  if (
    settings.chartStepId !== undefined &&
    settings.chartStepId !== null &&
    !stepIds.has(settings.chartStepId)
  ) {
    issues.push({ field: 'chartStepId', reason: 'names no step of this calculation' });
  }
  const exercise = settings.exercise;
  if (exercise?.reveal === 'after-attempts' && exercise.revealAfterAttempts === undefined) {
    issues.push({
      field: 'exercise.revealAfterAttempts',
      reason: 'is needed when the values are revealed after a number of attempts',
    });
  }
  for (const name of settings.exercise?.hiddenOutputs ?? []) {
    if (!content.outputs[name]) {
      issues.push({
        field: 'exercise.hiddenOutputs',
        reason: `"${name}" is not an output of this calculation (it has ${Object.keys(content.outputs).join(', ')})`,
      });
    }
  }
  return issues;
}

/** A step as a student sees it before answering: what is to be worked out is left blank. */
export type MaskedStep = ExampleStep;

/** What a student sees of an exercise before answering, and what they are asked. */
export interface MaskedContent {
  outputs: Record<string, OutputQuantity>;
  steps: MaskedStep[];
  warnings: CalculationWarning[];
  questions: Question[];
}

/**
 * The content with the exercise's answers taken out, by derivation: the hidden outputs, every
 * step computed from one (the same quantity in another unit, a force from a hidden mass, a later
 * total), every number such a step produced wherever it appears again, every output of those
 * steps, and notes that quote a computed number (a caution never does). The chart data goes too
 * (a profile would show them).
 */
export function maskForExercise(
  content: ExampleContent & { warnings?: readonly CalculationWarning[] },
  exercise: ExerciseSettings,
): MaskedContent {
  const hiddenStepIds = new Set(
    exercise.hiddenOutputs.flatMap((name) => content.outputs[name]?.stepId ?? []),
  );
  const withheld = withheldByDerivation(content.steps, hiddenStepIds);
  const steps: MaskedStep[] = content.steps.map((step) => {
    const hidden = withheld.stepIds.has(step.id);
    return {
      ...step,
      hidden,
      result: hidden ? { ...step.result, value: null } : step.result,
      values: step.values.map((value) =>
        isWithheldValue(withheld, value) ? { ...value, value: null } : value,
      ),
    };
  });
  const outputs = Object.fromEntries(
    Object.entries(content.outputs).filter(
      ([name, output]) =>
        !exercise.hiddenOutputs.includes(name) && !withheld.stepIds.has(output.stepId),
    ),
  );
  const warnings = (content.warnings ?? []).map((warning) =>
    warning.severity !== 'caution' && /\d/.test(warning.message)
      ? { ...warning, message: WITHHELD_NOTE }
      : warning,
  );
  // Only what a student needs to answer: the unit and label of each hidden output.
  const questions = exercise.hiddenOutputs.flatMap((name) => {
    const output = content.outputs[name];
    return output
      ? [{ output: name, label: output.label, unit: output.unit, stepId: output.stepId }]
      : [];
  });
  return { outputs, steps, warnings, questions };
}

const WITHHELD_NOTE =
  'A note about the results is held back: it would give an answer away. It is shown once the answers are revealed.';

/**
 * Whether a student who has made these attempts may see the engine's values, under the teacher's
 * rule; a closed class shows them under every rule.
 */
export function answersRevealed(
  exercise: ExerciseSettings,
  attempts: readonly { allCorrect: boolean }[],
  classroomClosed: boolean,
): boolean {
  if (classroomClosed) return true;
  const rule = exercise.reveal ?? 'after-correct';
  if (rule === 'when-closed') return false;
  if (attempts.some((attempt) => attempt.allCorrect)) return true;
  return rule === 'after-attempts' && attempts.length >= (exercise.revealAfterAttempts ?? Infinity);
}
