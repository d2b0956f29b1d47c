import type * as z from 'zod';

/**
 * What the trade usually meets for a field, in the field's SI unit. A value outside it is allowed
 * (the allowed range is wider and is what the engine refuses outside); it only earns a "check
 * this" note, because such a value is more often a slip of the finger than a real envelope.
 */
export interface UsualRange {
  readonly min?: number;
  readonly max?: number;
  /** Why this is unusual, as the end of a sentence: "free balloons are seldom larger". */
  readonly why: string;
}

/**
 * The schema with its usual range published beside its allowed one (`usualMinimum`,
 * `usualMaximum`, `usualWhy` in the JSON Schema), where the note check and forms find it.
 */
export function usually<T extends z.ZodType>(schema: T, usual: UsualRange): T {
  return schema.meta({
    ...schema.meta(),
    ...(usual.min !== undefined ? { usualMinimum: usual.min } : {}),
    ...(usual.max !== undefined ? { usualMaximum: usual.max } : {}),
    usualWhy: usual.why,
  }) as T;
}
