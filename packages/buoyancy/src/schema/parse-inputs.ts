import type * as z from 'zod';
import { InputError, type InputIssue } from '../errors.js';

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let current: unknown = root;
  for (const key of path) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<PropertyKey, unknown>)[key];
  }
  return current;
}

function toIssue(issue: z.core.$ZodIssue, inputs: unknown): InputIssue {
  const field = issue.path.length > 0 ? issue.path.map(String).join('.') : '(inputs)';
  const value = valueAt(inputs, issue.path);
  if (issue.code === 'custom' && issue.params && typeof issue.params.unit === 'string') {
    const { min, max, unit } = issue.params as { min: number; max: number; unit: string };
    return { field, value, reason: issue.message, range: { min, max, unit } };
  }
  if (issue.code === 'unrecognized_keys') {
    return { field, value: issue.keys, reason: `has unknown field(s): ${issue.keys.join(', ')}` };
  }
  if (issue.code === 'invalid_type' && value === undefined) {
    return { field, value, reason: 'is required' };
  }
  return { field, value, reason: issue.message };
}

/**
 * Parses and validates raw inputs against a kind's schema, filling in defaults. Every problem is
 * reported at once, each with its field path, as one InputError.
 */
export function parseInputs<T extends z.ZodType>(schema: T, inputs: unknown): z.output<T> {
  const parsed = schema.safeParse(inputs);
  if (parsed.success) return parsed.data;
  throw new InputError(parsed.error.issues.map((issue) => toIssue(issue, inputs)));
}
