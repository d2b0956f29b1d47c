// Compares two calculations' inputs and results: the API's version diff and the editor's
// conflict dialog show the same changes.

export interface InputChange {
  path: string;
  from: unknown;
  to: unknown;
}

export interface OutputChange {
  name: string;
  label: string;
  unit: string;
  from: number | null;
  to: number | null;
}

interface OutputRecord {
  value: number;
  unit: string;
  label: string;
}

/** Leaves of a JSON value as dotted paths: { a: { b: 1 } } -> [["a.b", 1]]. */
function leaves(value: unknown, prefix = ''): [string, unknown][] {
  if (value !== null && typeof value === 'object') {
    const entries = Array.isArray(value)
      ? value.map((item, index) => [String(index), item] as const)
      : Object.entries(value);
    if (entries.length === 0) return [[prefix, value]];
    return entries.flatMap(([key, child]) => leaves(child, prefix ? `${prefix}.${key}` : key));
  }
  return [[prefix, value]];
}

/** Inputs that differ between two versions, leaf by leaf (missing on one side shows as null). */
export function diffInputs(a: unknown, b: unknown): InputChange[] {
  const left = new Map(leaves(a));
  const right = new Map(leaves(b));
  const paths = [...new Set([...left.keys(), ...right.keys()])].sort();
  return paths
    .filter((path) => JSON.stringify(left.get(path)) !== JSON.stringify(right.get(path)))
    .map((path) => ({ path, from: left.get(path) ?? null, to: right.get(path) ?? null }));
}

/**
 * Relative difference below which two results are the same: two runs of the same engine on the
 * same inputs agree far closer, and nothing a person reads is printed to ten digits.
 */
export const SAME_RESULT_RELATIVE = 1e-9;

/** Whether two results are the same number, within SAME_RESULT_RELATIVE of the larger. */
export function sameResult(a: number | undefined, b: number | undefined): boolean {
  if (a === undefined || b === undefined) return a === b;
  if (a === b) return true;
  return Math.abs(a - b) <= SAME_RESULT_RELATIVE * Math.max(Math.abs(a), Math.abs(b));
}

/** Outputs whose value (or presence) differs between two versions. */
export function diffOutputs(
  a: Record<string, OutputRecord>,
  b: Record<string, OutputRecord>,
): OutputChange[] {
  const names = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
  return names
    .filter(
      (name) => !sameResult(a[name]?.value, b[name]?.value) || a[name]?.unit !== b[name]?.unit,
    )
    .map((name) => {
      const reference = b[name] ?? a[name];
      return {
        name,
        label: reference?.label ?? name,
        unit: reference?.unit ?? '',
        from: a[name]?.value ?? null,
        to: b[name]?.value ?? null,
      };
    });
}
