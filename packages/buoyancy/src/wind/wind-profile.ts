import {
  geopotentialAltitudeM,
  STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M,
  standardAtmosphereUnchecked,
} from '../atmosphere/standard-atmosphere.js';
import {
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
} from '../constants.js';
import type { CalculationWarning } from '../derivation.js';
import { InputError, requireInRange } from '../errors.js';
import { parseInputs } from '../schema/parse-inputs.js';
import { hypsometricPressurePa } from './hypsometric.js';
import {
  type HeightSource,
  resolveLayerHeights,
  windProfileSchema,
  type WindProfileValues,
} from './wind-profile-schema.js';

const DEG = Math.PI / 180;

/**
 * A wind profile ready for interpolation: levels in order of increasing geometric height, the wind
 * as east (u) and north (v) components, the temperature and pressure of every level (the given
 * ones, else from the 1976 standard atmosphere as `notes` say). Built once by `windProfile`, then
 * sampled any number of times.
 */
export interface WindProfile {
  /** Geometric heights above mean sea level [m], strictly increasing. */
  readonly heightsM: Float64Array;
  /** Eastward wind component [m/s] (positive towards the east). */
  readonly uMS: Float64Array;
  /** Northward wind component [m/s] (positive towards the north). */
  readonly vMS: Float64Array;
  /** Air temperature of each level [K]: given, or the standard atmosphere's at its height. */
  readonly temperaturesK: Float64Array;
  /** Air pressure of each level [Pa]: given, from the level below by the hypsometric equation, or the standard atmosphere's. */
  readonly pressuresPa: Float64Array;
  /** How each level's height was found. */
  readonly heightSources: readonly HeightSource[];
  /** Whether every level came with its own temperature. */
  readonly hasTemperatures: boolean;
  /** Which levels came with their own temperature, in level order. */
  readonly temperatureGiven: readonly boolean[];
  /** What the profile took from the standard atmosphere, as notes with stable codes. */
  readonly notes: readonly CalculationWarning[];
}

/**
 * East and north components of a wind given meteorologically, blowing FROM `directionDeg`
 * (clockwise from true north) at `speedMS`: u = −s·sin θ, v = −s·cos θ (WMO-No. 8, CIMO Guide,
 * wind direction is the direction from which the wind blows).
 */
export function windComponentsMS(
  directionDeg: number,
  speedMS: number,
): { readonly uMS: number; readonly vMS: number } {
  return {
    uMS: -speedMS * Math.sin(directionDeg * DEG),
    vMS: -speedMS * Math.cos(directionDeg * DEG),
  };
}

/**
 * The meteorological direction [°, 0 to < 360, the direction it blows from] and speed [m/s] of a
 * wind with components u (east) and v (north). A calm (speed below 1e-9 m/s) has direction 0.
 */
export function windDirectionAndSpeed(
  uMS: number,
  vMS: number,
): { readonly directionDeg: number; readonly speedMS: number } {
  const speedMS = Math.hypot(uMS, vMS);
  if (speedMS < 1e-9) return { directionDeg: 0, speedMS };
  const degrees = (Math.atan2(-uMS, -vMS) / DEG + 360) % 360;
  return { directionDeg: degrees >= 360 ? 0 : degrees, speedMS };
}

/**
 * Validates a wind profile given as inputs (`{ layers: [...] }`, see `windProfileSchema`) and
 * prepares it for interpolation.
 * @param input the profile, SI units
 * @param field where the profile sits in the caller's inputs, prefixed to every field path of a
 *   refusal (`wind.layers.3.speedMS`); empty for none
 * @throws InputError naming every refused field
 */
export function windProfile(input: unknown, field = 'wind'): WindProfile {
  let values: WindProfileValues;
  try {
    values = parseInputs(windProfileSchema, input);
  } catch (error) {
    if (!(error instanceof InputError) || field === '') throw error;
    throw new InputError(
      error.issues.map((issue) => ({
        ...issue,
        field: issue.field === '(inputs)' ? field : `${field}.${issue.field}`,
      })),
    );
  }
  return prepareWindProfile(values);
}

/**
 * How levels without a temperature get one: `standard`, the 1976 standard atmosphere's at their
 * height; `neighbours`, linear in geopotential height between the nearest levels below and above
 * that give one (as the 1976 standard's layers are), and beyond the last such level the standard
 * atmosphere shifted to meet it. With no temperature at all both give the standard's.
 */
export type TemperatureFill = 'standard' | 'neighbours';

/**
 * Each level's temperature [K]: the given one, else filled as `fill` says.
 * @internal
 */
export function levelTemperaturesK(
  given: readonly (number | undefined)[],
  heightsM: Float64Array,
  fill: TemperatureFill,
): Float64Array {
  const standardK = (heightM: number) => standardAtmosphereUnchecked(heightM, 0).temperatureK;
  const known = given.flatMap((temperatureK, index) => (temperatureK === undefined ? [] : [index]));
  return Float64Array.from(given, (temperatureK, index) => {
    const heightM = heightsM[index] as number;
    if (temperatureK !== undefined) return temperatureK;
    if (fill === 'standard' || known.length === 0) return standardK(heightM);
    const below = known.filter((level) => level < index).pop();
    const above = known.find((level) => level > index);
    const end = below === undefined ? above : above === undefined ? below : undefined;
    if (end !== undefined) {
      const endM = heightsM[end] as number;
      return standardK(heightM) + ((given[end] as number) - standardK(endM));
    }
    const lowH = geopotentialAltitudeM(heightsM[below as number] as number);
    const highH = geopotentialAltitudeM(heightsM[above as number] as number);
    const t = (geopotentialAltitudeM(heightM) - lowH) / (highH - lowH);
    const lowK = given[below as number] as number;
    return lowK + t * ((given[above as number] as number) - lowK);
  });
}

/**
 * Builds the interpolation arrays from validated values (see `windProfile`).
 * @param fill how levels without a temperature get one (see `TemperatureFill`)
 */
export function prepareWindProfile(
  values: WindProfileValues,
  fill: TemperatureFill = 'standard',
): WindProfile {
  const { layers } = values;
  const resolved = resolveLayerHeights(layers);
  const count = layers.length;
  const heightsM = Float64Array.from(resolved.heightsM);
  const uMS = new Float64Array(count);
  const vMS = new Float64Array(count);
  const temperatureGiven = layers.map((layer) => layer.temperatureK !== undefined);
  const hasTemperatures = temperatureGiven.every(Boolean);
  const temperaturesK = levelTemperaturesK(
    layers.map((layer) => layer.temperatureK),
    heightsM,
    fill,
  );
  const pressuresPa = new Float64Array(count);
  let pressureFromStandard = false;
  layers.forEach((layer, index) => {
    const heightM = heightsM[index] as number;
    const wind = windComponentsMS(layer.directionDeg, layer.speedMS);
    uMS[index] = wind.uMS;
    vMS[index] = wind.vMS;
    const standard = standardAtmosphereUnchecked(heightM, 0);
    const given = resolved.pressuresPa[index];
    if (given !== undefined) {
      pressuresPa[index] = given;
    } else if (index > 0) {
      pressuresPa[index] = hypsometricPressurePa(
        heightsM[index - 1] as number,
        pressuresPa[index - 1] as number,
        temperaturesK[index - 1] as number,
        heightM,
        temperaturesK[index] as number,
      );
    } else {
      pressuresPa[index] = standard.pressurePa;
      pressureFromStandard = true;
    }
  });
  const notes: CalculationWarning[] = [];
  if (resolved.sources.includes('pressure-altitude')) {
    notes.push({
      code: 'wind-pressure-altitude',
      severity: 'note',
      message:
        'No level gives both height and pressure, so the lowest pressure level is placed at its pressure altitude in the 1976 standard atmosphere; heights above it follow from it.',
      field: 'wind.layers.0.pressurePa',
    });
  }
  if (resolved.sources.includes('standard-thickness')) {
    notes.push({
      code: 'wind-standard-thickness',
      severity: 'note',
      message:
        'Some pressure levels have no temperature: their heights use the thickness of the 1976 standard atmosphere between the pressures.',
    });
  }
  if (!hasTemperatures && (fill === 'standard' || !temperatureGiven.some(Boolean))) {
    notes.push({
      code: 'wind-standard-temperature',
      severity: 'note',
      message:
        'Levels without a temperature take the 1976 standard atmosphere’s temperature at their height.',
    });
  }
  if (pressureFromStandard) {
    notes.push({
      code: 'wind-standard-pressure',
      severity: 'note',
      message:
        'The lowest level has no pressure: the profile’s pressures start from the 1976 standard atmosphere’s at its height.',
    });
  }
  return {
    heightsM,
    uMS,
    vMS,
    temperaturesK,
    pressuresPa,
    heightSources: resolved.sources,
    hasTemperatures,
    temperatureGiven,
    notes,
  };
}

/** Where a height lies with respect to the profile's levels. */
export type ProfilePosition = 'below' | 'within' | 'above';

export interface WindSample {
  /** Eastward component [m/s]. */
  readonly uMS: number;
  /** Northward component [m/s]. */
  readonly vMS: number;
  /** Direction the wind blows from [°], 0 to < 360. */
  readonly directionDeg: number;
  readonly speedMS: number;
  /** Air temperature [K]. */
  readonly temperatureK: number;
  readonly position: ProfilePosition;
  /** Set when the height lies outside the profile: what was assumed there. */
  readonly note?: CalculationWarning;
}

/** The note for heights above the profile's top level (stable code `wind-above-profile`). */
export function windAboveProfileNote(profile: WindProfile): CalculationWarning {
  const topM = profile.heightsM[profile.heightsM.length - 1] as number;
  return {
    code: 'wind-above-profile',
    severity: 'note',
    message: `Above ${Math.round(topM)} m, the top of the wind profile, the wind is held at its top level and the temperature follows the 1976 standard atmosphere, shifted to meet the profile there.`,
  };
}

/** The note for heights below the profile's lowest level (stable code `wind-below-profile`). */
export function windBelowProfileNote(profile: WindProfile): CalculationWarning {
  const bottomM = profile.heightsM[0] as number;
  return {
    code: 'wind-below-profile',
    severity: 'note',
    message: `Below ${Math.round(bottomM)} m, the lowest level of the wind profile, the wind is held at that level and the temperature follows the 1976 standard atmosphere, shifted to meet the profile there.`,
  };
}

/**
 * Index i of the level at or below `altitudeM` (heights[i] ≤ z < heights[i+1]); −1 below the
 * profile, the last index at or above its top. Starts from `hint` and walks, so a caller moving
 * steadily through the heights pays O(1) per call; far jumps fall back to a binary search.
 * @internal
 */
export function locateLevel(heightsM: Float64Array, altitudeM: number, hint: number): number {
  const last = heightsM.length - 1;
  if (altitudeM < (heightsM[0] as number)) return -1;
  if (altitudeM >= (heightsM[last] as number)) return last;
  let index = hint < 0 ? 0 : hint > last - 1 ? last - 1 : hint;
  for (let walk = 0; walk < 4; walk += 1) {
    if (altitudeM < (heightsM[index] as number)) index -= 1;
    else if (altitudeM >= (heightsM[index + 1] as number)) index += 1;
    else return index;
  }
  let low = 0;
  let high = last;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if ((heightsM[middle] as number) <= altitudeM) low = middle;
    else high = middle;
  }
  return low;
}

/**
 * Fraction of the way from level i to level i+1 at `altitudeM`, for a located index; 0 outside.
 * @internal
 */
export function levelFraction(heightsM: Float64Array, index: number, altitudeM: number): number {
  if (index < 0 || index >= heightsM.length - 1) return 0;
  const low = heightsM[index] as number;
  return (altitudeM - low) / ((heightsM[index + 1] as number) - low);
}

function checkAltitude(altitudeM: number): void {
  requireInRange(
    'altitudeM',
    altitudeM,
    STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.min,
    STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max,
    'm',
  );
}

/**
 * Temperature outside the profile: the standard atmosphere's at `altitudeM`, shifted by the
 * difference between the profile and the standard at the end level `index`.
 */
function shiftedStandardTemperatureK(
  profile: WindProfile,
  index: number,
  altitudeM: number,
): number {
  const endM = profile.heightsM[index] as number;
  const offsetK =
    (profile.temperaturesK[index] as number) - standardAtmosphereUnchecked(endM, 0).temperatureK;
  return standardAtmosphereUnchecked(altitudeM, 0).temperatureK + offsetK;
}

/**
 * Temperature between levels i and i+1: linear in geopotential height, as the 1976 standard's
 * layers are, so a profile of standard temperatures gives back the standard atmosphere.
 */
function temperatureBetweenK(profile: WindProfile, index: number, altitudeM: number): number {
  const lowH = geopotentialAltitudeM(profile.heightsM[index] as number);
  const highH = geopotentialAltitudeM(profile.heightsM[index + 1] as number);
  const t = (geopotentialAltitudeM(altitudeM) - lowH) / (highH - lowH);
  const lowK = profile.temperaturesK[index] as number;
  return lowK + t * ((profile.temperaturesK[index + 1] as number) - lowK);
}

/**
 * Wind and temperature at a height, interpolated linearly between levels (the wind in height, the temperature in geopotential height); the wind as
 * components u and v, so a veering wind turns smoothly and a reversal passes through calm rather
 * than through an averaged angle. Outside the profile the wind is held at the end level and the
 * temperature follows the 1976 standard atmosphere shifted to meet the end level; `note` says so.
 * @param profile from `windProfile`
 * @param altitudeM geometric height above mean sea level [m], −5 000 to 86 000
 * @throws InputError when the height is out of range
 */
export function windAt(profile: WindProfile, altitudeM: number): WindSample {
  checkAltitude(altitudeM);
  const { heightsM, uMS, vMS, temperaturesK } = profile;
  const last = heightsM.length - 1;
  const index = locateLevel(heightsM, altitudeM, 0);
  let u: number;
  let v: number;
  let temperatureK: number;
  let position: ProfilePosition;
  if (index < 0) {
    u = uMS[0] as number;
    v = vMS[0] as number;
    temperatureK = shiftedStandardTemperatureK(profile, 0, altitudeM);
    position = 'below';
  } else if (index === last) {
    u = uMS[last] as number;
    v = vMS[last] as number;
    temperatureK =
      altitudeM === heightsM[last]
        ? (temperaturesK[last] as number)
        : shiftedStandardTemperatureK(profile, last, altitudeM);
    position = altitudeM === heightsM[last] ? 'within' : 'above';
  } else {
    const t = levelFraction(heightsM, index, altitudeM);
    const lerp = (values: Float64Array) =>
      (values[index] as number) + t * ((values[index + 1] as number) - (values[index] as number));
    u = lerp(uMS);
    v = lerp(vMS);
    temperatureK = temperatureBetweenK(profile, index, altitudeM);
    position = 'within';
  }
  const { directionDeg, speedMS } = windDirectionAndSpeed(u, v);
  const sample = { uMS: u, vMS: v, directionDeg, speedMS, temperatureK, position };
  if (position === 'above') return { ...sample, note: windAboveProfileNote(profile) };
  if (position === 'below') return { ...sample, note: windBelowProfileNote(profile) };
  return sample;
}

/** The air at a height as an ascent or descent model needs it. */
export interface AirSample {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Dry-air density, ρ = p·M0/(R*·T) with the 1976 standard's constants [kg/m³]. */
  readonly densityKgM3: number;
}

/**
 * Temperature, pressure and density of the air at a height from a profile, to stand in for the
 * standard atmosphere in a flight integration. Between levels the temperature is linear in
 * geopotential height and the pressure follows the hypsometric equation from the level below (exact for a constant
 * lapse rate); outside the profile both follow the 1976 standard atmosphere, the temperature
 * shifted and the pressure scaled to meet the end level.
 * @param altitudeM geometric height above mean sea level [m], −5 000 to 86 000
 */
export function windProfileAirAt(profile: WindProfile, altitudeM: number): AirSample {
  checkAltitude(altitudeM);
  return airAtLocated(profile, altitudeM, locateLevel(profile.heightsM, altitudeM, 0));
}

/**
 * `windProfileAirAt` for a flight integration, which calls it tens of thousands of times at
 * nearby heights: remembers the last level found, so each call walks a step or two instead of
 * searching, and skips the range check (integrators keep within −5 000 to 86 000 m). Gives the
 * same numbers as `windProfileAirAt`.
 * @internal
 */
export function windProfileAirSampler(profile: WindProfile): (altitudeM: number) => AirSample {
  let hint = 0;
  return (altitudeM) => {
    hint = locateLevel(profile.heightsM, altitudeM, hint);
    return airAtLocated(profile, altitudeM, hint);
  };
}

/** The air at a height whose level index `locateLevel` has found. */
function airAtLocated(profile: WindProfile, altitudeM: number, index: number): AirSample {
  const { heightsM, temperaturesK, pressuresPa } = profile;
  const last = heightsM.length - 1;
  let temperatureK: number;
  let pressurePa: number;
  if (index < 0 || index === last) {
    const end = index < 0 ? 0 : last;
    const endM = heightsM[end] as number;
    temperatureK = shiftedStandardTemperatureK(profile, end, altitudeM);
    pressurePa =
      ((pressuresPa[end] as number) * standardAtmosphereUnchecked(altitudeM, 0).pressurePa) /
      standardAtmosphereUnchecked(endM, 0).pressurePa;
  } else {
    const lowK = temperaturesK[index] as number;
    temperatureK = temperatureBetweenK(profile, index, altitudeM);
    pressurePa = hypsometricPressurePa(
      heightsM[index] as number,
      pressuresPa[index] as number,
      lowK,
      altitudeM,
      temperatureK,
    );
  }
  return {
    temperatureK,
    pressurePa,
    densityKgM3:
      (pressurePa * USSA1976_AIR_MOLAR_MASS_KG_PER_MOL) /
      (USSA1976_GAS_CONSTANT_J_PER_MOL_K * temperatureK),
  };
}
