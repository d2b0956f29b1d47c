import { STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M } from '../atmosphere/standard-atmosphere.js';
import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import type { AirModel } from './air-model.js';

export type EnvelopeBehaviour =
  /** Stretches freely, gas at ambient pressure, until it bursts at the given diameter. */
  | { readonly kind: 'extensible'; readonly burstDiameterM: number }
  /** Keeps its volume (foil, superpressure): rises until neutrally buoyant. */
  | { readonly kind: 'fixed'; readonly volumeM3: number; readonly frontalAreaM2: number };

export interface AscentModel {
  /** The air on the way: the 1976 standard with the day's offset, or a profile's. */
  readonly air: AirModel;
  /** Amount of lifting gas, constant in flight (no leak, no venting) [mol]. */
  readonly gasMol: number;
  readonly gasMolarMassKgPerMol: number;
  /** Envelope plus payload [kg]. */
  readonly carriedMassKg: number;
  readonly envelope: EnvelopeBehaviour;
  readonly dragCoefficient: number;
}

export interface AscentState {
  readonly volumeM3: number;
  readonly diameterM: number;
  readonly airDensityKgM3: number;
  readonly freeLiftKg: number;
  /** Terminal rate of climb from the drag balance [m/s]; 0 when free lift is not positive. */
  readonly ascentRateMS: number;
}

/**
 * State of a rising balloon at a geometric altitude in the model's air. The gas is
 * at the air's temperature; an extensible envelope is at the air's pressure (zero pressure
 * difference), so its volume is V = n·R·T / p; a fixed envelope keeps its volume. The balloon
 * rises at the terminal velocity where drag balances free lift: ½·ρ·w²·C_d·A = L_free·g.
 */
export function ascentState(model: AscentModel, altitudeM: number): AscentState {
  // Callers stay within the model's altitudes (checked at the kind's boundary).
  const air = model.air(altitudeM);
  let volumeM3: number;
  let frontalAreaM2: number;
  let diameterM: number;
  if (model.envelope.kind === 'extensible') {
    volumeM3 = (model.gasMol * MOLAR_GAS_CONSTANT_J_PER_MOL_K * air.temperatureK) / air.pressurePa;
    diameterM = Math.cbrt((6 * volumeM3) / Math.PI);
    frontalAreaM2 = (Math.PI * diameterM * diameterM) / 4;
  } else {
    volumeM3 = model.envelope.volumeM3;
    frontalAreaM2 = model.envelope.frontalAreaM2;
    diameterM = Math.sqrt((4 * frontalAreaM2) / Math.PI);
  }
  const totalMassKg = model.carriedMassKg + model.gasMol * model.gasMolarMassKgPerMol;
  const freeLiftKg = air.densityKgM3 * volumeM3 - totalMassKg;
  const ascentRateMS =
    freeLiftKg > 0
      ? Math.sqrt(
          (2 * freeLiftKg * air.gravityMS2) /
            (air.densityKgM3 * model.dragCoefficient * frontalAreaM2),
        )
      : 0;
  return { volumeM3, diameterM, airDensityKgM3: air.densityKgM3, freeLiftKg, ascentRateMS };
}

/** Terminal rate of fall under a parachute, w = √(2·m·g / (ρ·C_d·A)) [m/s]. */
export function descentRateMS(
  massKg: number,
  parachuteAreaM2: number,
  dragCoefficient: number,
  altitudeM: number,
  air: AirModel,
): number {
  const { gravityMS2, densityKgM3 } = air(altitudeM);
  return Math.sqrt((2 * massKg * gravityMS2) / (densityKgM3 * dragCoefficient * parachuteAreaM2));
}

export interface ProfilePoint {
  readonly timeS: number;
  readonly altitudeM: number;
  readonly ascentRateMS: number;
  readonly diameterM: number;
  readonly freeLiftKg: number;
}

export interface AscentResult {
  readonly points: readonly ProfilePoint[];
  readonly endTimeS: number;
  readonly endAltitudeM: number;
  readonly end: 'burst' | 'float' | 'model-ceiling' | 'time-limit' | 'no-lift';
}

/**
 * Integrates dz/dt = w(z) from the launch altitude with the classical fourth-order Runge–Kutta
 * method at a fixed time step, until the envelope reaches `stopAltitudeM` (burst or float
 * altitude, found beforehand), the model's 86 km ceiling, or the time limit. The last step is cut
 * to land exactly on the stop altitude.
 */
export function integrateAscent(
  model: AscentModel,
  launchAltitudeM: number,
  stopAltitudeM: number,
  timeStepS: number,
  maxTimeS: number,
): AscentResult {
  const ceilingM = STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max;
  const rate = (z: number) =>
    z >= ceilingM ? 0 : ascentState(model, Math.max(z, launchAltitudeM)).ascentRateMS;
  const point = (timeS: number, altitudeM: number): ProfilePoint => {
    const state = ascentState(model, Math.min(altitudeM, ceilingM));
    return {
      timeS,
      altitudeM,
      ascentRateMS: state.ascentRateMS,
      diameterM: state.diameterM,
      freeLiftKg: state.freeLiftKg,
    };
  };
  const points: ProfilePoint[] = [point(0, launchAltitudeM)];
  if (rate(launchAltitudeM) <= 0)
    return { points, endTimeS: 0, endAltitudeM: launchAltitudeM, end: 'no-lift' };
  const target = Math.min(stopAltitudeM, ceilingM);
  let t = 0;
  let z = launchAltitudeM;
  // The rate at the start of a step is the one recorded at the end of the previous step.
  let k1 = rate(z);
  while (t < maxTimeS) {
    const h = timeStepS;
    const k2 = rate(z + (h * k1) / 2);
    const k3 = rate(z + (h * k2) / 2);
    const k4 = rate(z + h * k3);
    const dz = (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    if (z + dz >= target || dz <= 1e-9) {
      // Cut the last step in proportion to the rise still needed (the rate barely changes over
      // one step except at a float, where the remaining rise is below a metre anyway).
      const fraction = dz > 0 ? Math.min(1, (target - z) / dz) : 0;
      t += h * fraction;
      z = dz > 0 ? target : z;
      points.push(point(t, z));
      const stoppedByCeiling = stopAltitudeM > ceilingM;
      const end = stoppedByCeiling
        ? 'model-ceiling'
        : model.envelope.kind === 'extensible'
          ? 'burst'
          : 'float';
      return { points, endTimeS: t, endAltitudeM: z, end };
    }
    t += h;
    z += dz;
    const reached = point(t, z);
    points.push(reached);
    k1 = reached.ascentRateMS;
  }
  return { points, endTimeS: t, endAltitudeM: z, end: 'time-limit' };
}

/**
 * Integrates the fall under a parachute, dz/dt = −w(z), from `startAltitudeM` down to the ground
 * altitude with RK4 at a fixed step; returns time and altitude pairs.
 */
export function integrateDescent(
  massKg: number,
  parachuteAreaM2: number,
  dragCoefficient: number,
  startAltitudeM: number,
  groundAltitudeM: number,
  air: AirModel,
  timeStepS: number,
): {
  readonly points: readonly { timeS: number; altitudeM: number; rateMS: number }[];
  readonly durationS: number;
} {
  const rate = (z: number) =>
    descentRateMS(
      massKg,
      parachuteAreaM2,
      dragCoefficient,
      Math.min(Math.max(z, groundAltitudeM), STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max),
      air,
    );
  const points = [{ timeS: 0, altitudeM: startAltitudeM, rateMS: -rate(startAltitudeM) }];
  let t = 0;
  let z = startAltitudeM;
  for (;;) {
    const h = timeStepS;
    const k1 = rate(z);
    const k2 = rate(z - (h * k1) / 2);
    const k3 = rate(z - (h * k2) / 2);
    const k4 = rate(z - h * k3);
    const dz = (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    if (z - dz <= groundAltitudeM) {
      t += (h * (z - groundAltitudeM)) / dz;
      points.push({ timeS: t, altitudeM: groundAltitudeM, rateMS: -rate(groundAltitudeM) });
      return { points, durationS: t };
    }
    t += h;
    z -= dz;
    points.push({ timeS: t, altitudeM: z, rateMS: -rate(z) });
  }
}
