import * as z from 'zod';
import { count, fraction } from '../schema/quantity-schema.js';
import type { LandingSpreads } from './landing-area-types.js';

/**
 * Default spread of each varied input, one standard deviation as a fraction of its nominal value.
 * common practice, no published source: no publication giving the scatter of latex burst
 * diameters, of ascent rates for a stated fill, of canopy drag or of forecast wind speeds was
 * found (docs/physics.md, "Landing area"); these are the round figures teams plan with. Change
 * them to match the envelope maker's data and the forecast's own error where known.
 */
export const DEFAULT_LANDING_SPREADS: LandingSpreads = Object.freeze({
  burstDiameter: 0.07,
  ascentRate: 0.05,
  descentDrag: 0.1,
  windSpeed: 0.1,
});

/** Repeated flights accepted, and the default. */
export const LANDING_RUNS_RANGE = { min: 20, max: 2000, default: 200 } as const;
/** Largest spread accepted: beyond half the nominal value a normal draw often turns negative. */
export const MAX_LANDING_SPREAD = 0.3;

function spread(description: string, defaultValue: number) {
  return fraction(description, 0, MAX_LANDING_SPREAD).default(defaultValue);
}

export const landingSpreadsSchema = z
  .object({
    burstDiameter: spread(
      'spread of the burst diameter, one standard deviation',
      DEFAULT_LANDING_SPREADS.burstDiameter,
    ),
    ascentRate: spread(
      'spread of the ascent rate (through the amount of gas), one standard deviation',
      DEFAULT_LANDING_SPREADS.ascentRate,
    ),
    descentDrag: spread(
      'spread of the parachute drag (C_d·A), one standard deviation',
      DEFAULT_LANDING_SPREADS.descentDrag,
    ),
    windSpeed: spread(
      'spread of the wind speed at every level, one standard deviation',
      DEFAULT_LANDING_SPREADS.windSpeed,
    ),
  })
  .strict()
  .meta({ description: 'How much each varied input spreads (share of its nominal value)' });

/** The landing-area settings of a flight-profile input. */
export const landingAreaSettingsSchema = z
  .object({
    runs: count(
      'repeated flights with varied inputs',
      LANDING_RUNS_RANGE.min,
      LANDING_RUNS_RANGE.max,
    ).default(LANDING_RUNS_RANGE.default),
    seed: count('seed of the random numbers (same seed, same runs)', 0, 2147483647).default(1),
    spreads: landingSpreadsSchema.prefault({}),
  })
  .strict()
  .meta({ description: 'Landing area: repeated flights with varied inputs' });

export type LandingAreaSettingsInput = z.input<typeof landingAreaSettingsSchema>;
export type LandingAreaSettings = z.output<typeof landingAreaSettingsSchema>;
