import { InputError, requireInRange } from '../errors.js';

/** The team's cylinders, as typed on the card: one size, all filled to the same pressure. */
export interface FillCardCylinderOptions {
  /** Internal (water) volume of one cylinder [m³]. */
  readonly waterVolumeM3: number;
  /** Gauge pressure of a full cylinder [Pa], as its gauge reads. */
  readonly fillPressurePa: number;
  /** Cylinder (and gas) temperature at the filling table [K]. */
  readonly temperatureK: number;
  /** How many full cylinders the team has; one when not said. */
  readonly count?: number;
}

/** What the crew types on the card besides the saved version. */
export interface FillCardOptions {
  /** Target free lift [kg]; the version's own when left out and it has one. */
  readonly freeLiftKg?: number;
  /** Mass of the filler (the neck fitting the weight hangs on) [kg]. */
  readonly fillerMassKg?: number;
  readonly cylinder?: FillCardCylinderOptions;
}

/** The typed options, checked: every number present, finite and in range. */
export interface CheckedFillCardOptions {
  readonly freeLiftKg?: number;
  readonly fillerMassKg: number;
  readonly cylinder?: Required<FillCardCylinderOptions>;
}

/** Ranges of the typed options, in SI, shared with the forms that type them. */
export const FILL_CARD_RANGES = {
  freeLiftKg: { min: 0, max: 10000, unit: 'kg' },
  fillerMassKg: { min: 0, max: 1000, unit: 'kg' },
  waterVolumeM3: { min: 0.0001, max: 10, unit: 'm³' },
  fillPressurePa: { min: 1e5, max: 1e8, unit: 'Pa' },
  temperatureK: { min: 233.15, max: 333.15, unit: 'K' },
  count: { min: 1, max: 1000, unit: '' },
} as const;

function inRange(field: string, value: unknown, range: { min: number; max: number; unit: string }) {
  return requireInRange(field, value, range.min, range.max, range.unit);
}

/**
 * Checks the card's typed options, naming the field of the first one missing or out of range
 * (dotted under `cylinder.` for the cylinder's), so a form or the API can say which.
 * @throws InputError
 */
export function checkFillCardOptions(options: FillCardOptions): CheckedFillCardOptions {
  const r = FILL_CARD_RANGES;
  if (options.fillerMassKg === undefined) {
    throw new InputError(
      'fillerMassKg',
      undefined,
      'is required: weigh the filler first',
      r.fillerMassKg,
    );
  }
  const fillerMassKg = inRange('fillerMassKg', options.fillerMassKg, r.fillerMassKg);
  const freeLiftKg =
    options.freeLiftKg === undefined
      ? undefined
      : inRange('freeLiftKg', options.freeLiftKg, r.freeLiftKg);
  const cylinder = options.cylinder;
  if (!cylinder) return { fillerMassKg, ...(freeLiftKg === undefined ? {} : { freeLiftKg }) };
  const count = inRange('cylinder.count', cylinder.count ?? 1, r.count);
  if (!Number.isInteger(count)) {
    throw new InputError('cylinder.count', count, 'must be a whole number of cylinders', r.count);
  }
  return {
    fillerMassKg,
    ...(freeLiftKg === undefined ? {} : { freeLiftKg }),
    cylinder: {
      waterVolumeM3: inRange('cylinder.waterVolumeM3', cylinder.waterVolumeM3, r.waterVolumeM3),
      fillPressurePa: inRange('cylinder.fillPressurePa', cylinder.fillPressurePa, r.fillPressurePa),
      temperatureK: inRange('cylinder.temperatureK', cylinder.temperatureK, r.temperatureK),
      count,
    },
  };
}
