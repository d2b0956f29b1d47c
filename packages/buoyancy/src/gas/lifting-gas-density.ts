import {
  CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL,
  WATER_MOLAR_MASS_KG_PER_MOL,
} from '../atmosphere/moist-air-density.js';
import {
  enhancementFactor,
  saturationVapourPressurePa,
} from '../atmosphere/saturation-vapour-pressure.js';
import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { InputError, requireInRange } from '../errors.js';
import { GAS_CATALOGUE, type GasId } from './gas-catalogue.js';

/** Gas temperatures accepted [K]: down to 120 K (the 1976 atmosphere at 86 km with a −60 K offset is 127 K) and up to +150 °C (hot air). */
export const GAS_TEMPERATURE_RANGE_K = { min: 120, max: 423.15 } as const;
/** Lowest purity accepted: a gas that is mostly air is not a lifting gas any more. */
export const MIN_PURITY = 0.5;

export interface GasDensityInput {
  readonly gasId: GasId;
  /** Gas temperature [K]; warmer than the air is superheat. */
  readonly temperatureK: number;
  /** Absolute gas pressure [Pa]: ambient plus any superpressure. */
  readonly pressurePa: number;
  /** Mole fraction of the named gas in the dry gas, the rest being air; 1 for pure gas. */
  readonly purity?: number;
  /** Relative humidity of the gas at its own temperature, 0 (dried) to 1 (saturated). */
  readonly relativeHumidity?: number;
}

export interface GasState {
  readonly densityKgM3: number;
  readonly molarMassKgPerMol: number;
  /** Molar mass of the dry gas mixture (named gas plus air) [kg/mol]. */
  readonly dryMolarMassKgPerMol: number;
  readonly vapourMoleFraction: number;
}

/**
 * Density of a lifting gas by the ideal-gas law at its own temperature and pressure,
 * ρ = p·M / (R·T), where M is the molar mass of the mixture: the named gas at the given purity, air
 * as the contaminant, and water vapour at the given relative humidity (xv = h·f(p,T)·psv(T)/p,
 * with the CIPM-2007 enhancement factor f).
 * The ideal-gas law overstates H₂ and He density by about 6e-4 at 1 atm (Z ≈ 1.0005–1.0006);
 * see docs/physics.md.
 */
export function gasDensity(input: GasDensityInput): GasState {
  const gas = GAS_CATALOGUE[input.gasId];
  const temperatureK = requireInRange(
    'temperatureK',
    input.temperatureK,
    GAS_TEMPERATURE_RANGE_K.min,
    GAS_TEMPERATURE_RANGE_K.max,
    'K',
  );
  const pressurePa = requireInRange('pressurePa', input.pressurePa, 0.3, 1.2e6, 'Pa');
  const purity = requireInRange('purity', input.purity ?? 1, MIN_PURITY, 1, '');
  const relativeHumidity = requireInRange(
    'relativeHumidity',
    input.relativeHumidity ?? 0,
    0,
    1,
    '',
  );
  const dryMolarMass =
    purity * gas.molarMassKgPerMol + (1 - purity) * CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL;
  const vapourMoleFraction =
    relativeHumidity === 0
      ? 0
      : // The CIPM-2007 enhancement factor, as for the air: vapour in a gas at pressure holds a
        // little more than over pure water.
        (relativeHumidity *
          enhancementFactor(pressurePa, temperatureK) *
          saturationVapourPressurePa(temperatureK)) /
        pressurePa;
  if (vapourMoleFraction >= 1) {
    throw new InputError(
      'temperatureK',
      temperatureK,
      'water boils at this gas temperature and pressure',
    );
  }
  const molarMass =
    (1 - vapourMoleFraction) * dryMolarMass + vapourMoleFraction * WATER_MOLAR_MASS_KG_PER_MOL;
  return {
    densityKgM3: idealGasDensityKgM3(molarMass, temperatureK, pressurePa),
    molarMassKgPerMol: molarMass,
    dryMolarMassKgPerMol: dryMolarMass,
    vapourMoleFraction,
  };
}

/**
 * Ideal-gas density of a pure gas (or of anything with molar mass `molarMassKgPerMol`).
 * @returns density [kg/m3]
 */
export function idealGasDensityKgM3(
  molarMassKgPerMol: number,
  temperatureK: number,
  pressurePa: number,
): number {
  return (pressurePa * molarMassKgPerMol) / (MOLAR_GAS_CONSTANT_J_PER_MOL_K * temperatureK);
}
