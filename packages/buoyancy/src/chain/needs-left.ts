import { valueAtPath } from './path-values.js';

/**
 * The paths a continued calculation still needs filled after a save: those whose value the
 * person left as it was (the kind's example value the continuation put there).
 * @param needs paths still to fill before the save
 * @param previousInputs the inputs of the version the save started from
 * @param savedInputs the inputs saved
 */
export function needsLeft(
  needs: readonly string[],
  previousInputs: unknown,
  savedInputs: unknown,
): string[] {
  return needs.filter(
    (path) =>
      JSON.stringify(valueAtPath(previousInputs, path)) ===
      JSON.stringify(valueAtPath(savedInputs, path)),
  );
}
