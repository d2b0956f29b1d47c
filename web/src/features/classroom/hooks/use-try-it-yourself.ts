import { evaluate, InputError, valuesOutsideRanges, withNumberAtPath } from '@loftwright/buoyancy';
import { useState } from 'react';
import type { TryRanges } from '../api/classroom-api';

/** The example's inputs with the student's changes that read in place. */
function changedInputs(
  inputs: Record<string, unknown>,
  changes: Record<string, number | undefined>,
) {
  let modified: Record<string, unknown> = inputs;
  for (const [path, value] of Object.entries(changes)) {
    if (value !== undefined) modified = withNumberAtPath(modified, path, value);
  }
  return modified;
}

/**
 * The student's changes to the inputs a teacher opened up, and the results recomputed in the
 * browser: none while a change does not read or lies outside its range.
 */
export function useTryItYourself(kind: string, inputs: Record<string, unknown>, ranges: TryRanges) {
  const [changes, setChanges] = useState<Record<string, number | undefined>>({});
  // Bumped on reset so the quantity fields show the original values again.
  const [generation, setGeneration] = useState(0);
  const paths = Object.keys(ranges);
  const unreadable = paths.filter((path) => path in changes && changes[path] === undefined);

  const computed = ((): {
    result: ReturnType<typeof evaluate> | undefined;
    problem: string | undefined;
    outside: string[];
  } => {
    try {
      const modified = changedInputs(inputs, changes);
      const outside = valuesOutsideRanges(modified, ranges).map((issue) => issue.path);
      if (outside.length > 0 || unreadable.length > 0) {
        return { result: undefined, problem: undefined, outside };
      }
      return { result: evaluate(kind, modified), problem: undefined, outside };
    } catch (error) {
      return {
        result: undefined,
        problem:
          error instanceof InputError || error instanceof Error ? error.message : String(error),
        outside: [],
      };
    }
  })();

  return {
    paths,
    changes,
    change: (path: string, value: number | undefined) =>
      setChanges((now) => ({ ...now, [path]: value })),
    /** Back to the example's values. */
    reset: () => {
      setChanges({});
      setGeneration((now) => now + 1);
    },
    generation,
    ...computed,
  };
}
