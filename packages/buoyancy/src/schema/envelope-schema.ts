import * as z from 'zod';
import { ENVELOPE_SIZE_RANGE_M } from '../envelope/envelope-geometry.js';
import { choice } from './choice-schema.js';
import { quantity } from './quantity-schema.js';
import { type UsualRange, usually } from './usual-range.js';
import { USUAL } from './usual-ranges.js';

/** Measured circumference of a sphere the inputs accept [m]. */
export const CIRCUMFERENCE_RANGE_M = { min: 0.03, max: 1600 } as const;
/** Overall length of a capsule the inputs accept [m]; the geometry also wants it ≥ its diameter. */
export const CAPSULE_LENGTH_RANGE_M = { min: ENVELOPE_SIZE_RANGE_M.min, max: 2000 } as const;

const size = (description: string, usual: UsualRange = USUAL.envelopeAcrossM) =>
  usually(
    quantity('length', ENVELOPE_SIZE_RANGE_M.min, ENVELOPE_SIZE_RANGE_M.max, description),
    usual,
  );

/** Which way a capsule lies as it climbs: it decides the frontal area, and so the drag. */
export const capsuleAxis = choice(
  ['vertical', 'horizontal'],
  (axis) => (axis === 'vertical' ? 'Axis vertical (end first)' : 'Axis horizontal (side first)'),
  'which way its axis lies as it climbs',
).default('vertical');

/** An envelope's shape and the measurement it is given by. */
export const envelopeSchema = z
  .discriminatedUnion('shape', [
    z.object({ shape: z.literal('sphere'), diameterM: size('diameter') }).strict(),
    z
      .object({ shape: z.literal('sphere-radius'), radiusM: size('radius', USUAL.envelopeRadiusM) })
      .strict(),
    z
      .object({
        shape: z.literal('sphere-circumference'),
        circumferenceM: usually(
          quantity(
            'length',
            CIRCUMFERENCE_RANGE_M.min,
            CIRCUMFERENCE_RANGE_M.max,
            'measured circumference at the equator',
          ),
          USUAL.envelopeCircumferenceM,
        ),
      })
      .strict(),
    z
      .object({
        shape: z.literal('spheroid'),
        equatorialDiameterM: size('equatorial (horizontal) diameter'),
        polarDiameterM: size('polar (vertical) diameter'),
      })
      .strict(),
    z
      .object({
        shape: z.literal('capsule'),
        diameterM: size('diameter of the cylinder and its hemispherical ends'),
        lengthM: usually(
          quantity(
            'length',
            CAPSULE_LENGTH_RANGE_M.min,
            CAPSULE_LENGTH_RANGE_M.max,
            'overall length, ends included',
          ),
          USUAL.envelopeLengthM,
        ),
        axis: capsuleAxis,
      })
      .strict(),
    z
      .object({ shape: z.literal('cushion'), flatDiameterM: size('diameter of each flat disc') })
      .strict(),
    z
      .object({
        shape: z.literal('custom'),
        volumeM3: usually(quantity('volume', 1e-6, 1e7, 'envelope volume'), USUAL.envelopeVolumeM3),
        surfaceAreaM2: quantity(
          'area',
          1e-6,
          1e7,
          'envelope surface (default: that of a sphere)',
        ).optional(),
        frontalAreaM2: quantity(
          'area',
          1e-6,
          1e6,
          'area facing the flow (default: that of a sphere)',
        ).optional(),
      })
      .strict(),
  ])
  .meta({ description: 'Envelope shape and size' });

export type EnvelopeInput = z.output<typeof envelopeSchema>;

/** Envelope material: a known mass, or a film whose mass grows with the surface. */
export const envelopeMassSchema = z
  .discriminatedUnion('kind', [
    z
      .object({ kind: z.literal('fixed'), massKg: quantity('mass', 0, 10000, 'envelope mass') })
      .strict(),
    z
      .object({
        kind: z.literal('areal'),
        arealDensityKgM2: quantity(
          'arealDensity',
          0,
          5,
          'mass per square metre of envelope material',
        ),
        fittingsKg: quantity(
          'mass',
          0,
          1000,
          'seams, valves and fittings on top of the film',
        ).default(0),
      })
      .strict(),
  ])
  .meta({ description: 'Envelope mass' });

export type EnvelopeMassInput = z.output<typeof envelopeMassSchema>;
