import { type Derivation, v } from '../derivation.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import { liftCheckKind, liftCheckSchema } from '../kinds/lift-check.kind.js';
import type { LiftMeasurementValues } from '../kinds/lift-measurement.kind.js';
import { findRoot } from '../numerics/find-root.js';
import { parseInputs } from '../schema/parse-inputs.js';

type Prediction = NonNullable<LiftMeasurementValues['prediction']>;

/** The measured lift and its uncertainty (k = 2) [kg]. */
interface MeasuredLift {
  readonly measuredKg: number;
  readonly uncertaintyKg: number;
}

/**
 * The measured lift against the lift check at the logged conditions: the prediction's steps, the
 * difference, and the gas purity that would explain it (with its uncertainty), or a warning when
 * no purity from 50 % to pure can.
 */
export function deriveComparisonWithPrediction(
  d: Derivation,
  prediction: Prediction,
  measured: MeasuredLift,
): void {
  const predictedKg = derivePredictedNetLiftKg(d, prediction);
  deriveLiftDifference(d, measured.measuredKg, predictedKg);
  const predict = (purity: number) =>
    liftCheckKind.compute(
      parseInputs(liftCheckSchema, {
        ...prediction,
        payloadMassKg: 0,
        gas: { ...prediction.gas, purity },
      }),
    ).outputs.netLift?.value ?? Number.NaN;
  const surplus = (purity: number) => predict(purity) - measured.measuredKg;
  const pureSurplus = surplus(1);
  const lowSurplus = surplus(MIN_PURITY);
  const withinUncertainty = Math.abs(measured.measuredKg - predictedKg) <= measured.uncertaintyKg;
  if (withinUncertainty) {
    d.warn({
      code: 'within-measurement-uncertainty',
      severity: 'note',
      message:
        'The measured lift agrees with the prediction within the measurement uncertainty: the difference is no evidence of impure gas or a leak.',
      field: 'readings',
    });
  }
  if (pureSurplus >= 0 && lowSurplus <= 0) {
    deriveExplainingPurity(d, predict, measured, predictedKg);
  } else if (!withinUncertainty) {
    d.warn({
      code: pureSurplus < 0 ? 'lift-above-pure-gas' : 'lift-below-half-purity',
      severity: 'warning',
      message:
        pureSurplus < 0
          ? 'The measured lift is more than pure gas could give at the logged conditions: check the scale, the ballast mass, and the temperature and pressure logged.'
          : 'The measured lift is less than even 50 % pure gas would give: look for a leak, a wrong envelope mass, or a reading error.',
      field: 'readings',
    });
  }
}

/** The lift check's net lift with no payload at the logged conditions, its steps included [kg]. */
function derivePredictedNetLiftKg(d: Derivation, prediction: Prediction): number {
  const result = liftCheckKind.compute(
    parseInputs(liftCheckSchema, { ...prediction, payloadMassKg: 0 }),
  );
  d.include(result);
  d.output(
    'predictedNetLift',
    'Predicted net lift at the logged conditions',
    'net-lift',
    result.outputs.netLift?.context,
  );
  return result.outputs.netLift?.value ?? Number.NaN;
}

/** Measured less predicted net lift, in kilograms and in per cent; publishes both. */
function deriveLiftDifference(d: Derivation, measuredKg: number, predictedKg: number): void {
  d.step({
    id: 'lift-difference',
    label: 'Measured less predicted',
    formula: 'ΔL = L_net,measured − L_net',
    values: [v('L_net,measured', measuredKg, 'kg'), v('L_net', predictedKg, 'kg')],
    result: v('ΔL', measuredKg - predictedKg, 'kg'),
    source: 'difference',
  });
  d.step({
    id: 'lift-difference-percent',
    label: 'Difference relative to the prediction',
    formula: 'ΔL% = 100·ΔL / L_net',
    values: [v('ΔL', measuredKg - predictedKg, 'kg'), v('L_net', predictedKg, 'kg')],
    result: v('ΔL%', (100 * (measuredKg - predictedKg)) / predictedKg, '%'),
    source: 'difference',
  });
  d.output('difference', 'Measured less predicted', 'lift-difference');
  d.output('differencePercent', 'Difference from the prediction', 'lift-difference-percent');
}

/**
 * The purity (the rest air) at which the lift check gives the measured lift, and the band of
 * purities the measured lift ∓ U allows; publishes both [%].
 */
function deriveExplainingPurity(
  d: Derivation,
  predict: (purity: number) => number,
  measured: MeasuredLift,
  predictedKg: number,
): void {
  const { measuredKg, uncertaintyKg } = measured;
  const purity = findRoot((x) => predict(x) - measuredKg, MIN_PURITY, 1, {
    xTolerance: 1e-10,
  });
  d.step({
    id: 'explaining-purity',
    label: 'Gas purity that would explain the measured lift (the rest air)',
    formula: 'x such that L_net(x) = L_net,measured, in %',
    values: [v('L_net,measured', measuredKg, 'kg'), v('L_net(x = 1)', predictedKg, 'kg')],
    // In % as purity is typed and shown everywhere else.
    result: v('x', purity * 100, '%'),
    source: "Brent's method on the lift check with air as the contaminant",
  });
  d.output('explainingPurity', 'Purity that explains the measurement', 'explaining-purity');
  // The band of purities the measurement allows: the lift at its ends, ∓U.
  const purityAt = (liftKg: number) => {
    const off = (x: number) => predict(x) - liftKg;
    if (off(1) <= 0) return 1;
    if (off(MIN_PURITY) >= 0) return MIN_PURITY;
    return findRoot(off, MIN_PURITY, 1, { xTolerance: 1e-10 });
  };
  const low = purityAt(measuredKg - uncertaintyKg);
  const high = purityAt(measuredKg + uncertaintyKg);
  d.step({
    id: 'explaining-purity-uncertainty',
    label: 'Uncertainty of that purity (from the measured lift ∓ U)',
    formula: 'Δx = (x(L_net,measured + U) − x(L_net,measured − U)) / 2',
    values: [v('x_low', low * 100, '%'), v('x_high', high * 100, '%'), v('U', uncertaintyKg, 'kg')],
    result: v('Δx', ((high - low) / 2) * 100, '%'),
    source: 'the lift check solved at both ends of the measured lift’s uncertainty',
  });
  d.output(
    'explainingPurityUncertainty',
    'Uncertainty of the explaining purity',
    'explaining-purity-uncertainty',
  );
}
