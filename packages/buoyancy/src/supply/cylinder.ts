import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import type { GasId } from '../gas/gas-catalogue.js';

/**
 * Second virial coefficients near room temperature [m³/mol], for the compressibility of cylinder
 * gas, Z = 1 + B·p/(R·T). Helium: +11.8 cm³/mol at 300 K (NIST SRD 134, ab initio helium
 * properties). Hydrogen: about +14 cm³/mol near 290 K (value from memory; literature gives
 * 13.7–15). Gases without an entry are taken as ideal (Z = 1).
 */
export const SECOND_VIRIAL_M3_PER_MOL: Partial<
  Record<GasId, { readonly value: number; readonly source: string }>
> = {
  helium: { value: 11.8e-6, source: 'NIST SRD 134 (helium, 300 K)' },
  hydrogen: { value: 14e-6, source: 'value from memory (13.7–15 cm³/mol in the literature)' },
};

/**
 * Gases the engine can put in a cylinder: those with a real-gas model above. The others are far
 * from ideal at cylinder pressures (methane) or liquefy there (ammonia); the ideal-gas law would
 * promise gas the cylinder does not hold, so they are refused rather than guessed.
 */
export const CYLINDER_GAS_IDS = ['helium', 'hydrogen'] as const satisfies readonly GasId[];

/** Compressibility Z = 1 + B·p/(R·T), the virial equation truncated after B. */
export function virialCompressibility(
  gasId: GasId,
  pressurePa: number,
  temperatureK: number,
): number {
  const b = SECOND_VIRIAL_M3_PER_MOL[gasId]?.value ?? 0;
  return 1 + (b * pressurePa) / (MOLAR_GAS_CONSTANT_J_PER_MOL_K * temperatureK);
}

/**
 * Amount of gas a cylinder can deliver between its fill pressure and the residual pressure left
 * in it, n = V_w·(p_f/Z_f − p_r/Z_r) / (R·T), with absolute pressures.
 * @returns amount of gas [mol]
 */
export function cylinderDeliverableMol(
  gasId: GasId,
  waterVolumeM3: number,
  fillPressurePa: number,
  residualPressurePa: number,
  temperatureK: number,
): number {
  const zFill = virialCompressibility(gasId, fillPressurePa, temperatureK);
  const zResidual = virialCompressibility(gasId, residualPressurePa, temperatureK);
  return (
    (waterVolumeM3 * (fillPressurePa / zFill - residualPressurePa / zResidual)) /
    (MOLAR_GAS_CONSTANT_J_PER_MOL_K * temperatureK)
  );
}
