import type { CalculationResult } from '../derivation.js';

/** How one answer compares with the engine's value for the same output. */
export interface AnswerCheck {
  readonly output: string;
  readonly label: string;
  /** The derivation step that computes this output. */
  readonly stepId: string;
  readonly unit: string;
  readonly expected: number;
  /** What the student gave, in the output's unit; null when left empty. */
  readonly given: number | null;
  /** |given − expected| / |expected|; null for an empty answer or an expected value of zero. */
  readonly relativeError: number | null;
  readonly correct: boolean;
}

export interface ExerciseCheck {
  readonly answers: readonly AnswerCheck[];
  readonly correctCount: number;
  readonly allCorrect: boolean;
  /** The earliest step, in derivation order, whose output was answered wrong (or left empty). */
  readonly firstWrongStepId: string | null;
}

/**
 * Answers typed from a printed or rounded figure differ from the exact boundary by binary rounding
 * (1.02 × 0.403 is not exactly 0.41106 in floating point), so the tolerance is widened by one part
 * in 10⁹ of itself: an answer exactly at the stated tolerance counts as right.
 */
const BOUNDARY_SLACK = 1e-9;

/** Expected values this close to zero are compared absolutely: no relative error exists. */
const ZERO_BAND = 1e-12;

/**
 * Checks a student's answers for the hidden outputs of an exercise against a result the engine
 * computed. An answer is right when it lies within `toleranceFraction` of the engine's value
 * (0.02 for 2 %), both ends included.
 */
export function checkExerciseAnswers(
  result: Pick<CalculationResult, 'outputs' | 'steps'>,
  hiddenOutputs: readonly string[],
  answers: Readonly<Record<string, number | null | undefined>>,
  toleranceFraction: number,
): ExerciseCheck {
  if (!(toleranceFraction >= 0 && toleranceFraction < 1)) {
    throw new RangeError(`toleranceFraction must be in [0, 1), got ${toleranceFraction}`);
  }
  const stepOrder = new Map(result.steps.map((step, index) => [step.id, index]));
  const checks = hiddenOutputs.map((name): AnswerCheck => {
    const output = result.outputs[name];
    if (!output) throw new RangeError(`The result has no output "${name}"`);
    const raw = answers[name];
    const given = typeof raw === 'number' && Number.isFinite(raw) ? raw : null;
    const expected = output.value;
    const base = {
      output: name,
      label: output.label,
      stepId: output.stepId,
      unit: output.unit,
      expected,
      given,
    };
    if (given === null) return { ...base, relativeError: null, correct: false };
    const difference = Math.abs(given - expected);
    if (Math.abs(expected) <= ZERO_BAND) {
      return { ...base, relativeError: null, correct: difference <= ZERO_BAND };
    }
    const relativeError = difference / Math.abs(expected);
    return {
      ...base,
      relativeError,
      correct: difference <= toleranceFraction * Math.abs(expected) * (1 + BOUNDARY_SLACK),
    };
  });
  const wrong = checks
    .filter((check) => !check.correct)
    .sort(
      (a, b) =>
        (stepOrder.get(a.stepId) ?? Number.MAX_SAFE_INTEGER) -
        (stepOrder.get(b.stepId) ?? Number.MAX_SAFE_INTEGER),
    );
  const correctCount = checks.length - wrong.length;
  return {
    answers: checks,
    correctCount,
    allCorrect: wrong.length === 0,
    firstWrongStepId: wrong[0]?.stepId ?? null,
  };
}
