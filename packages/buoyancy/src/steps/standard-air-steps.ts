import { standardHumidAirDensityKgM3 } from '../atmosphere/humid-air.js';
import { WATER_MOLAR_MASS_KG_PER_MOL } from '../atmosphere/moist-air-density.js';
import {
  geopotentialAltitudeM,
  standardAtmosphere,
  standardAtmosphereLayer,
  type StandardAtmosphereLayer,
  USSA1976_HYDROSTATIC_CONSTANT_K_PER_M,
} from '../atmosphere/standard-atmosphere.js';
import {
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_EARTH_RADIUS_M,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
} from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import { SOURCES } from '../sources.js';
import { type AmbientState, describeAir } from './ambient-state.js';
import { deriveVapour } from './vapour-steps.js';

type StandardAmbient = Extract<AmbientInput, { mode: 'standard' }>;

/**
 * The 1976 standard atmosphere at an altitude, with steps: geopotential height, temperature and
 * pressure of its layer, and the density of its ideal gas, with water vapour mixed in as an ideal
 * gas when a humidity is given. No humidity and 0 % are then the same air exactly, and dry air
 * reproduces the standard's tables (CIPM-2007 real air is for measured air).
 */
export function deriveStandardAir(d: Derivation, ambient: StandardAmbient): AmbientState {
  const offsetK = ambient.temperatureOffsetK;
  const heightM = deriveGeopotentialHeightM(d, ambient.altitudeM);
  const state = standardAtmosphere(ambient.altitudeM, { temperatureOffsetK: offsetK });
  const layer = standardAtmosphereLayer(heightM);
  const temperatureK = deriveStandardTemperatureK(d, layer, heightM, offsetK, state.temperatureK);
  const pressurePa = deriveStandardPressurePa(d, layer, heightM, state.pressurePa);
  const { vapourMoleFraction, humidityText } = deriveVapour(
    d,
    ambient.humidity,
    temperatureK,
    pressurePa,
  );
  const densityKgM3 = deriveStandardDensityKgM3(d, {
    temperatureK,
    pressurePa,
    vapourMoleFraction,
    dryDensityKgM3: state.densityKgM3,
  });
  return {
    temperatureK,
    pressurePa,
    densityKgM3,
    vapourMoleFraction,
    model: 'ussa1976',
    // Above 80 km the standard's air is lighter than M₀ (Table 8); this is its actual one.
    molarMassKgPerMol:
      (densityKgM3 * USSA1976_GAS_CONSTANT_J_PER_MOL_K * temperatureK) / pressurePa,
    context: describeAir(temperatureK, pressurePa, humidityText),
  };
}

/** Geopotential height of a geometric altitude, H = r₀·Z / (r₀ + Z) [m']. */
function deriveGeopotentialHeightM(d: Derivation, altitudeM: number): number {
  return d.step({
    id: 'geopotential-height',
    label: 'Geopotential height',
    formula: 'H = r₀·Z / (r₀ + Z)',
    values: [v('r₀', USSA1976_EARTH_RADIUS_M, 'm'), v('Z', altitudeM, 'm')],
    result: v('H', geopotentialAltitudeM(altitudeM), "m'"),
    source: SOURCES.ussa1976Geopotential,
  });
}

/** Air temperature of the standard's layer at a height, with the day's offset [K]. */
function deriveStandardTemperatureK(
  d: Derivation,
  layer: StandardAtmosphereLayer,
  heightM: number,
  offsetK: number,
  temperatureK: number,
): number {
  const offsetValues = offsetK === 0 ? [] : [v('ΔT', offsetK, 'K')];
  return d.step({
    id: 'air-temperature',
    label: `Air temperature (1976 standard, layer ${layer.index + 1})`,
    formula: offsetK === 0 ? 'T = T_b + L_b·(H − H_b)' : 'T = T_b + L_b·(H − H_b) + ΔT',
    values: [
      v('T_b', layer.baseTemperatureK, 'K'),
      v('L_b', layer.lapseRateKPerM * 1000, "K/km'"),
      v('H_b', layer.baseHeightM, "m'"),
      v('H', heightM, "m'"),
      ...offsetValues,
    ],
    result: v('T', temperatureK, 'K'),
    source: SOURCES.ussa1976Temperature,
  });
}

/** Air pressure of the standard's layer at a height (the hydrostatic equation) [Pa]. */
function deriveStandardPressurePa(
  d: Derivation,
  layer: StandardAtmosphereLayer,
  heightM: number,
  pressurePa: number,
): number {
  return d.step({
    id: 'air-pressure',
    label: 'Air pressure (1976 standard)',
    formula:
      layer.lapseRateKPerM === 0
        ? 'p = p_b·exp(−g₀M₀·(H − H_b) / (R*·T_b))'
        : 'p = p_b·[T_b / (T_b + L_b·(H − H_b))]^(g₀M₀ / (R*·L_b))',
    values: [
      v('p_b', layer.basePressurePa, 'Pa'),
      v('T_b', layer.baseTemperatureK, 'K'),
      v('L_b', layer.lapseRateKPerM * 1000, "K/km'"),
      v('g₀M₀/R*', USSA1976_HYDROSTATIC_CONSTANT_K_PER_M * 1000, "K/km'"),
      v('H − H_b', heightM - layer.baseHeightM, "m'"),
    ],
    result: v('p', pressurePa, 'Pa'),
    source: SOURCES.ussa1976Pressure,
  });
}

/** Density of the standard's dry air, then with its water vapour when it has any [kg/m3]. */
function deriveStandardDensityKgM3(
  d: Derivation,
  air: {
    temperatureK: number;
    pressurePa: number;
    vapourMoleFraction: number;
    dryDensityKgM3: number;
  },
): number {
  const dry = air.vapourMoleFraction === 0;
  const dryDensityKgM3 = d.step({
    id: dry ? 'air-density' : 'dry-air-density',
    label: 'Density of the surrounding air (dry, 1976 standard)',
    formula: dry ? 'ρ_air = p·M₀ / (R*·T)' : 'ρ_dry = p·M₀ / (R*·T)',
    values: [
      v('p', air.pressurePa, 'Pa'),
      v('M₀', USSA1976_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
      v('R*', USSA1976_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v('T', air.temperatureK, 'K'),
    ],
    result: v(dry ? 'ρ_air' : 'ρ_dry', air.dryDensityKgM3, 'kg/m³'),
    source: SOURCES.ussa1976Density,
  });
  if (dry) return dryDensityKgM3;
  return d.step({
    id: 'air-density',
    label: 'Density of the surrounding air (1976 standard with water vapour)',
    formula: 'ρ_air = ρ_dry·[1 − x_v·(1 − M_v/M₀)]',
    values: [
      v('ρ_dry', dryDensityKgM3, 'kg/m³'),
      v('x_v', air.vapourMoleFraction, ''),
      v('M_v', WATER_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
      v('M₀', USSA1976_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
    ],
    result: v(
      'ρ_air',
      standardHumidAirDensityKgM3(dryDensityKgM3, air.vapourMoleFraction),
      'kg/m³',
    ),
    source: `${SOURCES.ussa1976Density}; ${SOURCES.mixture}`,
  });
}
