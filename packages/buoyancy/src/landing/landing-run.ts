import { STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M } from '../atmosphere/standard-atmosphere.js';
import { ComputationError } from '../errors.js';
import {
  type AscentModel,
  ascentState,
  integrateAscent,
  integrateDescent,
} from '../flight/ascent-model.js';
import { driftTrack } from '../flight/drift.js';
import type { FlightAir } from '../flight/flight-air.js';
import { descentMassKg, pathOf } from '../flight/flight-path.js';
import type { Launch } from '../flight/launch-steps.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { findRoot } from '../numerics/find-root.js';
import type { WindProfile } from '../wind/wind-profile.js';
import type { LandingRun } from './landing-area-types.js';

/**
 * Time step of the repeated flights [s]: coarser than the nominal 1 s, so 200 runs stay fast.
 * landing-area.test.ts shows the landing point moves by under 0.1 % of the distance for it (2e-5
 * of 136 km measured).
 */
export const LANDING_RUN_STEP_S = 20;

/** What every run of one landing area shares: the nominal inputs, launch and air. */
export interface RunSetup {
  readonly inputs: FlightProfileValues;
  readonly launch: Launch;
  readonly air: FlightAir;
  readonly wind: WindProfile;
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
  readonly stepS: number;
}

/** Multipliers of the nominal inputs for one run (1 for the nominal flight). */
export interface RunFactors {
  readonly burstDiameter: number;
  readonly ascentRate: number;
  readonly descentDrag: number;
  readonly windSpeed: number;
}

export const NOMINAL_FACTORS: RunFactors = {
  burstDiameter: 1,
  ascentRate: 1,
  descentDrag: 1,
  windSpeed: 1,
};

const CEILING_M = STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max;

/**
 * Gas amount giving `factor` times the nominal ascent rate at launch [mol]. More gas means more
 * free lift (constant on the way up for a zero-pressure envelope) and a larger envelope; the
 * rate w = √(2·L·g/(ρ·C_d·A)) rises monotonically with it, so Brent's method finds it between
 * the amount with no free lift and one with enough.
 */
export function gasForRateMol(model: AscentModel, launchAltitudeM: number, factor: number): number {
  if (factor === 1) return model.gasMol;
  const rateAt = (gasMol: number) =>
    ascentState({ ...model, gasMol }, launchAltitudeM).ascentRateMS;
  const targetMS = factor * rateAt(model.gasMol);
  let highMol = model.gasMol * 2;
  while (rateAt(highMol) < targetMS) highMol *= 2;
  return findRoot((gasMol) => rateAt(gasMol) - targetMS, 0, highMol, {
    xTolerance: 1e-9 * model.gasMol,
  });
}

/** Burst altitude of a run [m], or undefined when the envelope does not burst below the ceiling. */
function burstAltitudeM(model: AscentModel, launchAltitudeM: number): number | undefined {
  if (model.envelope.kind !== 'extensible') return undefined;
  const burstVolumeM3 = (Math.PI * model.envelope.burstDiameterM ** 3) / 6;
  const volumeAt = (altitudeM: number) => ascentState(model, altitudeM).volumeM3 - burstVolumeM3;
  if (volumeAt(launchAltitudeM) >= 0 || volumeAt(CEILING_M) < 0) return undefined;
  return findRoot(volumeAt, launchAltitudeM, CEILING_M, { xTolerance: 1e-3 });
}

/** The wind with every speed scaled by `factor` (directions kept). */
function scaledWind(wind: WindProfile, factor: number): WindProfile {
  if (factor === 1) return wind;
  return {
    ...wind,
    uMS: wind.uMS.map((u) => u * factor),
    vMS: wind.vMS.map((v) => v * factor),
  };
}

/**
 * One flight with the nominal inputs scaled by `factors`: burst diameter, launch ascent rate
 * (through the gas amount), parachute drag area and wind speed. Undefined when that balloon does
 * not rise, does not burst below the model's ceiling or within the time limit, or a factor is not
 * positive (a normal draw more than 1/spread deviations below the mean).
 */
export function flyRun(setup: RunSetup, factors: RunFactors): LandingRun | undefined {
  const { inputs, launch, air } = setup;
  const parachute = inputs.parachute;
  if (!parachute || launch.model.envelope.kind !== 'extensible') return undefined;
  const positive = Object.values(factors).every((factor) => factor > 0);
  if (!positive) return undefined;
  const launchAltitudeM = inputs.launch.altitudeM;
  let gasMol: number;
  try {
    gasMol = gasForRateMol(launch.model, launchAltitudeM, factors.ascentRate);
  } catch (error) {
    if (error instanceof ComputationError) return undefined;
    throw error;
  }
  const model: AscentModel = {
    ...launch.model,
    gasMol,
    envelope: {
      kind: 'extensible',
      burstDiameterM: launch.model.envelope.burstDiameterM * factors.burstDiameter,
    },
  };
  if (ascentState(model, launchAltitudeM).ascentRateMS <= 0) return undefined;
  const stopM = burstAltitudeM(model, launchAltitudeM);
  if (stopM === undefined) return undefined;
  const ascent = integrateAscent(model, launchAltitudeM, stopM, setup.stepS, inputs.maxTimeS);
  if (ascent.end !== 'burst') return undefined;
  const descent = integrateDescent(
    descentMassKg(inputs),
    parachute.areaM2,
    parachute.dragCoefficient * factors.descentDrag,
    ascent.endAltitudeM,
    launchAltitudeM,
    air.model,
    setup.stepS,
  );
  const path = pathOf(ascent, descent);
  const drift = driftTrack({
    launch: {
      latitudeDeg: setup.latitudeDeg,
      longitudeDeg: setup.longitudeDeg,
      altitudeM: launchAltitudeM,
    },
    ascent: path.ascent,
    descent: path.descent,
    wind: scaledWind(setup.wind, factors.windSpeed),
    maxStepS: setup.stepS,
  });
  return {
    latitudeDeg: drift.landing.latitudeDeg,
    longitudeDeg: drift.landing.longitudeDeg,
    eastM: drift.landing.eastM,
    northM: drift.landing.northM,
    flightTimeS: drift.flightTimeS,
    burstAltitudeM: ascent.endAltitudeM,
  };
}
