/**
 * Inputs are nested objects (`envelope.diameterM`, `air.temperatureK`). These helpers read and
 * replace one numeric leaf by its dotted path, for "try it yourself" ranges and exercises.
 */

type Tree = Record<string, unknown>;

const isTree = (value: unknown): value is Tree =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** The number at `path`, or undefined when the path does not lead to a finite number. */
export function numberAtPath(inputs: unknown, path: string): number | undefined {
  let node: unknown = inputs;
  for (const key of path.split('.')) {
    if (!isTree(node) || !Object.hasOwn(node, key)) return undefined;
    node = node[key];
  }
  return typeof node === 'number' && Number.isFinite(node) ? node : undefined;
}

/** A copy of `inputs` with the number at `path` replaced; the original is left untouched. */
export function withNumberAtPath<T>(inputs: T, path: string, value: number): T {
  const [key, ...rest] = path.split('.');
  if (key === undefined || !isTree(inputs) || !Object.hasOwn(inputs, key)) {
    throw new RangeError(`The inputs have no value at "${path}"`);
  }
  const child = rest.length === 0 ? value : withNumberAtPath(inputs[key], rest.join('.'), value);
  return { ...inputs, [key]: child } as T;
}

/** Every numeric leaf of the inputs, by dotted path, in the order the inputs list them. */
export function numericInputPaths(inputs: unknown, prefix = ''): string[] {
  if (!isTree(inputs)) return [];
  return Object.entries(inputs).flatMap(([key, value]) => {
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof value === 'number' && Number.isFinite(value)) return [path];
    return numericInputPaths(value, path);
  });
}

/** A range a teacher allows a student to move one input through, in the input's SI unit. */
export interface InputRangeLimit {
  readonly min: number;
  readonly max: number;
}

/** Paths of the inputs whose values lie outside the ranges allowed, with the range broken. */
export function valuesOutsideRanges(
  inputs: unknown,
  ranges: Readonly<Record<string, InputRangeLimit>>,
): { path: string; value: number | undefined; min: number; max: number }[] {
  return Object.entries(ranges).flatMap(([path, range]) => {
    const value = numberAtPath(inputs, path);
    return value !== undefined && value >= range.min && value <= range.max
      ? []
      : [{ path, value, min: range.min, max: range.max }];
  });
}
