import type { NumberFormat, UnitSystem } from '@loftwright/contract';

export type { NumberFormat, Preferences, UnitSystem } from '@loftwright/contract';

/** How quantities are shown: SI units or US customary units. */
export const UNIT_SYSTEMS = ['si', 'us'] as const satisfies readonly UnitSystem[];

/**
 * How a person writes and reads numbers, named by decimal mark then digit grouping:
 * `point-comma` 1,234.5; `comma-space` 1 234,5; `comma-point` 1.234,5.
 */
export const NUMBER_FORMATS = [
  'point-comma',
  'comma-space',
  'comma-point',
] as const satisfies readonly NumberFormat[];

/** For an account whose browser did not say how it writes numbers. */
export const DEFAULT_NUMBER_FORMAT: NumberFormat = 'point-comma';

/** The currency new gas plans and prices start in: an ISO 4217 code. */
export const DEFAULT_CURRENCY = 'EUR';

export const PREFERENCE_FIELDS = ['unitSystem', 'numberFormat', 'currency'] as const;
