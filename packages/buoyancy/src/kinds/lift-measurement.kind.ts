import * as z from 'zod';
import { Derivation, v } from '../derivation.js';
import { findRoot } from '../numerics/find-root.js';
import { fitLiftRetention } from '../measurement/lift-retention.js';
import { ambientSchema } from '../schema/ambient-schema.js';
import { envelopeMassSchema, envelopeSchema } from '../schema/envelope-schema.js';
import { gasSchema } from '../schema/gas-schema.js';
import { parseInputs } from '../schema/parse-inputs.js';
import { quantity } from '../schema/quantity-schema.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import { defineKind } from './kind.js';
import { liftCheckKind, liftCheckSchema } from './lift-check.kind.js';

const readingSchema = z.discriminatedUnion('kind', [
  z
    .object({
      kind: z.literal('ballast'),
      timeS: quantity('time', 0, 3.2e7, 'time since filling').default(0),
      ballastMassKg: quantity('mass', 0, 10000, 'known mass the envelope is tied to'),
      scaleReadingKg: quantity('mass', -10000, 10000, 'what the scale under the ballast shows'),
    })
    .strict(),
  z
    .object({
      kind: z.literal('direct'),
      timeS: quantity('time', 0, 3.2e7, 'time since filling').default(0),
      netLiftKg: quantity('mass', -10000, 10000, 'net lift read directly (spring or load cell)'),
    })
    .strict(),
]);

/**
 * What the instruments can tell apart. Defaults (common practice, no published source): a kitchen
 * or postal scale showing whole grams, and a ballast known to half a gram.
 */
export const INSTRUMENT_DEFAULTS = {
  scaleResolutionKg: 0.001,
  ballastToleranceKg: 0.0005,
} as const;

/** What the scale and the ballast of a lift measurement can tell apart [kg]. */
export interface LiftInstrument {
  scaleResolutionKg: number;
  ballastToleranceKg: number;
}

const instrumentSchema = z
  .object({
    scaleResolutionKg: quantity(
      'mass',
      0,
      10,
      'smallest step the scale (or spring, or load cell) shows',
    ).default(INSTRUMENT_DEFAULTS.scaleResolutionKg),
    ballastToleranceKg: quantity(
      'mass',
      0,
      10,
      'how far the ballast may be off its stated mass',
    ).default(INSTRUMENT_DEFAULTS.ballastToleranceKg),
  })
  .strict()
  .meta({ description: 'Instruments' });

export const liftMeasurementSchema = z
  .object({
    readings: z
      .array(readingSchema.meta({ description: 'kind of reading' }))
      .min(1, { error: 'needs at least one reading' })
      .max(1000)
      .meta({ description: 'lift readings', itemLabel: 'reading' }),
    prediction: z
      .object({
        envelope: envelopeSchema,
        envelopeMass: envelopeMassSchema,
        gas: gasSchema,
        ambient: ambientSchema,
      })
      .strict()
      .optional()
      .meta({ description: 'The envelope as filled and the air as logged, to compare with' }),
    instrument: instrumentSchema.default(INSTRUMENT_DEFAULTS),
  })
  .strict();

export type LiftMeasurementInput = z.input<typeof liftMeasurementSchema>;

const SQRT3 = Math.sqrt(3);

/**
 * Expanded uncertainty of the measured net lift, k = 2 (about 95 %), after the GUM (JCGM
 * 100:2008): a scale's resolution δ as a rectangular distribution of half-width δ/2, u = δ/(2√3)
 * (F.2.2.1); a ballast's tolerance ±a likewise, u = a/√3 (4.3.7); combined in quadrature (5.1.2).
 */
function deriveLiftUncertainty(
  d: Derivation,
  instrument: { scaleResolutionKg: number; ballastToleranceKg: number },
  readingKind: 'ballast' | 'direct' | undefined,
): number {
  const uScaleKg = instrument.scaleResolutionKg / (2 * SQRT3);
  const uBallastKg = readingKind === 'ballast' ? instrument.ballastToleranceKg / SQRT3 : 0;
  return d.step({
    id: 'lift-uncertainty',
    label: 'Uncertainty of the measured lift (k = 2, about 95 %)',
    formula: readingKind === 'ballast' ? 'U = 2·√((δ/(2√3))² + (a/√3)²)' : 'U = 2·δ/(2√3)',
    values: [
      v('δ', instrument.scaleResolutionKg, 'kg'),
      ...(readingKind === 'ballast' ? [v('a', instrument.ballastToleranceKg, 'kg')] : []),
    ],
    result: v('U', 2 * Math.hypot(uScaleKg, uBallastKg), 'kg'),
    source: 'GUM (JCGM 100:2008) 4.3.7, 5.1.2 and F.2.2.1: rectangular distributions, k = 2',
  });
}

export const liftMeasurementKind = defineKind({
  id: 'lift-measurement',
  title: 'Lift measurement',
  description:
    'Measured net lift from a ballast and a scale reading (or a direct reading), compared with the lift predicted at the logged conditions, the gas purity that would explain the difference, and the loss rate and half-life of lift over a series of readings.',
  schema: liftMeasurementSchema,
  example: {
    readings: [
      { kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.21 },
      { kind: 'ballast', timeS: 86400, ballastMassKg: 0.5, scaleReadingKg: 0.23 },
    ],
  },
  compute(inputs) {
    const d = new Derivation();
    const series = inputs.readings.map((reading, index) => {
      const suffix = inputs.readings.length > 1 ? ` (reading ${index + 1})` : '';
      const id = index === 0 ? 'measured-net-lift' : `measured-net-lift-${index + 1}`;
      const netLiftKg =
        reading.kind === 'ballast'
          ? d.step({
              id,
              label: `Measured net lift${suffix}`,
              formula: 'L_net,measured = m_ballast − m_scale',
              values: [
                v('m_ballast', reading.ballastMassKg, 'kg'),
                v('m_scale', reading.scaleReadingKg, 'kg'),
              ],
              result: v('L_net,measured', reading.ballastMassKg - reading.scaleReadingKg, 'kg'),
              source:
                'force balance on the tethered ballast: the scale carries the ballast less the net lift',
            })
          : d.step({
              id,
              label: `Measured net lift${suffix}`,
              formula: 'L_net,measured = reading',
              values: [],
              result: v('L_net,measured', reading.netLiftKg, 'kg'),
              source: 'measured value, as entered',
            });
      return { timeS: reading.timeS, netLiftKg };
    });
    d.output('measuredNetLift', 'Measured net lift', 'measured-net-lift');
    const measuredKg = series[0]?.netLiftKg ?? 0;
    const uncertaintyKg = deriveLiftUncertainty(d, inputs.instrument, inputs.readings[0]?.kind);
    d.output('measuredUncertainty', 'Uncertainty of the measured lift (k = 2)', 'lift-uncertainty');

    if (inputs.prediction) {
      const predict = (purity: number) =>
        liftCheckKind.compute(
          parseInputs(liftCheckSchema, {
            ...inputs.prediction,
            payloadMassKg: 0,
            gas: { ...inputs.prediction?.gas, purity },
          }),
        ).outputs.netLift?.value ?? Number.NaN;
      const prediction = liftCheckKind.compute(
        parseInputs(liftCheckSchema, { ...inputs.prediction, payloadMassKg: 0 }),
      );
      d.include(prediction);
      const predictedKg = prediction.outputs.netLift?.value ?? Number.NaN;
      d.output(
        'predictedNetLift',
        'Predicted net lift at the logged conditions',
        'net-lift',
        prediction.outputs.netLift?.context,
      );
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
      const surplus = (purity: number) => predict(purity) - measuredKg;
      const pureSurplus = surplus(1);
      const lowSurplus = surplus(MIN_PURITY);
      const withinUncertainty = Math.abs(measuredKg - predictedKg) <= uncertaintyKg;
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
        const purity = findRoot(surplus, MIN_PURITY, 1, { xTolerance: 1e-10 });
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
          values: [
            v('x_low', low * 100, '%'),
            v('x_high', high * 100, '%'),
            v('U', uncertaintyKg, 'kg'),
          ],
          result: v('Δx', ((high - low) / 2) * 100, '%'),
          source: 'the lift check solved at both ends of the measured lift’s uncertainty',
        });
        d.output(
          'explainingPurityUncertainty',
          'Uncertainty of the explaining purity',
          'explaining-purity-uncertainty',
        );
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

    if (series.length >= 2) {
      const fit = fitLiftRetention(series);
      d.step({
        id: 'loss-rate',
        label: 'Loss rate of lift (exponential fit)',
        formula: 'ln L = ln L₀ − k·t (least squares)',
        values: series.map((reading, index) =>
          v(`L(t${index + 1} = ${reading.timeS} s)`, reading.netLiftKg, 'kg'),
        ),
        result: v('k', fit.lossRatePerS * 86400 * 100, '%/day'),
        source: 'least-squares fit of ln L against t (exponential decay)',
      });
      if (Number.isFinite(fit.halfLifeS)) {
        d.step({
          id: 'half-life',
          label: 'Half-life of lift',
          formula: 't½ = ln 2 / k',
          values: [v('k', fit.lossRatePerS, '1/s')],
          result: v('t½', fit.halfLifeS / 86400, 'days'),
          source: 'exponential decay',
        });
        d.output('halfLife', 'Half-life of lift', 'half-life');
      } else {
        d.warn({
          code: 'lift-not-falling',
          severity: 'note',
          message: 'The readings do not fall over time, so no half-life can be given.',
          field: 'readings',
        });
      }
      d.output('lossRate', 'Loss rate of lift', 'loss-rate');
    }
    return d.result();
  },
});
