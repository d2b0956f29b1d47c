import type { DerivationStep, OutputQuantity } from '@loftwright/buoyancy';
import { numberAtPath } from '@loftwright/buoyancy';
import type { ExerciseSettings } from './worked-example.entity';

export interface ExampleContent {
  inputs: unknown;
  outputs: Record<string, OutputQuantity>;
  steps: DerivationStep[];
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
export type MaskedStep = Omit<DerivationStep, 'result' | 'values'> & {
  result: Omit<DerivationStep['result'], 'value'> & { value: number | null };
  values: (Omit<DerivationStep['values'][number], 'value'> & { value: number | null })[];
  hidden: boolean;
};

/**
 * The content with the exercise's answers taken out: the hidden outputs, the results of the
 * steps computing them, the same numbers where later steps substitute them, and the chart data
 * (a profile would show them).
 */
export function maskForExercise(content: ExampleContent, exercise: ExerciseSettings) {
  const hiddenStepIds = new Set(
    exercise.hiddenOutputs.map((name) => content.outputs[name]?.stepId).filter(Boolean),
  );
  const hiddenResults = content.steps
    .filter((step) => hiddenStepIds.has(step.id))
    .map((step) => step.result);
  const isHiddenValue = (symbol: string, value: number) =>
    hiddenResults.some((result) => result.symbol === symbol && result.value === value);
  const steps: MaskedStep[] = content.steps.map((step) => ({
    ...step,
    hidden: hiddenStepIds.has(step.id),
    result: hiddenStepIds.has(step.id) ? { ...step.result, value: null } : step.result,
    values: step.values.map((value) =>
      isHiddenValue(value.symbol, value.value) ? { ...value, value: null } : value,
    ),
  }));
  const outputs = Object.fromEntries(
    Object.entries(content.outputs).filter(([name]) => !exercise.hiddenOutputs.includes(name)),
  );
  // Only what a student needs to answer: the unit and label of each hidden output.
  const questions = exercise.hiddenOutputs.flatMap((name) => {
    const output = content.outputs[name];
    return output
      ? [{ output: name, label: output.label, unit: output.unit, stepId: output.stepId }]
      : [];
  });
  return { outputs, steps, questions };
}
