/** Allowed range of a numeric input, in the unit the input is given in. */
export interface InputRange {
  readonly min?: number;
  readonly max?: number;
  readonly unit: string;
}

/** One refused input: where it is, what it was, and why it was refused. */
export interface InputIssue {
  /** Dotted path of the offending input, e.g. `ambient.temperatureK`. */
  readonly field: string;
  /** The value received, as given. */
  readonly value: unknown;
  /** Why it was refused, in words a user understands. */
  readonly reason: string;
  /** Allowed range, where the refusal is a range check. */
  readonly range?: InputRange;
}

/**
 * Raised for any input the engine cannot compute with: missing, not a finite number, or outside
 * the range the model is valid for. It names the field path so a form can show the message beside
 * the field, and the API can answer 422 with the same details. The engine never clamps a value
 * instead. `field`, `value`, `reason` and `range` describe the first issue; `issues` lists all.
 */
export class InputError extends Error implements InputIssue {
  override readonly name = 'InputError';
  readonly field: string;
  readonly value: unknown;
  readonly reason: string;
  readonly range?: InputRange;
  readonly issues: readonly InputIssue[];

  constructor(field: string, value: unknown, reason: string, range?: InputRange);
  constructor(issues: readonly InputIssue[]);
  constructor(
    fieldOrIssues: string | readonly InputIssue[],
    value?: unknown,
    reason?: string,
    range?: InputRange,
  ) {
    const issues: readonly InputIssue[] =
      typeof fieldOrIssues === 'string'
        ? [{ field: fieldOrIssues, value, reason: reason ?? 'is not valid', range }]
        : fieldOrIssues;
    const first = issues[0];
    if (!first) throw new TypeError('InputError needs at least one issue');
    super(issues.map(describeIssue).join('; '));
    this.field = first.field;
    this.value = first.value;
    this.reason = first.reason;
    if (first.range) this.range = first.range;
    this.issues = issues;
  }
}

function describeIssue(issue: InputIssue): string {
  return `${issue.field}: ${issue.reason} (got ${formatValue(issue.value)})`;
}

function formatValue(value: unknown): string {
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) {
    return String(value);
  }
  if (value === undefined) return 'nothing';
  const text = JSON.stringify(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

/**
 * Checks that `value` is a finite number within [min, max] and returns it; otherwise throws an
 * InputError naming `field`. Both bounds are inclusive.
 */
export function requireInRange(
  field: string,
  value: unknown,
  min: number,
  max: number,
  unit: string,
): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(field, value, 'must be a finite number', { min, max, unit });
  }
  if (value < min || value > max) {
    throw new InputError(field, value, `must be between ${min} and ${max} ${unit}`, {
      min,
      max,
      unit,
    });
  }
  return value;
}

/**
 * Raised when a result cannot be computed although every input is valid on its own: a numerical
 * method that does not converge, or a combination no physical answer exists for. It is a defect
 * or a limit of the model, never the user's typing.
 */
export class ComputationError extends Error {
  override readonly name = 'ComputationError';
}
