import { ZERO_CELSIUS_K } from '../constants.js';
import { requireInRange } from '../errors.js';

/** Temperatures the saturation formula is used for [K]: −40 °C to +80 °C, over liquid water. */
export const SATURATION_TEMPERATURE_RANGE_K = { min: 233.15, max: 353.15 } as const;

/** Davis (1992) / CIPM-2007 coefficients of psv = exp(A·T² + B·T + C + D/T) [Pa]. */
const A_PER_K2 = 1.2378847e-5;
const B_PER_K = -1.9121316e-2;
const C = 33.93711047;
const D_K = -6.3431645e3;

/**
 * Saturation vapour pressure of water over a plane liquid surface, psv = exp(A·T² + B·T + C + D/T),
 * the formula of the CIPM-2007 air-density equation (Picard et al., Metrologia 45 (2008) 149, after
 * Davis 1992). Over 0–40 °C it agrees with the IAPWS formulation of Wagner & Pruß (2002) to 1e-4.
 * Below 0 °C it gives the pressure over supercooled water, which is what meteorological relative
 * humidity refers to (WMO convention).
 * @param temperatureK water temperature [K], 233.15 to 353.15
 * @returns saturation vapour pressure [Pa]
 */
export function saturationVapourPressurePa(temperatureK: number): number {
  requireInRange(
    'temperatureK',
    temperatureK,
    SATURATION_TEMPERATURE_RANGE_K.min,
    SATURATION_TEMPERATURE_RANGE_K.max,
    'K',
  );
  return Math.exp(
    A_PER_K2 * temperatureK * temperatureK + B_PER_K * temperatureK + C + D_K / temperatureK,
  );
}

/** CIPM-2007 enhancement factor coefficients f = α + β·p + γ·t². */
const ALPHA = 1.00062;
const BETA_PER_PA = 3.14e-8;
const GAMMA_PER_K2 = 5.6e-7;

/**
 * Enhancement factor of water vapour in air, f = α + β·p + γ·t² (CIPM-2007): moist air holds a
 * little more vapour at saturation than pure water vapour alone would.
 * @param pressurePa total pressure [Pa]
 * @param temperatureK temperature [K]
 */
export function enhancementFactor(pressurePa: number, temperatureK: number): number {
  const temperatureC = temperatureK - ZERO_CELSIUS_K;
  return ALPHA + BETA_PER_PA * pressurePa + GAMMA_PER_K2 * temperatureC * temperatureC;
}
