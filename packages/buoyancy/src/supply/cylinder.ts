import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { InputError } from '../errors.js';
import type { GasId } from '../gas/gas-catalogue.js';
import type { CompressibilityModel } from './compressibility-model.js';
import { HELIUM_COMPRESSIBILITY } from './helium-compressibility.js';
import { HYDROGEN_COMPRESSIBILITY } from './hydrogen-compressibility.js';

/**
 * The published real-gas model of each gas the engine can put in a cylinder. The others are far
 * from ideal at cylinder pressures (methane) or liquefy there (ammonia); the ideal-gas law would
 * promise gas the cylinder does not hold, so they are refused rather than guessed.
 */
export const CYLINDER_COMPRESSIBILITY = {
  helium: HELIUM_COMPRESSIBILITY,
  hydrogen: HYDROGEN_COMPRESSIBILITY,
} as const satisfies Partial<Record<GasId, CompressibilityModel>>;

export type CylinderGasId = keyof typeof CYLINDER_COMPRESSIBILITY;

export const CYLINDER_GAS_IDS = ['helium', 'hydrogen'] as const satisfies readonly CylinderGasId[];

/** Why a catalogue gas without a model is not offered for cylinders, shown with the refusal. */
export const CYLINDER_REFUSAL_REASON =
  'Only gases with a published real-gas model can be stored in cylinders here: methane is far from ideal at cylinder pressure (Z well below 1), ammonia is liquid in a cylinder above its vapour pressure, and neon and heated air are not bottled for lifting';

/** Compressibility factor Z = p/(ρ_n·R·T) of a cylinder gas at an absolute pressure. */
export function cylinderCompressibility(
  gasId: CylinderGasId,
  pressurePa: number,
  temperatureK: number,
): number {
  return CYLINDER_COMPRESSIBILITY[gasId].compressibility(pressurePa, temperatureK);
}

/**
 * Amount of gas a cylinder can deliver between its fill pressure and the residual pressure left
 * in it, n = V_w·(p_f/Z_f − p_r/Z_r) / (R·T), with absolute pressures.
 * @returns amount of gas [mol]
 */
export function cylinderDeliverableMol(
  gasId: CylinderGasId,
  waterVolumeM3: number,
  fillPressurePa: number,
  residualPressurePa: number,
  temperatureK: number,
): number {
  const zFill = cylinderCompressibility(gasId, fillPressurePa, temperatureK);
  const zResidual = cylinderCompressibility(gasId, residualPressurePa, temperatureK);
  return (
    (waterVolumeM3 * (fillPressurePa / zFill - residualPressurePa / zResidual)) /
    (MOLAR_GAS_CONSTANT_J_PER_MOL_K * temperatureK)
  );
}

/**
 * Refuses a cylinder state outside the range the model's publication vouches for, naming the
 * cylinder's field, rather than extrapolating a fitted equation.
 */
export function assertWithinCompressibilityModel(
  model: CompressibilityModel,
  fillPressurePa: number,
  temperatureK: number,
): void {
  const { minTemperatureK, maxTemperatureK, maxPressurePa } = model.validity;
  if (temperatureK < minTemperatureK || temperatureK > maxTemperatureK) {
    throw new InputError(
      'cylinder.temperatureK',
      temperatureK,
      `is outside the range of the gas's real-gas model (${model.source})`,
      { min: minTemperatureK, max: maxTemperatureK, unit: 'K' },
    );
  }
  if (fillPressurePa > maxPressurePa) {
    throw new InputError(
      'cylinder.fillPressurePa',
      fillPressurePa,
      `is above the range of the gas's real-gas model (${model.source})`,
      { max: maxPressurePa, unit: 'Pa' },
    );
  }
}
