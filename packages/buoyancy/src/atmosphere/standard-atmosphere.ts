import {
  STANDARD_GRAVITY_M_PER_S2,
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_EARTH_RADIUS_M,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
  USSA1976_SEA_LEVEL_PRESSURE_PA,
  USSA1976_SEA_LEVEL_TEMPERATURE_K,
} from '../constants.js';
import { requireInRange } from '../errors.js';

/** Geometric altitudes the model covers [m]: the 1976 tables start at −5 km and this part ends at 86 km. */
export const STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M = { min: -5000, max: 86000 } as const;

/** Temperature offsets accepted for a non-standard day [K]. */
export const TEMPERATURE_OFFSET_RANGE_K = { min: -60, max: 60 } as const;

/** g0·M0/R*, the hydrostatic constant of the 1976 standard [K/m']. */
const HYDROSTATIC_CONSTANT_K_PER_M =
  (STANDARD_GRAVITY_M_PER_S2 * USSA1976_AIR_MOLAR_MASS_KG_PER_MOL) /
  USSA1976_GAS_CONSTANT_J_PER_MOL_K;

interface Layer {
  /** Base geopotential height [m']. */
  readonly baseHeightM: number;
  /** Molecular-scale temperature gradient [K/m']. */
  readonly lapseRateKPerM: number;
  readonly baseTemperatureK: number;
  readonly basePressurePa: number;
}

/**
 * U.S. Standard Atmosphere 1976, Table 4: base geopotential heights and temperature gradients of
 * the seven layers below 84.852 km'. Base temperatures follow from the gradients and base
 * pressures from the hydrostatic equation, as the standard defines them (not tabulated constants).
 */
const LAYER_DEFINITIONS = [
  { baseHeightM: 0, lapseRateKPerM: -0.0065 },
  { baseHeightM: 11000, lapseRateKPerM: 0 },
  { baseHeightM: 20000, lapseRateKPerM: 0.001 },
  { baseHeightM: 32000, lapseRateKPerM: 0.0028 },
  { baseHeightM: 47000, lapseRateKPerM: 0 },
  { baseHeightM: 51000, lapseRateKPerM: -0.0028 },
  { baseHeightM: 71000, lapseRateKPerM: -0.002 },
] as const;

function pressureInLayer(layer: Layer, heightM: number): number {
  const dh = heightM - layer.baseHeightM;
  if (layer.lapseRateKPerM === 0) {
    return (
      layer.basePressurePa * Math.exp((-HYDROSTATIC_CONSTANT_K_PER_M * dh) / layer.baseTemperatureK)
    );
  }
  const temperatureK = layer.baseTemperatureK + layer.lapseRateKPerM * dh;
  return (
    layer.basePressurePa *
    Math.pow(
      layer.baseTemperatureK / temperatureK,
      HYDROSTATIC_CONSTANT_K_PER_M / layer.lapseRateKPerM,
    )
  );
}

const LAYERS: readonly Layer[] = LAYER_DEFINITIONS.reduce<Layer[]>((layers, definition) => {
  const below = layers[layers.length - 1];
  if (!below) {
    layers.push({
      ...definition,
      baseTemperatureK: USSA1976_SEA_LEVEL_TEMPERATURE_K,
      basePressurePa: USSA1976_SEA_LEVEL_PRESSURE_PA,
    });
  } else {
    const dh = definition.baseHeightM - below.baseHeightM;
    layers.push({
      ...definition,
      baseTemperatureK: below.baseTemperatureK + below.lapseRateKPerM * dh,
      basePressurePa: pressureInLayer(below, definition.baseHeightM),
    });
  }
  return layers;
}, []);

/**
 * Ratio M/M0 of the mean molar mass to its sea-level value between 80 and 86 km geometric altitude,
 * U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562), Table 8, at 0.5 km steps. The thirteen values
 * as two independent public copies of that table give them (W. Gravel's MATLAB
 * MolecularWeightRatios.m, "Table 8", and a Rust implementation of the standard); the page of the
 * printed table was not seen. Checked by the standard's published 86 km kinetic temperature,
 * 186.87 K (Table I). Below 80 km it is 1.
 */
const MOLAR_MASS_RATIO_80_TO_86_KM = [
  1.0, 0.999996, 0.999989, 0.999971, 0.999941, 0.999909, 0.99987, 0.999829, 0.999786, 0.999741,
  0.999694, 0.999641, 0.999579,
] as const;

function molarMassRatio(geometricAltitudeM: number): number {
  if (geometricAltitudeM <= 80000) return 1;
  const position = (geometricAltitudeM - 80000) / 500;
  const index = Math.min(Math.floor(position), MOLAR_MASS_RATIO_80_TO_86_KM.length - 2);
  const fraction = position - index;
  const lower = MOLAR_MASS_RATIO_80_TO_86_KM[index] ?? 1;
  const upper = MOLAR_MASS_RATIO_80_TO_86_KM[index + 1] ?? lower;
  return lower + (upper - lower) * fraction;
}

/**
 * Geopotential height from geometric altitude, H = r0·Z / (r0 + Z), with the 1976 standard's
 * Earth radius r0 = 6 356 766 m (U.S. Standard Atmosphere 1976, eq. 18).
 * @param geometricAltitudeM altitude above mean sea level [m]
 * @returns geopotential height [m']
 */
export function geopotentialAltitudeM(geometricAltitudeM: number): number {
  return (
    (USSA1976_EARTH_RADIUS_M * geometricAltitudeM) / (USSA1976_EARTH_RADIUS_M + geometricAltitudeM)
  );
}

/**
 * Geometric altitude from geopotential height, Z = r0·H / (r0 − H) (inverse of eq. 18).
 * @param geopotentialHeightM geopotential height [m']
 * @returns altitude above mean sea level [m]
 */
export function geometricAltitudeM(geopotentialHeightM: number): number {
  return (
    (USSA1976_EARTH_RADIUS_M * geopotentialHeightM) /
    (USSA1976_EARTH_RADIUS_M - geopotentialHeightM)
  );
}

/**
 * Acceleration of gravity at a geometric altitude, g = g0·(r0 / (r0 + Z))², the inverse-square
 * law of the U.S. Standard Atmosphere 1976 (eq. 17).
 * @returns gravity [m/s2]
 */
export function gravityAtAltitudeMS2(geometricAltitudeM: number): number {
  const ratio = USSA1976_EARTH_RADIUS_M / (USSA1976_EARTH_RADIUS_M + geometricAltitudeM);
  return STANDARD_GRAVITY_M_PER_S2 * ratio * ratio;
}

export interface StandardAtmosphereState {
  /** Kinetic air temperature, including any offset [K]. */
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityKgM3: number;
  readonly geopotentialAltitudeM: number;
  readonly gravityMS2: number;
  /** Index 0..6 of the 1976 layer the altitude falls in. */
  readonly layerIndex: number;
}

export interface StandardAtmosphereOptions {
  /**
   * Offset added to the standard temperature for a warmer or colder day [K], −60 to +60. Pressure
   * stays the standard pressure at that height (the usual "ISA + ΔT" convention), and density
   * follows from the ideal-gas law at the offset temperature.
   */
  readonly temperatureOffsetK?: number;
}

/**
 * Temperature, pressure and density of the U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562), the
 * same as the ICAO standard atmosphere below 32 km and ISO 2533 below 50 km.
 *
 * Dry air; density is ρ = p·M0 / (R*·T_M) with the standard's own constants, so its tables are
 * reproduced to five significant digits. Between 80 and 86 km the kinetic temperature is the
 * molecular-scale temperature times M/M0 (Table 8).
 *
 * @param geometricAltitudeM altitude above mean sea level [m], −5 000 to 86 000
 * @param options temperature offset for a non-standard day
 * @throws InputError when the altitude or offset is out of range or not finite
 */
export function standardAtmosphere(
  geometricAltitudeM: number,
  options: StandardAtmosphereOptions = {},
): StandardAtmosphereState {
  requireInRange(
    'geometricAltitudeM',
    geometricAltitudeM,
    STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.min,
    STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max,
    'm',
  );
  const temperatureOffsetK = requireInRange(
    'temperatureOffsetK',
    options.temperatureOffsetK ?? 0,
    TEMPERATURE_OFFSET_RANGE_K.min,
    TEMPERATURE_OFFSET_RANGE_K.max,
    'K',
  );
  return standardAtmosphereUnchecked(geometricAltitudeM, temperatureOffsetK);
}

/**
 * standardAtmosphere without its range checks, for integrators that have checked their
 * altitude span once. Outside −5 to 86 km its results are extrapolations of the end layers.
 * @internal
 */
export function standardAtmosphereUnchecked(
  geometricAltitudeM: number,
  temperatureOffsetK: number,
): StandardAtmosphereState {
  const heightM = geopotentialAltitudeM(geometricAltitudeM);
  const layer = standardAtmosphereLayer(heightM);
  const molecularTemperatureK =
    layer.baseTemperatureK + layer.lapseRateKPerM * (heightM - layer.baseHeightM);
  const pressurePa = pressureInLayer(layer, heightM);
  const standardTemperatureK = molecularTemperatureK * molarMassRatio(geometricAltitudeM);
  // With an offset, the molecular-scale temperature moves by the same amount as the kinetic one.
  const densityKgM3 =
    (pressurePa * USSA1976_AIR_MOLAR_MASS_KG_PER_MOL) /
    (USSA1976_GAS_CONSTANT_J_PER_MOL_K * (molecularTemperatureK + temperatureOffsetK));
  return {
    temperatureK: standardTemperatureK + temperatureOffsetK,
    pressurePa,
    densityKgM3,
    geopotentialAltitudeM: heightM,
    gravityMS2: gravityAtAltitudeMS2(geometricAltitudeM),
    layerIndex: layer.index,
  };
}

/**
 * Geometric altitude at which the standard atmosphere has the given pressure (a "pressure
 * altitude"), found by inverting the layer formulas exactly.
 * @param pressurePa absolute pressure [Pa], between the 86 km and −5 km standard pressures
 * @returns geometric altitude [m]
 */
export function standardAltitudeForPressureM(pressurePa: number): number {
  const lowest = standardAtmosphere(STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.min).pressurePa;
  const highest = standardAtmosphere(STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max).pressurePa;
  requireInRange('pressurePa', pressurePa, highest, lowest, 'Pa');
  let index = LAYERS.length - 1;
  while (index > 0 && pressurePa > (LAYERS[index]?.basePressurePa ?? 0)) index -= 1;
  const layer = LAYERS[index] as Layer;
  const ratio = pressurePa / layer.basePressurePa;
  const heightM =
    layer.lapseRateKPerM === 0
      ? layer.baseHeightM -
        (layer.baseTemperatureK * Math.log(ratio)) / HYDROSTATIC_CONSTANT_K_PER_M
      : layer.baseHeightM +
        (layer.baseTemperatureK / layer.lapseRateKPerM) *
          (Math.pow(ratio, -layer.lapseRateKPerM / HYDROSTATIC_CONSTANT_K_PER_M) - 1);
  return geometricAltitudeM(heightM);
}

/** The 1976 layer containing a geopotential height, with its base values (for derivations). */
export interface StandardAtmosphereLayer {
  readonly index: number;
  readonly baseHeightM: number;
  readonly lapseRateKPerM: number;
  readonly baseTemperatureK: number;
  readonly basePressurePa: number;
}

export function standardAtmosphereLayer(geopotentialHeightM: number): StandardAtmosphereLayer {
  let index = 0;
  while (
    index < LAYERS.length - 1 &&
    geopotentialHeightM >= (LAYERS[index + 1]?.baseHeightM ?? Infinity)
  ) {
    index += 1;
  }
  return INDEXED_LAYERS[index] as StandardAtmosphereLayer;
}

const INDEXED_LAYERS: readonly StandardAtmosphereLayer[] = LAYERS.map((layer, index) => ({
  index,
  ...layer,
}));

/** g0·M0/R* of the 1976 standard [K/m'], the exponent scale of its pressure formulas. */
export const USSA1976_HYDROSTATIC_CONSTANT_K_PER_M = HYDROSTATIC_CONSTANT_K_PER_M;
