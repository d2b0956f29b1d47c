import { Derivation } from '../derivation.js';
import {
  type FlightProfileInput,
  flightProfileSchema,
  type FlightProfileValues,
} from '../kinds/flight-profile.kind.js';
import { parseInputs } from '../schema/parse-inputs.js';
import { type AscentResult, integrateAscent, integrateDescent } from './ascent-model.js';
import { chooseFlightAir } from './flight-air.js';
import { deriveLaunch } from './launch-steps.js';
import { deriveStopAltitudeM } from './stop-altitude-steps.js';

/** A moment of a flight: time since launch [s] and geometric altitude above mean sea level [m]. */
export interface FlightPathPoint {
  readonly timeS: number;
  readonly altitudeM: number;
}

/** The vertical path of a flight as the flight-profile kind integrates it, at every time step. */
export interface FlightPath {
  /** Launch to the end of the ascent (burst, float, ceiling or time limit). */
  readonly ascent: readonly FlightPathPoint[];
  /** Burst to the ground under the parachute, times since launch; empty without a descent. */
  readonly descent: readonly FlightPathPoint[];
  /** How the ascent ended; 'no-lift' when the balloon does not rise. */
  readonly end: AscentResult['end'];
}

type DescentIntegration = ReturnType<typeof integrateDescent>;

/** Mass under the canopy: the payload and the envelope remnant, the whole envelope when not given [kg]. */
export function descentMassKg(inputs: FlightProfileValues): number {
  return inputs.payloadMassKg + (inputs.parachute?.envelopeRemnantMassKg ?? inputs.envelopeMassKg);
}

/**
 * The integrations as a path: the ascent's times and altitudes, and the descent's shifted to time
 * since launch (its first point, the burst, is already the ascent's last).
 */
export function pathOf(ascent: AscentResult, descent: DescentIntegration | undefined): FlightPath {
  const ascentPoints = ascent.points.map(({ timeS, altitudeM }) => ({ timeS, altitudeM }));
  if (!descent) return { ascent: ascentPoints, descent: [], end: ascent.end };
  return {
    ascent: ascentPoints,
    descent: descent.points.slice(1).map(({ timeS, altitudeM }) => ({
      timeS: ascent.endTimeS + timeS,
      altitudeM,
    })),
    end: ascent.end,
  };
}

/**
 * The time and altitude series behind a flight-profile result, unthinned: the same launch, burst
 * or float altitude and Runge–Kutta integrations as `evaluate('flight-profile', input)` (which
 * publishes them thinned to 600 rows), in the same air (the wind profile's when it gives
 * temperatures), for a drift integration to follow. There is a descent only when the envelope
 * bursts and a parachute is given.
 * @param input flight-profile inputs (see the kind), SI units
 * @throws InputError as the flight-profile kind does
 */
export function flightPath(input: FlightProfileInput): FlightPath {
  return flightPathOf(parseInputs(flightProfileSchema, input));
}

/** `flightPath` for validated inputs. */
export function flightPathOf(inputs: FlightProfileValues): FlightPath {
  // The steps and warnings are the kind's; only the numbers are wanted here.
  const d = new Derivation();
  const air = chooseFlightAir(d, inputs);
  const launch = deriveLaunch(d, inputs, air);
  const start = [{ timeS: 0, altitudeM: inputs.launch.altitudeM }];
  if (launch.ascentRateMS <= 0) return { ascent: start, descent: [], end: 'no-lift' };
  const stopAltitudeM = deriveStopAltitudeM(d, inputs, launch);
  const ascent = integrateAscent(
    launch.model,
    inputs.launch.altitudeM,
    stopAltitudeM,
    inputs.timeStepS,
    inputs.maxTimeS,
  );
  if (ascent.end !== 'burst' || !inputs.parachute) return pathOf(ascent, undefined);
  const descent = integrateDescent(
    descentMassKg(inputs),
    inputs.parachute.areaM2,
    inputs.parachute.dragCoefficient,
    ascent.endAltitudeM,
    inputs.launch.altitudeM,
    air.model,
    inputs.timeStepS,
  );
  return pathOf(ascent, descent);
}
