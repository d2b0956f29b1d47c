import {
  CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL,
  CIPM_GAS_CONSTANT_J_PER_MOL_K,
  moistAirDensity,
  WATER_MOLAR_MASS_KG_PER_MOL,
} from '../atmosphere/moist-air-density.js';
import { type Derivation, v } from '../derivation.js';
import { SOURCES } from '../sources.js';

/** Symbols and step ids of the air outside, and of heated air inside the envelope. */
const NAMES = {
  air: { p: 'p', T: 'T', Z: 'Z', rho: 'ρ_air', ids: ['air-compressibility', 'air-density'] },
  gas: {
    p: 'p_gas',
    T: 'T_gas',
    Z: 'Z_gas',
    rho: 'ρ_gas',
    ids: ['gas-compressibility', 'gas-density'],
  },
} as const;

/**
 * CIPM-2007 density of moist air as two steps, the compressibility factor and the density, for
 * the air outside (`air`) or heated air in the envelope (`gas`): one formula, written once.
 * @returns density [kg/m3] and molar mass of the moist air [kg/mol]
 */
export function deriveCipmDensity(
  d: Derivation,
  state: { temperatureK: number; pressurePa: number; vapourMoleFraction: number },
  of: { kind: keyof typeof NAMES; compressibilityLabel: string; densityLabel: string },
): { densityKgM3: number; molarMassKgPerMol: number } {
  const { p, T, Z, rho, ids } = NAMES[of.kind];
  const { temperatureK, pressurePa, vapourMoleFraction } = state;
  const air = moistAirDensity(state);
  const compressibility = d.step({
    id: ids[0],
    label: of.compressibilityLabel,
    formula: `${Z} = 1 − (${p}/${T})·[a₀ + a₁t + a₂t² + (b₀ + b₁t)·x_v + (c₀ + c₁t)·x_v²] + (${p}/${T})²·(d + e·x_v²)`,
    values: [v(p, pressurePa, 'Pa'), v(T, temperatureK, 'K'), v('x_v', vapourMoleFraction, '')],
    result: v(Z, air.compressibility, ''),
    source: SOURCES.cipm2007,
  });
  const densityKgM3 = d.step({
    id: ids[1],
    label: of.densityLabel,
    formula: `${rho} = ${p}·M_a / (${Z}·R·${T}) · [1 − x_v·(1 − M_v/M_a)]`,
    values: [
      v(p, pressurePa, 'Pa'),
      v('M_a', CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
      v(Z, compressibility, ''),
      v('R', CIPM_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v(T, temperatureK, 'K'),
      v('x_v', vapourMoleFraction, ''),
      v('M_v', WATER_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
    ],
    result: v(rho, air.densityKgM3, 'kg/m³'),
    source: SOURCES.cipm2007,
  });
  return { densityKgM3, molarMassKgPerMol: air.molarMassKgPerMol };
}
