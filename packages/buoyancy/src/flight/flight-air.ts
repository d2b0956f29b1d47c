import {
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
} from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { SOURCES } from '../sources.js';
import { type AmbientState, describeAir } from '../steps/ambient-state.js';
import {
  prepareWindProfile,
  type ProfilePosition,
  type WindProfile,
  windProfileAirAt,
} from '../wind/wind-profile.js';
import { type AirModel, profileAirModel, standardAirModel } from './air-model.js';

/** The air a flight is computed in, and the wind profile when one is given. */
export interface FlightAir {
  readonly model: AirModel;
  /** The prepared wind profile, when the inputs give one. */
  readonly wind: WindProfile | undefined;
  /**
   * Whether temperature, pressure and density come from the profile (at least one level gives a
   * temperature; levels without one are filled from their neighbours).
   */
  readonly fromProfile: boolean;
}

/** "2 and 4 (wind.layers.1, wind.layers.3)": levels counted from 1 at the lowest. */
function levelList(indices: readonly number[]): string {
  const numbers = indices.map((index) => String(index + 1));
  const spoken =
    numbers.length === 1
      ? (numbers[0] as string)
      : `${numbers.slice(0, -1).join(', ')} and ${numbers[numbers.length - 1] as string}`;
  return `${spoken} (${indices.map((index) => `wind.layers.${index}`).join(', ')})`;
}

/** The note for a profile some of whose levels give no temperature (code `flight-air-filled-temperatures`). */
function filledTemperaturesNote(d: Derivation, wind: WindProfile): void {
  const filled = wind.temperatureGiven.flatMap((given, index) => (given ? [] : [index]));
  if (filled.length === 0) return;
  d.warn({
    code: 'flight-air-filled-temperatures',
    severity: 'note',
    message: `Level${filled.length === 1 ? '' : 's'} ${levelList(filled)} of the wind profile give${filled.length === 1 ? 's' : ''} no temperature: filled linearly in geopotential height from the nearest levels below and above that give one, and beyond the outermost such level from the 1976 standard atmosphere shifted to meet it.`,
    field: `wind.layers.${filled[0] as number}.temperatureK`,
  });
}

/**
 * Picks the flight's air: the profile's when any level gives a temperature (where the file gives
 * one, it replaces the standard atmosphere; levels without one are filled from their neighbours,
 * see `TemperatureFill`), else the 1976 standard atmosphere with the day's offset; says which in
 * a note.
 */
export function chooseFlightAir(d: Derivation, inputs: FlightProfileValues): FlightAir {
  const offsetK = inputs.launch.temperatureOffsetK;
  if (!inputs.wind)
    return { model: standardAirModel(offsetK), wind: undefined, fromProfile: false };
  const wind = prepareWindProfile(inputs.wind, 'neighbours');
  if (!wind.temperatureGiven.some(Boolean)) {
    d.warn({
      code: 'flight-air-standard',
      severity: 'note',
      message:
        'No level of the wind profile gives a temperature, so the flight uses the 1976 standard atmosphere with the day’s temperature offset; the profile gives only the wind.',
      field: 'wind',
    });
    return { model: standardAirModel(offsetK), wind, fromProfile: false };
  }
  d.warn({
    code: 'flight-air-from-profile',
    severity: 'note',
    message:
      offsetK === 0
        ? 'Air temperature, pressure and density on the way come from the wind profile’s levels.'
        : 'Air temperature, pressure and density on the way come from the wind profile’s levels; the day’s temperature offset is not used.',
    field: 'wind',
  });
  filledTemperaturesNote(d, wind);
  return { model: profileAirModel(wind), wind, fromProfile: true };
}

/** A note when the flight rose above the profile's top, where the air is the shifted standard. */
export function noteAirAboveProfile(d: Derivation, air: FlightAir, highestM: number): void {
  if (!air.fromProfile || !air.wind) return;
  const topM = air.wind.heightsM[air.wind.heightsM.length - 1] as number;
  if (highestM <= topM) return;
  d.warn({
    code: 'flight-air-above-profile',
    severity: 'note',
    message: `Above ${Math.round(topM)} m, the top of the wind profile, the air follows the 1976 standard atmosphere, its temperature shifted and its pressure scaled to meet the profile’s top level.`,
    field: 'wind',
  });
}

/** Formulas and sources of the launch air for each place of the launch in the profile. */
const LAUNCH_AIR_TEXT = {
  within: {
    temperatureFormula: 'T = T_i + (T_i+1 − T_i)·(H − H_i)/(H_i+1 − H_i)',
    temperatureSource: 'wind profile: temperature linear in geopotential height between levels',
    pressureFormula: 'p = p_i·exp(−(H − H_i) / ((R/g₀)·T̄))',
    pressureSource:
      'hypsometric equation from the profile level below (Wallace & Hobbs, Atmospheric Science, 2nd ed., 2006, §3.2)',
  },
  below: {
    temperatureFormula: 'T = T_std(z) + (T_1 − T_std(z_1))',
    temperatureSource: `${SOURCES.ussa1976Temperature}, shifted to meet the profile’s lowest level (the launch is below it)`,
    pressureFormula: 'p = p_1·p_std(z) / p_std(z_1)',
    pressureSource: `${SOURCES.ussa1976Pressure}, scaled to meet the profile’s lowest level (the launch is below it)`,
  },
  above: {
    temperatureFormula: 'T = T_std(z) + (T_n − T_std(z_n))',
    temperatureSource: `${SOURCES.ussa1976Temperature}, shifted to meet the profile’s top level (the launch is above it)`,
    pressureFormula: 'p = p_n·p_std(z) / p_std(z_n)',
    pressureSource: `${SOURCES.ussa1976Pressure}, scaled to meet the profile’s top level (the launch is above it)`,
  },
} as const satisfies Record<ProfilePosition, Record<string, string>>;

/** Below, within or above the profile's levels, as `windAt` tells them (a top level is within). */
function launchPosition(wind: WindProfile, altitudeM: number): ProfilePosition {
  const topM = wind.heightsM[wind.heightsM.length - 1] as number;
  if (altitudeM < (wind.heightsM[0] as number)) return 'below';
  return altitudeM > topM ? 'above' : 'within';
}

/**
 * The air at the launch site from the profile, with steps (dry, the 1976 standard's ideal gas):
 * between levels from the profile, below or above it from the shifted standard atmosphere, each
 * step naming the formula and source actually used.
 */
export function deriveProfileLaunchAir(
  d: Derivation,
  wind: WindProfile,
  altitudeM: number,
): AmbientState {
  const air = windProfileAirAt(wind, altitudeM);
  const text = LAUNCH_AIR_TEXT[launchPosition(wind, altitudeM)];
  const temperatureK = d.step({
    id: 'air-temperature',
    label: 'Air temperature at the launch site (from the wind profile)',
    formula: text.temperatureFormula,
    values: [v('z', altitudeM, 'm')],
    result: v('T', air.temperatureK, 'K'),
    source: text.temperatureSource,
  });
  const pressurePa = d.step({
    id: 'air-pressure',
    label: 'Air pressure at the launch site (from the wind profile)',
    formula: text.pressureFormula,
    values: [v('z', altitudeM, 'm'), v('T', temperatureK, 'K')],
    result: v('p', air.pressurePa, 'Pa'),
    source: text.pressureSource,
  });
  const densityKgM3 = d.step({
    id: 'air-density',
    label: 'Density of the surrounding air (dry)',
    formula: 'ρ = p·M₀ / (R*·T)',
    values: [
      v('p', pressurePa, 'Pa'),
      v('M₀', USSA1976_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
      v('R*', USSA1976_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v('T', temperatureK, 'K'),
    ],
    result: v('ρ', air.densityKgM3, 'kg/m³'),
    source: SOURCES.ussa1976Density,
  });
  return {
    temperatureK,
    pressurePa,
    densityKgM3,
    vapourMoleFraction: 0,
    model: 'ussa1976',
    molarMassKgPerMol: USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
    context: describeAir(temperatureK, pressurePa, 'dry air, from the wind profile'),
  };
}
