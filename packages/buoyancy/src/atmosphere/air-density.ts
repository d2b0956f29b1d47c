import {
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
} from '../constants.js';
import { requireInRange } from '../errors.js';

/** Range of temperatures the dry-air formula accepts [K]: −100 °C to +150 °C. */
export const AIR_TEMPERATURE_RANGE_K = { min: 173.15, max: 423.15 } as const;

/** Range of pressures the dry-air formula accepts [Pa]: from the 86 km level up to 2 atm. */
export const AIR_PRESSURE_RANGE_PA = { min: 0.3, max: 202650 } as const;

/**
 * Density of dry air from the ideal-gas law, rho = p M / (R T), with the molar mass and gas
 * constant of the U.S. Standard Atmosphere 1976 (so that 288.15 K and 101 325 Pa give the
 * standard's sea-level 1.2250 kg/m3).
 *
 * Real dry air near ambient is about 4e-4 denser than this (compressibility Z ≈ 0.9996, CIPM-2007);
 * the moist-air formula accounts for that where the difference matters.
 *
 * @param temperatureK air temperature [K], 173.15 to 423.15
 * @param pressurePa absolute air pressure [Pa], 0.3 to 202 650
 * @returns density [kg/m3]
 * @throws InputError when either input is not finite or out of range
 */
export function dryAirDensityKgM3(temperatureK: number, pressurePa: number): number {
  requireInRange(
    'temperatureK',
    temperatureK,
    AIR_TEMPERATURE_RANGE_K.min,
    AIR_TEMPERATURE_RANGE_K.max,
    'K',
  );
  requireInRange(
    'pressurePa',
    pressurePa,
    AIR_PRESSURE_RANGE_PA.min,
    AIR_PRESSURE_RANGE_PA.max,
    'Pa',
  );
  return (
    (pressurePa * USSA1976_AIR_MOLAR_MASS_KG_PER_MOL) /
    (USSA1976_GAS_CONSTANT_J_PER_MOL_K * temperatureK)
  );
}
