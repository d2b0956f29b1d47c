import * as z from 'zod';
import { Derivation } from '../derivation.js';
import {
  deriveLiftUncertaintyKg,
  deriveMeasuredLifts,
} from '../measurement/measured-lift-steps.js';
import { deriveComparisonWithPrediction } from '../measurement/prediction-steps.js';
import { deriveLiftRetention } from '../measurement/retention-steps.js';
import { ambientSchema } from '../schema/ambient-schema.js';
import { envelopeMassSchema, envelopeSchema } from '../schema/envelope-schema.js';
import { gasSchema } from '../schema/gas-schema.js';
import { quantity } from '../schema/quantity-schema.js';
import { defineKind } from './kind.js';

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
/** The inputs as the kind reads them, defaults filled in. */
export type LiftMeasurementValues = z.output<typeof liftMeasurementSchema>;

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
    const series = deriveMeasuredLifts(d, inputs.readings);
    const measuredKg = series[0]?.netLiftKg ?? 0;
    const uncertaintyKg = deriveLiftUncertaintyKg(d, inputs.instrument, inputs.readings[0]?.kind);
    if (inputs.prediction) {
      deriveComparisonWithPrediction(d, inputs.prediction, { measuredKg, uncertaintyKg });
    }
    if (series.length >= 2) deriveLiftRetention(d, series);
    return d.result();
  },
});
