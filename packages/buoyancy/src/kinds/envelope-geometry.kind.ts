import * as z from 'zod';
import { Derivation } from '../derivation.js';
import { envelopeSchema } from '../schema/envelope-schema.js';
import { deriveGeometry } from '../steps/geometry-steps.js';
import { defineKind } from './kind.js';

export const envelopeGeometrySchema = z.object({ envelope: envelopeSchema }).strict();

export const envelopeGeometryKind = defineKind({
  id: 'envelope-geometry',
  capabilities: {
    charts: [],
    volumeOutput: 'volume',
    predictsFillLift: false,
    meterImport: false,
    landingArea: false,
  },
  title: 'Envelope geometry',
  description:
    'Volume, surface area and frontal area of a sphere (from diameter, radius or circumference), spheroid, capsule, two-disc cushion or a custom volume.',
  schema: envelopeGeometrySchema,
  example: { envelope: { shape: 'cushion', flatDiameterM: 0.9 } },
  compute(inputs) {
    const d = new Derivation();
    deriveGeometry(d, inputs.envelope);
    if (
      inputs.envelope.shape === 'sphere-radius' ||
      inputs.envelope.shape === 'sphere-circumference'
    ) {
      d.output('diameter', 'Diameter', 'diameter');
    }
    d.output('volume', 'Volume', 'volume');
    d.output('surfaceArea', 'Surface area', 'surface-area');
    d.output('frontalArea', 'Frontal area', 'frontal-area');
    return d.result();
  },
});
