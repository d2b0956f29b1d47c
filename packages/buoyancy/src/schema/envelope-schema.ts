import * as z from 'zod';
import { ENVELOPE_SIZE_RANGE_M } from '../envelope/envelope-geometry.js';
import { quantity } from './quantity-schema.js';

const size = (description: string) =>
  quantity('length', ENVELOPE_SIZE_RANGE_M.min, ENVELOPE_SIZE_RANGE_M.max, description);

/** An envelope's shape and the measurement it is given by. */
export const envelopeSchema = z
  .discriminatedUnion('shape', [
    z.object({ shape: z.literal('sphere'), diameterM: size('diameter') }).strict(),
    z.object({ shape: z.literal('sphere-radius'), radiusM: size('radius') }).strict(),
    z
      .object({
        shape: z.literal('sphere-circumference'),
        circumferenceM: quantity('length', 0.03, 1600, 'measured circumference at the equator'),
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
        lengthM: quantity(
          'length',
          ENVELOPE_SIZE_RANGE_M.min,
          2000,
          'overall length, ends included',
        ),
      })
      .strict(),
    z
      .object({ shape: z.literal('cushion'), flatDiameterM: size('diameter of each flat disc') })
      .strict(),
    z
      .object({
        shape: z.literal('custom'),
        volumeM3: quantity('volume', 1e-6, 1e7, 'envelope volume'),
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
