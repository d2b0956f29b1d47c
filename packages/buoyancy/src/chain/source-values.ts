import { InputError } from '../errors.js';
import { KINDS } from '../kinds/registry.js';
import type { SourceOutputs } from './continuation-types.js';
import { valueAtPath } from './path-values.js';

/**
 * A result the source must have for the continuation, in the unit it must be in. Missing (the
 * source found no answer, as a sizing with no possible size) is refused naming the output.
 */
export function requiredOutput(outputs: SourceOutputs, name: string, unit: string): number {
  const output = outputs[name];
  if (!output || output.unit !== unit) {
    throw new InputError(
      name,
      output?.value,
      `the source has no result "${name}" in ${unit}: it must compute one before it can be continued`,
    );
  }
  return output.value;
}

/** The target kind's example value at `path`: what a field the source cannot give holds. */
export function exampleValue(kindId: string, path: string): unknown {
  const kind = KINDS.find((candidate) => candidate.id === kindId);
  const value = valueAtPath(kind?.example, path);
  if (value === undefined) throw new Error(`Kind "${kindId}" has no example value at ${path}`);
  return value;
}
