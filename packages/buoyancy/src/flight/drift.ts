import { STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M } from '../atmosphere/standard-atmosphere.js';
import type { CalculationWarning } from '../derivation.js';
import { InputError, requireInRange } from '../errors.js';
import {
  levelFraction,
  locateLevel,
  windAboveProfileNote,
  windBelowProfileNote,
  type WindProfile,
} from '../wind/wind-profile.js';
import type { FlightPathPoint } from './flight-path.js';
import { stepOnEllipsoid, wgs84Inverse } from './geodesy.js';

/** Where the balloon is launched from. */
export interface LaunchSite {
  /** Geodetic latitude on WGS 84 [°], −89 to 89. */
  readonly latitudeDeg: number;
  /** Longitude [°], −180 to 180, east positive. */
  readonly longitudeDeg: number;
  /** Height of the site above mean sea level [m], −500 to 6 000. */
  readonly altitudeM: number;
}

export interface DriftInput {
  readonly launch: LaunchSite;
  /** The ascent, times since launch [s] not decreasing, altitudes [m]; at least one point. */
  readonly ascent: readonly FlightPathPoint[];
  /** The descent after burst, times since launch; leave empty when there is none. */
  readonly descent?: readonly FlightPathPoint[];
  /** The wind, from `windProfile` or `readWindProfile`. */
  readonly wind: WindProfile;
  /**
   * Longest time step of the horizontal integration [s], 0.1 to 60, default 5: a path given at
   * coarser steps is divided (altitude linear in time between its points).
   */
  readonly maxStepS?: number;
}

/** One point of the ground track. */
export interface DriftPoint {
  readonly timeS: number;
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly altitudeM: number;
  /** Distance carried east since launch, ∫u dt [m] (west negative). */
  readonly eastM: number;
  /** Distance carried north since launch, ∫v dt [m] (south negative). */
  readonly northM: number;
}

export interface DriftResult {
  /** Every point of the given path, launch first. */
  readonly track: readonly DriftPoint[];
  /** The end of the ascent (burst, or float / ceiling / time limit). */
  readonly burst: DriftPoint;
  /** The end of the path: the landing point when there is a descent. */
  readonly landing: DriftPoint;
  /** Whether the path ends with a descent (else `landing` is where the path stops, in the air). */
  readonly landed: boolean;
  /** Geodesic distance on WGS 84 from launch to `landing` [m]. */
  readonly groundDistanceM: number;
  /** Azimuth of that geodesic at launch, clockwise from true north [°]; 0 when the distance is 0. */
  readonly initialBearingDeg: number;
  /** Time from launch to `landing` [s]. */
  readonly flightTimeS: number;
  /** What the wind profile and the integration assumed, with stable codes. */
  readonly notes: readonly CalculationWarning[];
}

/** Longest time steps accepted [s]. */
export const DRIFT_MAX_STEP_RANGE_S = { min: 0.1, max: 60 } as const;
/** Launch sites accepted: latitude [°] and altitude [m]. */
export const LAUNCH_LATITUDE_RANGE_DEG = { min: -89, max: 89 } as const;
export const LAUNCH_ALTITUDE_RANGE_M = { min: -500, max: 6000 } as const;
/** Latest time of a path point [s] (about 116 days). */
const MAX_PATH_TIME_S = 1e7;

function checkPath(field: string, points: readonly FlightPathPoint[], startTimeS: number): number {
  const { min, max } = STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M;
  let previousS = startTimeS;
  for (let index = 0; index < points.length; index += 1) {
    const { timeS, altitudeM } = points[index] as FlightPathPoint;
    // Field paths are built only for a refusal: this runs for every point of every drift.
    if (!(timeS >= 0 && timeS <= MAX_PATH_TIME_S)) {
      requireInRange(`${field}.${index}.timeS`, timeS, 0, MAX_PATH_TIME_S, 's');
    }
    if (!(altitudeM >= min && altitudeM <= max)) {
      requireInRange(`${field}.${index}.altitudeM`, altitudeM, min, max, 'm');
    }
    if (timeS < previousS) {
      throw new InputError(
        `${field}.${index}.timeS`,
        timeS,
        `must not be earlier than the point before it (${previousS} s)`,
      );
    }
    previousS = timeS;
  }
  return previousS;
}

/** One wind component at a located height, held at the end levels outside the profile. */
function windComponentAt(
  values: Float64Array,
  heightsM: Float64Array,
  index: number,
  altitudeM: number,
): number {
  if (index < 0) return values[0] as number;
  if (index >= values.length - 1) return values[values.length - 1] as number;
  const low = values[index] as number;
  return low + levelFraction(heightsM, index, altitudeM) * ((values[index + 1] as number) - low);
}

/**
 * Ground track of a free balloon carried by the wind: integrates the horizontal wind at the
 * balloon's altitude over time, dx/dt = u(z(t)), dy/dt = v(z(t)), along the given ascent and
 * descent (altitude linear in time between their points; trapezoidal rule over steps of at most
 * `maxStepS`), and moves the point below the balloon on the WGS 84 ellipsoid by the local metres per
 * degree (radii of curvature in the meridian and prime vertical at each step's mid latitude). The
 * balloon is taken to move with the wind (no inertia); the motion is projected to the ellipsoid's
 * surface, neglecting the factor R/(R + h), 0.3 % at 20 km. Launch to landing distance and bearing
 * come from the ellipsoidal inverse (Vincenty 1975).
 * @throws InputError naming `launch.*`, `ascent.N.*`, `descent.N.*` or `maxStepS`
 * @throws ComputationError when the track comes within half a degree of a pole
 */
export function driftTrack(input: DriftInput): DriftResult {
  const { launch, ascent, wind } = input;
  const descent = input.descent ?? [];
  requireInRange(
    'launch.latitudeDeg',
    launch.latitudeDeg,
    LAUNCH_LATITUDE_RANGE_DEG.min,
    LAUNCH_LATITUDE_RANGE_DEG.max,
    '°',
  );
  requireInRange('launch.longitudeDeg', launch.longitudeDeg, -180, 180, '°');
  requireInRange(
    'launch.altitudeM',
    launch.altitudeM,
    LAUNCH_ALTITUDE_RANGE_M.min,
    LAUNCH_ALTITUDE_RANGE_M.max,
    'm',
  );
  const maxStepS = requireInRange(
    'maxStepS',
    input.maxStepS ?? 5,
    DRIFT_MAX_STEP_RANGE_S.min,
    DRIFT_MAX_STEP_RANGE_S.max,
    's',
  );
  if (ascent.length === 0) throw new InputError('ascent', ascent, 'needs at least one point');
  const ascentEndS = checkPath('ascent', ascent, 0);
  checkPath('descent', descent, ascentEndS);

  const { heightsM, uMS, vMS } = wind;
  const last = heightsM.length - 1;
  const topM = heightsM[last] as number;
  const bottomM = heightsM[0] as number;

  // One pass over the path with plain locals and typed arrays: no closures and no objects per
  // step, so a drift costs a fraction of a millisecond (bench/engine-bench.mjs).
  const count = ascent.length + descent.length;
  const times = new Float64Array(count);
  const altitudes = new Float64Array(count);
  const latitudes = new Float64Array(count);
  const longitudes = new Float64Array(count);
  const easts = new Float64Array(count);
  const norths = new Float64Array(count);
  const position = new Float64Array(2);
  position[0] = launch.latitudeDeg;
  position[1] = launch.longitudeDeg;
  const first = ascent[0] as FlightPathPoint;
  let timeS = first.timeS;
  let altitudeM = first.altitudeM;
  times[0] = timeS;
  altitudes[0] = altitudeM;
  latitudes[0] = launch.latitudeDeg;
  longitudes[0] = launch.longitudeDeg;
  let eastM = 0;
  let northM = 0;
  let hint = locateLevel(heightsM, altitudeM, 0);
  let u = windComponentAt(uMS, heightsM, hint, altitudeM);
  let v = windComponentAt(vMS, heightsM, hint, altitudeM);
  let highestM = altitudeM;
  let lowestM = altitudeM;
  for (let index = 1; index < count; index += 1) {
    const point = (
      index < ascent.length ? ascent[index] : descent[index - ascent.length]
    ) as FlightPathPoint;
    const durationS = point.timeS - timeS;
    const steps = durationS > 0 ? Math.ceil(durationS / maxStepS - 1e-9) : 1;
    const stepS = durationS / steps;
    const climbM = (point.altitudeM - altitudeM) / steps;
    for (let step = 1; step <= steps; step += 1) {
      const z = step === steps ? point.altitudeM : altitudeM + climbM * step;
      hint = locateLevel(heightsM, z, hint);
      const u1 = windComponentAt(uMS, heightsM, hint, z);
      const v1 = windComponentAt(vMS, heightsM, hint, z);
      if (stepS > 0) {
        const de = 0.5 * (u + u1) * stepS;
        const dn = 0.5 * (v + v1) * stepS;
        eastM += de;
        northM += dn;
        stepOnEllipsoid(position, de, dn);
      }
      u = u1;
      v = v1;
    }
    timeS = point.timeS;
    altitudeM = point.altitudeM;
    if (altitudeM > highestM) highestM = altitudeM;
    if (altitudeM < lowestM) lowestM = altitudeM;
    times[index] = timeS;
    altitudes[index] = altitudeM;
    latitudes[index] = position[0] as number;
    longitudes[index] = position[1] as number;
    easts[index] = eastM;
    norths[index] = northM;
  }
  const track: DriftPoint[] = new Array<DriftPoint>(count);
  for (let index = 0; index < count; index += 1) {
    track[index] = {
      timeS: times[index] as number,
      latitudeDeg: latitudes[index] as number,
      longitudeDeg: longitudes[index] as number,
      altitudeM: altitudes[index] as number,
      eastM: easts[index] as number,
      northM: norths[index] as number,
    };
  }
  const burstIndex = ascent.length - 1;
  const above = highestM > topM;
  const below = lowestM < bottomM;

  const landing = track[track.length - 1] as DriftPoint;
  const inverse = wgs84Inverse(
    launch.latitudeDeg,
    launch.longitudeDeg,
    landing.latitudeDeg,
    landing.longitudeDeg,
  );
  const landed = descent.length > 0;
  const notes: CalculationWarning[] = [...wind.notes];
  if (above) notes.push(windAboveProfileNote(wind));
  if (below) notes.push(windBelowProfileNote(wind));
  if (!landed) {
    notes.push({
      code: 'drift-not-landed',
      severity: 'warning',
      message:
        'The path has no descent: the track ends where the path ends, in the air, not at a landing point.',
    });
  }
  return {
    track,
    burst: track[burstIndex] as DriftPoint,
    landing,
    landed,
    groundDistanceM: inverse.distanceM,
    initialBearingDeg: inverse.initialBearingDeg,
    flightTimeS: landing.timeS - first.timeS,
    notes,
  };
}
