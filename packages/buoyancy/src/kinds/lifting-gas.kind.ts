import * as z from 'zod';
import { Derivation } from '../derivation.js';
import { ambientSchema } from '../schema/ambient-schema.js';
import { gasSchema } from '../schema/gas-schema.js';
import { deriveAmbient } from '../steps/ambient-steps.js';
import { deriveGas } from '../steps/gas-steps.js';
import { defineKind } from './kind.js';

export const liftingGasSchema = z.object({ gas: gasSchema, ambient: ambientSchema }).strict();

export const liftingGasKind = defineKind({
  id: 'lifting-gas',
  title: 'Lifting gas',
  description:
    'Density of a lifting gas at its own temperature and pressure (superheat, superpressure), with its purity and water vapour, and the lift per cubic metre it gives in the given air.',
  schema: liftingGasSchema,
  example: {
    gas: { gasId: 'hydrogen', purity: 0.98, relativeHumidity: 1 },
    ambient: { mode: 'measured', temperatureK: 291.15, pressurePa: 100800 },
  },
  compute(inputs) {
    const d = new Derivation();
    const air = deriveAmbient(d, inputs.ambient);
    const gas = deriveGas(d, inputs.gas, air);
    d.step({
      id: 'lift-per-cubic-metre',
      label: 'Gross lift per cubic metre of gas',
      formula: 'ℓ = ρ_air − ρ_gas',
      values: [
        { symbol: 'ρ_air', value: air.densityKgM3, unit: 'kg/m³' },
        { symbol: 'ρ_gas', value: gas.densityKgM3, unit: 'kg/m³' },
      ],
      result: { symbol: 'ℓ', value: air.densityKgM3 - gas.densityKgM3, unit: 'kg/m³' },
      source: "Archimedes' principle",
    });
    d.output('airDensity', 'Air density', 'air-density', air.context);
    d.output('gasDensity', 'Gas density', 'gas-density');
    d.output('gasMolarMass', 'Molar mass of the gas', 'gas-molar-mass');
    d.output(
      'liftPerCubicMetre',
      'Gross lift per cubic metre',
      'lift-per-cubic-metre',
      air.context,
    );
    if (air.densityKgM3 <= gas.densityKgM3) {
      d.warn({
        code: 'gas-not-lighter-than-air',
        severity: 'warning',
        message: 'This gas is not lighter than the air: it gives no lift.',
        field: 'gas',
      });
    }
    return d.result();
  },
});
