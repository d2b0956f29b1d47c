import { ZERO_CELSIUS_K } from '../constants.js';
import { requireInRange } from '../errors.js';
import { AIR_PRESSURE_RANGE_PA, AIR_TEMPERATURE_RANGE_K } from './air-density.js';
import { enhancementFactor, saturationVapourPressurePa } from './saturation-vapour-pressure.js';

/** CIPM-2007: molar gas constant it was fitted with (CODATA 2006) [J/(mol K)]. */
export const CIPM_GAS_CONSTANT_J_PER_MOL_K = 8.314472;
/** CIPM-2007: molar mass of dry air at 400 µmol/mol CO2 [kg/mol]. */
export const CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL = 28.96546e-3;
/** Molar mass of water [kg/mol] (CIPM-2007). */
export const WATER_MOLAR_MASS_KG_PER_MOL = 18.01528e-3;
/** Molar mass of carbon in the CO2 correction of CIPM-2007 [kg/mol]. */
const CARBON_MOLAR_MASS_KG_PER_MOL = 12.011e-3;
const REFERENCE_CO2_MOLE_FRACTION = 0.0004;

/** CIPM-2007 compressibility coefficients. */
const A0 = 1.58123e-6;
const A1 = -2.9331e-8;
const A2 = 1.1043e-10;
const B0 = 5.707e-6;
const B1 = -2.051e-8;
const C0 = 1.9898e-4;
const C1 = -2.376e-6;
const D = 1.83e-11;
const E = -0.765e-8;

/** The range the CIPM-2007 formula was fitted for (its published scope). */
export const CIPM_VALIDITY = {
  pressurePa: { min: 60000, max: 110000 },
  temperatureK: { min: 288.15, max: 300.15 },
} as const;

export interface MoistAirInput {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Mole fraction of water vapour, 0 for dry air. */
  readonly vapourMoleFraction: number;
  /** Mole fraction of CO2; 0.0004 if not given. */
  readonly co2MoleFraction?: number;
}

export interface MoistAirState {
  readonly densityKgM3: number;
  readonly compressibility: number;
  readonly molarMassKgPerMol: number;
}

/**
 * Density of moist air by the CIPM-2007 equation (Picard, Davis, Gläser, Fujii, Metrologia 45
 * (2008) 149–155): ρ = p·Ma / (Z·R·T) · [1 − xv·(1 − Mv/Ma)], with the compressibility Z of its
 * virial fit. Published for 600–1100 hPa and 15–27 °C; outside that the real-gas correction is
 * extrapolated (it tends to the ideal gas as pressure falls, which is physically right).
 */
export function moistAirDensity(input: MoistAirInput): MoistAirState {
  const temperatureK = requireInRange(
    'temperatureK',
    input.temperatureK,
    AIR_TEMPERATURE_RANGE_K.min,
    AIR_TEMPERATURE_RANGE_K.max,
    'K',
  );
  const pressurePa = requireInRange(
    'pressurePa',
    input.pressurePa,
    AIR_PRESSURE_RANGE_PA.min,
    AIR_PRESSURE_RANGE_PA.max,
    'Pa',
  );
  const xv = requireInRange('vapourMoleFraction', input.vapourMoleFraction, 0, 1, '');
  const xCo2 = requireInRange(
    'co2MoleFraction',
    input.co2MoleFraction ?? REFERENCE_CO2_MOLE_FRACTION,
    0,
    0.01,
    '',
  );
  const t = temperatureK - ZERO_CELSIUS_K;
  const dryMolarMass =
    CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL +
    CARBON_MOLAR_MASS_KG_PER_MOL * (xCo2 - REFERENCE_CO2_MOLE_FRACTION);
  const pOverT = pressurePa / temperatureK;
  const compressibility =
    1 -
    pOverT * (A0 + A1 * t + A2 * t * t + (B0 + B1 * t) * xv + (C0 + C1 * t) * xv * xv) +
    pOverT * pOverT * (D + E * xv * xv);
  const densityKgM3 =
    ((pressurePa * dryMolarMass) /
      (compressibility * CIPM_GAS_CONSTANT_J_PER_MOL_K * temperatureK)) *
    (1 - xv * (1 - WATER_MOLAR_MASS_KG_PER_MOL / dryMolarMass));
  return {
    densityKgM3,
    compressibility,
    molarMassKgPerMol: (1 - xv) * dryMolarMass + xv * WATER_MOLAR_MASS_KG_PER_MOL,
  };
}

/**
 * Mole fraction of water vapour from relative humidity, xv = h·f(p, t)·psv(T) / p (CIPM-2007).
 * @param relativeHumidity 0 to 1, with respect to liquid water
 */
export function vapourMoleFractionFromRelativeHumidity(
  relativeHumidity: number,
  temperatureK: number,
  pressurePa: number,
): number {
  requireInRange('relativeHumidity', relativeHumidity, 0, 1, '');
  return (
    (relativeHumidity *
      enhancementFactor(pressurePa, temperatureK) *
      saturationVapourPressurePa(temperatureK)) /
    pressurePa
  );
}

/**
 * Mole fraction of water vapour from the dew point, xv = f(p, td)·psv(Td) / p (CIPM-2007).
 * @param dewPointK dew-point temperature [K], not above the air temperature
 */
export function vapourMoleFractionFromDewPoint(
  dewPointK: number,
  temperatureK: number,
  pressurePa: number,
): number {
  requireInRange('dewPointK', dewPointK, 233.15, temperatureK, 'K');
  return (
    (enhancementFactor(pressurePa, dewPointK) * saturationVapourPressurePa(dewPointK)) / pressurePa
  );
}

/**
 * Density of moist air from temperature, pressure and relative humidity, CIPM-2007.
 * @param temperatureK air temperature [K]
 * @param pressurePa absolute pressure [Pa]
 * @param relativeHumidity 0 to 1
 * @returns density [kg/m3]
 */
export function moistAirDensityKgM3(
  temperatureK: number,
  pressurePa: number,
  relativeHumidity: number,
): number {
  const vapourMoleFraction =
    relativeHumidity === 0
      ? 0
      : vapourMoleFractionFromRelativeHumidity(relativeHumidity, temperatureK, pressurePa);
  return moistAirDensity({ temperatureK, pressurePa, vapourMoleFraction }).densityKgM3;
}
