import * as z from 'zod';

/**
 * A numeric input in SI units with its allowed range. The range is checked by a refinement that
 * carries min, max and unit, so a refusal becomes an InputError with the range attached, and it
 * is published as `minimum`/`maximum`/`unit` in the kind's JSON schema for forms to read.
 */
export function quantity(unit: string, min: number, max: number, description?: string) {
  const rangeText = unit === '' ? `between ${min} and ${max}` : `between ${min} and ${max} ${unit}`;
  return z
    .number({ error: 'must be a number' })
    .refine((value) => value >= min && value <= max, {
      message: `must be ${rangeText}`,
      params: { min, max, unit },
      abort: true,
    })
    .meta({ unit, minimum: min, maximum: max, ...(description ? { description } : {}) });
}

/** A fraction from `min` to `max` (default 0 to 1), e.g. purity or relative humidity. */
export function fraction(description: string, min = 0, max = 1) {
  return quantity('', min, max, description);
}
