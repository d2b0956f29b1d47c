import { USSA1976_AIR_MOLAR_MASS_KG_PER_MOL } from '../constants.js';
import { InputError } from '../errors.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import {
  vapourMoleFractionFromDewPoint,
  vapourMoleFractionFromRelativeHumidity,
  WATER_MOLAR_MASS_KG_PER_MOL,
} from './moist-air-density.js';

/** The air's water content as the inputs give it: dry, a relative humidity, or a dew point. */
export type HumidityInput = AmbientInput['humidity'];

/** Refuses a dew point above the air temperature: air cannot be more than saturated. */
export function requireDewPointNotAboveAir(dewPointK: number, temperatureK: number): void {
  if (dewPointK > temperatureK) {
    throw new InputError(
      'ambient.humidity.dewPointK',
      dewPointK,
      'must not be above the air temperature',
      { max: temperatureK, unit: 'K' },
    );
  }
}

/** Refuses a vapour mole fraction of 1 or more: water boils, there is no air left. */
export function requireVapourBelowOne(vapourMoleFraction: number, humidity: HumidityInput): void {
  if (vapourMoleFraction >= 1) {
    throw new InputError(
      'ambient.humidity',
      humidity,
      'is more water vapour than air can hold: water boils at this temperature and pressure',
    );
  }
}

/**
 * Mole fraction of water vapour in air of the given humidity (CIPM-2007, x_v = h·f·p_sv/p or
 * f·p_sv(T_d)/p), with the same refusals as the ambient derivation; 0 for dry air and for 0 %.
 */
export function vapourMoleFractionOfHumidity(
  humidity: HumidityInput,
  temperatureK: number,
  pressurePa: number,
): number {
  if (humidity.kind === 'dry') return 0;
  if (humidity.kind === 'relative' && humidity.relativeHumidity === 0) return 0;
  if (humidity.kind === 'dewPoint') requireDewPointNotAboveAir(humidity.dewPointK, temperatureK);
  const vapourMoleFraction =
    humidity.kind === 'relative'
      ? vapourMoleFractionFromRelativeHumidity(humidity.relativeHumidity, temperatureK, pressurePa)
      : vapourMoleFractionFromDewPoint(humidity.dewPointK, temperatureK, pressurePa);
  requireVapourBelowOne(vapourMoleFraction, humidity);
  return vapourMoleFraction;
}

/**
 * Density of the 1976 standard's air with water vapour mixed in as an ideal gas,
 * ρ = ρ_dry·[1 − x_v·(1 − M_v/M₀)] (Dalton's law of partial pressures) [kg/m3].
 */
export function standardHumidAirDensityKgM3(
  dryDensityKgM3: number,
  vapourMoleFraction: number,
): number {
  return (
    dryDensityKgM3 *
    (1 -
      vapourMoleFraction * (1 - WATER_MOLAR_MASS_KG_PER_MOL / USSA1976_AIR_MOLAR_MASS_KG_PER_MOL))
  );
}
