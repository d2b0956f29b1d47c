import * as z from 'zod';
import { DIMENSIONS, type Dimension } from '../units/dimensions.js';

/**
 * A numeric input in SI units with its allowed range. The range is checked by a refinement that
 * carries min, max and unit, so a refusal becomes an InputError with the range attached, and it
 * is published as `dimension`/`minimum`/`maximum`/`unit` in the kind's JSON schema, so a form
 * knows what a field holds without guessing from its name.
 */
export function quantity(dimension: Dimension, min: number, max: number, description?: string) {
  const unit: string = DIMENSIONS[dimension].si;
  const rangeText = unit === '' ? `between ${min} and ${max}` : `between ${min} and ${max} ${unit}`;
  return z
    .number({ error: 'must be a number' })
    .refine((value) => value >= min && value <= max, {
      message: `must be ${rangeText}`,
      params: { min, max, unit, dimension },
      abort: true,
    })
    .meta({
      unit,
      dimension,
      minimum: min,
      maximum: max,
      ...(description ? { description } : {}),
    });
}

/** A share from `min` to `max` (default 0 to 1), e.g. purity or relative humidity: shown in %. */
export function fraction(description: string, min = 0, max = 1) {
  return quantity('fraction', min, max, description);
}

/** A plain ratio or coefficient (drag coefficient, length over diameter): never a percentage. */
export function coefficient(description: string, min: number, max: number) {
  return quantity('coefficient', min, max, description);
}

/** A whole number of things (fills, cells, cylinders), with its range. */
export function count(description: string, min: number, max: number) {
  return z
    .number({ error: 'must be a whole number' })
    .refine((value) => Number.isInteger(value) && value >= min && value <= max, {
      message: `must be a whole number between ${min} and ${max}`,
      params: { min, max, unit: '', dimension: 'count' },
      abort: true,
    })
    .meta({ unit: '', dimension: 'count', minimum: min, maximum: max, description });
}

/**
 * An amount of money in the currency named beside it (`per` a unit of what is bought: "kWh",
 * "m³", or nothing for a price each). Currencies are never converted.
 */
export function money(description: string, max: number, per?: 'kWh' | 'm³') {
  const unit = per ? `currency/${per}` : 'currency';
  return z
    .number({ error: 'must be an amount of money' })
    .refine((value) => value >= 0 && value <= max, {
      message: `must be between 0 and ${max}`,
      params: { min: 0, max, unit, dimension: 'money' },
      abort: true,
    })
    .meta({
      unit,
      dimension: 'money',
      ...(per ? { moneyPer: per } : {}),
      minimum: 0,
      maximum: max,
      description,
    });
}
