import { InputError } from '../errors.js';

export interface LiftReading {
  readonly timeS: number;
  readonly netLiftKg: number;
}

export interface RetentionFit {
  /** Lift at t = 0 of the fitted curve [kg]. */
  readonly initialLiftKg: number;
  /** Fractional loss rate k in L(t) = L₀·e^(−k·t) [1/s]. */
  readonly lossRatePerS: number;
  /** Time for the lift to halve, ln 2 / k [s]; Infinity when the lift does not fall. */
  readonly halfLifeS: number;
  /** Coefficient of determination of the fit of ln L against t. */
  readonly rSquared: number;
}

/**
 * Fits L(t) = L₀·e^(−k·t) to lift readings by least squares on ln L (a straight line in t), the
 * usual model of gas loss through an envelope at a constant rate proportional to what is left.
 * Needs at least two readings with positive lift at different times.
 * @throws InputError (field `readings`) when the readings cannot be fitted
 */
export function fitLiftRetention(readings: readonly LiftReading[]): RetentionFit {
  const usable = readings.filter((reading) => reading.netLiftKg > 0);
  if (usable.length < 2) {
    throw new InputError(
      'readings',
      readings.length,
      'needs at least two readings with positive lift to fit a loss rate',
    );
  }
  const n = usable.length;
  const meanT = usable.reduce((sum, reading) => sum + reading.timeS, 0) / n;
  const meanY = usable.reduce((sum, reading) => sum + Math.log(reading.netLiftKg), 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (const reading of usable) {
    const dt = reading.timeS - meanT;
    const dy = Math.log(reading.netLiftKg) - meanY;
    sxx += dt * dt;
    sxy += dt * dy;
    syy += dy * dy;
  }
  if (sxx === 0)
    throw new InputError(
      'readings',
      readings.length,
      'must be taken at two or more different times',
    );
  const slope = sxy / sxx;
  const lossRatePerS = -slope;
  return {
    initialLiftKg: Math.exp(meanY - slope * meanT),
    lossRatePerS,
    halfLifeS: lossRatePerS > 0 ? Math.LN2 / lossRatePerS : Number.POSITIVE_INFINITY,
    rSquared: syy === 0 ? 1 : (sxy * sxy) / (sxx * syy),
  };
}
