import * as z from 'zod';
import { Derivation } from '../derivation.js';
import { ambientSchema } from '../schema/ambient-schema.js';
import { deriveAmbient } from '../steps/ambient-steps.js';
import { defineKind } from './kind.js';

export const ambientAirSchema = z.object({ ambient: ambientSchema }).strict();

export const ambientAirKind = defineKind({
  id: 'ambient-air',
  title: 'Ambient air',
  description:
    'Temperature, pressure and density of the air: the 1976 standard atmosphere at an altitude (with an optional temperature offset), or measured values, dry or humid.',
  schema: ambientAirSchema,
  example: {
    ambient: {
      mode: 'standard',
      altitudeM: 1500,
      temperatureOffsetK: 5,
      humidity: { kind: 'relative', relativeHumidity: 0.6 },
    },
  },
  compute(inputs) {
    const d = new Derivation();
    const air = deriveAmbient(d, inputs.ambient);
    d.output('temperature', 'Air temperature', 'air-temperature');
    d.output('pressure', 'Air pressure', 'air-pressure');
    d.output('density', 'Air density', 'air-density', air.context);
    if (air.vapourMoleFraction > 0)
      d.output('vapourMoleFraction', 'Water vapour (mole fraction)', 'vapour-mole-fraction');
    return d.result();
  },
});
