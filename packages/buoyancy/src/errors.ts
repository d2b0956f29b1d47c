/**
 * Raised for any input the engine cannot compute with: not a finite number, or outside the range
 * the model is valid for. It names the field path so a form can show the message beside the field,
 * and the API can answer 422 with the same details. The engine never clamps a value instead.
 */
export class InputError extends Error {
  override readonly name = 'InputError';

  constructor(
    /** Dotted path of the offending input, e.g. `ambient.temperatureK`. */
    readonly field: string,
    /** The value received, as given. */
    readonly value: unknown,
    /** Why it was refused, in words a user understands. */
    readonly reason: string,
    /** Allowed range, where the refusal is a range check. */
    readonly range?: { readonly min?: number; readonly max?: number; readonly unit: string },
  ) {
    super(`${field}: ${reason} (got ${formatValue(value)})`);
  }
}

function formatValue(value: unknown): string {
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) {
    return String(value);
  }
  if (value === undefined) return 'nothing';
  return JSON.stringify(value);
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
