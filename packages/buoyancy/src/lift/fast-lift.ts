import { moistAirDensity } from '../atmosphere/moist-air-density.js';
import { sphereGeometry } from '../envelope/envelope-geometry.js';
import { gasDensity, type GasDensityInput } from '../gas/lifting-gas-density.js';
import { liftMasses, type LiftMasses } from '../steps/lift-steps.js';

/** Everything a lift check needs, already in SI numbers: for charts, sweeps and hot loops. */
export interface FastLiftInput {
  readonly volumeM3: number;
  readonly envelopeMassKg: number;
  readonly payloadMassKg: number;
  readonly airTemperatureK: number;
  readonly airPressurePa: number;
  readonly airVapourMoleFraction: number;
  readonly gas: GasDensityInput;
}

/**
 * The lift check's numbers without its derivation: CIPM-2007 air density, the lifting gas at its
 * own temperature and pressure, and the lift balance. Same physics and same results as the
 * lift-check kind with measured air.
 */
export function fastLift(input: FastLiftInput): LiftMasses {
  const air = moistAirDensity({
    temperatureK: input.airTemperatureK,
    pressurePa: input.airPressurePa,
    vapourMoleFraction: input.airVapourMoleFraction,
  });
  const gas = liftingGasDensity(input);
  return liftMasses(
    input.volumeM3,
    air.densityKgM3,
    gas.densityKgM3,
    input.envelopeMassKg,
    input.payloadMassKg,
  );
}

/**
 * The gas's density; heated air is the surrounding air at the gas's temperature and pressure,
 * with the air's own water content, as the lift-check kind computes it.
 */
function liftingGasDensity(input: Pick<FastLiftInput, 'airVapourMoleFraction' | 'gas'>): {
  densityKgM3: number;
} {
  if (input.gas.gasId !== 'hot-air') return gasDensity(input.gas);
  return moistAirDensity({
    temperatureK: input.gas.temperatureK,
    pressurePa: input.gas.pressurePa,
    vapourMoleFraction: input.airVapourMoleFraction,
  });
}

export interface DiameterSweepPoint {
  readonly diameterM: number;
  readonly netLiftKg: number;
  readonly freeLiftKg: number;
}

/**
 * Net and free lift of spheres from `fromDiameterM` to `toDiameterM` in `points` even steps, for
 * a chart. The envelope mass is fixed, or grows with the surface at `arealDensityKgM2`.
 */
export function sweepSphereDiameter(
  base: Omit<FastLiftInput, 'volumeM3' | 'envelopeMassKg'>,
  envelope: { readonly fixedMassKg: number; readonly arealDensityKgM2: number },
  fromDiameterM: number,
  toDiameterM: number,
  points: number,
): DiameterSweepPoint[] {
  const air = moistAirDensity({
    temperatureK: base.airTemperatureK,
    pressurePa: base.airPressurePa,
    vapourMoleFraction: base.airVapourMoleFraction,
  });
  const gas = liftingGasDensity(base);
  const sweep: DiameterSweepPoint[] = new Array(points);
  for (let index = 0; index < points; index += 1) {
    const diameterM =
      points === 1
        ? fromDiameterM
        : fromDiameterM + ((toDiameterM - fromDiameterM) * index) / (points - 1);
    const geometry = sphereGeometry(diameterM);
    const envelopeMassKg =
      envelope.fixedMassKg + envelope.arealDensityKgM2 * geometry.surfaceAreaM2;
    const lift = liftMasses(
      geometry.volumeM3,
      air.densityKgM3,
      gas.densityKgM3,
      envelopeMassKg,
      base.payloadMassKg,
    );
    sweep[index] = { diameterM, netLiftKg: lift.netLiftKg, freeLiftKg: lift.freeLiftKg };
  }
  return sweep;
}
