/** Reading and writing a value at a dotted input path (`envelope.launchDiameterM`, `packages.0.massKg`). */

type Container = Record<string, unknown> | unknown[];

const isContainer = (value: unknown): value is Container =>
  typeof value === 'object' && value !== null;

/**
 * The value at `path` inside `inputs`, or undefined where any part of the path is missing.
 * @param inputs a kind's inputs (plain JSON)
 * @param path dotted path; numeric parts index arrays
 */
export function valueAtPath(inputs: unknown, path: string): unknown {
  let current: unknown = inputs;
  for (const part of path.split('.')) {
    if (!isContainer(current)) return undefined;
    current = (current as Record<string, unknown>)[part];
  }
  return current;
}

/**
 * A copy of `inputs` with `value` at `path`; objects and arrays on the way are copied, not
 * changed, and made where missing (an array where the next part is a number).
 */
export function withValueAtPath(inputs: unknown, path: string, value: unknown): unknown {
  const [head, ...rest] = path.split('.');
  if (head === undefined || head === '') return value;
  const base: Container = isContainer(inputs) ? inputs : /^\d+$/.test(head) ? [] : {};
  const copy: Container = Array.isArray(base) ? [...base] : { ...base };
  const child = (copy as Record<string, unknown>)[head];
  (copy as Record<string, unknown>)[head] =
    rest.length === 0 ? value : withValueAtPath(child, rest.join('.'), value);
  return copy;
}

/** The path of the object holding `path`'s last part ('' for a top-level field). */
export function parentPath(path: string): string {
  return path.split('.').slice(0, -1).join('.');
}
