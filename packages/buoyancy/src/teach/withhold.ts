import type { DerivationStep } from '../derivation.js';

/**
 * What an exercise must keep from a student who has not yet earned the answers: every step that
 * computes a hidden output or is computed from one, and every number such a step produces,
 * wherever it appears again (a lift in grams, the same lift as a force in newtons, a time in
 * hours where the answer is in minutes: each is a later step fed with a withheld number).
 */
export interface Withheld {
  /** Steps whose result is, or is computed from, a hidden output. */
  readonly stepIds: ReadonlySet<string>;
  /** The results of those steps: any value equal to one of them is blanked wherever it appears. */
  readonly values: readonly number[];
  /**
   * The symbols of those results: a value fed under one of them is the same quantity, even when
   * the step converted it on the way in (a gross lift in kg fed to a step as grams).
   */
  readonly symbols: ReadonlySet<string>;
}

/**
 * Follows the derivation forward from the steps of the hidden outputs. A step's values are the
 * numbers it was fed; when one of them is a withheld result, the step is derived from a hidden
 * output and its own result is withheld too. Steps before a hidden one (its inputs) stay shown.
 * A value that only happens to equal a withheld number is blanked as well: hiding one number too
 * many is the safe side.
 */
export function withheldByDerivation(
  steps: readonly DerivationStep[],
  hiddenStepIds: ReadonlySet<string>,
): Withheld {
  const withheld = {
    stepIds: new Set<string>(),
    values: [] as number[],
    symbols: new Set<string>(),
  };
  for (const step of steps) {
    const derived =
      hiddenStepIds.has(step.id) || step.values.some((value) => isWithheldValue(withheld, value));
    if (!derived) continue;
    withheld.stepIds.add(step.id);
    withheld.symbols.add(step.result.symbol);
    if (!withheld.values.some((hidden) => sameNumber(hidden, step.result.value))) {
      withheld.values.push(step.result.value);
    }
  }
  return withheld;
}

/**
 * Whether a value in a step is withheld: it equals a withheld number, or it is fed under the
 * symbol of a withheld result (the same quantity, perhaps converted to another unit).
 */
export function isWithheldValue(
  withheld: Withheld,
  value: { readonly symbol: string; readonly value: number },
): boolean {
  return (
    withheld.symbols.has(value.symbol) ||
    withheld.values.some((hidden) => sameNumber(hidden, value.value))
  );
}

function sameNumber(a: number, b: number): boolean {
  if (a === b) return true;
  return Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
}
