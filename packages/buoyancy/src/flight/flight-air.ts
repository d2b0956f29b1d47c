import {
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
} from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { SOURCES } from '../sources.js';
import { type AmbientState, describeAir } from '../steps/ambient-state.js';
import { prepareWindProfile, type WindProfile, windProfileAirAt } from '../wind/wind-profile.js';
import { type AirModel, profileAirModel, standardAirModel } from './air-model.js';

/** The air a flight is computed in, and the wind profile when one is given. */
export interface FlightAir {
  readonly model: AirModel;
  /** The prepared wind profile, when the inputs give one. */
  readonly wind: WindProfile | undefined;
  /** Whether temperature, pressure and density come from the profile (every level has a temperature). */
  readonly fromProfile: boolean;
}

/**
 * Picks the flight's air: the profile's when it gives a temperature at every level, else the 1976
 * standard atmosphere with the day's offset; says which in a note.
 */
export function chooseFlightAir(d: Derivation, inputs: FlightProfileValues): FlightAir {
  const offsetK = inputs.launch.temperatureOffsetK;
  if (!inputs.wind)
    return { model: standardAirModel(offsetK), wind: undefined, fromProfile: false };
  const wind = prepareWindProfile(inputs.wind);
  if (!wind.hasTemperatures) {
    d.warn({
      code: 'flight-air-standard',
      severity: 'note',
      message:
        'Not every level of the wind profile gives a temperature, so the flight uses the 1976 standard atmosphere with the day’s temperature offset; the profile gives only the wind.',
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

/** The air at the launch site from the profile, with steps (dry, the 1976 standard's ideal gas). */
export function deriveProfileLaunchAir(
  d: Derivation,
  wind: WindProfile,
  altitudeM: number,
): AmbientState {
  const air = windProfileAirAt(wind, altitudeM);
  const source = 'wind profile: temperature linear in geopotential height between levels';
  const temperatureK = d.step({
    id: 'air-temperature',
    label: 'Air temperature at the launch site (from the wind profile)',
    formula: 'T = T_i + (T_i+1 − T_i)·(H − H_i)/(H_i+1 − H_i)',
    values: [v('z', altitudeM, 'm')],
    result: v('T', air.temperatureK, 'K'),
    source,
  });
  const pressurePa = d.step({
    id: 'air-pressure',
    label: 'Air pressure at the launch site (from the wind profile)',
    formula: 'p = p_i·exp(−(H − H_i) / ((R/g₀)·T̄))',
    values: [v('z', altitudeM, 'm'), v('T', temperatureK, 'K')],
    result: v('p', air.pressurePa, 'Pa'),
    source:
      'hypsometric equation from the profile level below (Wallace & Hobbs, Atmospheric Science, 2nd ed., 2006, §3.2)',
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
