import * as z from 'zod';
import { Derivation } from '../derivation.js';
import { ambientSchema } from '../schema/ambient-schema.js';
import { envelopeMassSchema, envelopeSchema } from '../schema/envelope-schema.js';
import { gasSchema } from '../schema/gas-schema.js';
import { quantity } from '../schema/quantity-schema.js';
import { deriveAmbient } from '../steps/ambient-steps.js';
import { deriveGas } from '../steps/gas-steps.js';
import { deriveEnvelopeMass, deriveGeometry } from '../steps/geometry-steps.js';
import { deriveLift, type LiftMasses } from '../steps/lift-steps.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { defineKind } from './kind.js';
import { usually } from '../schema/usual-range.js';
import { USUAL } from '../schema/usual-ranges.js';

export const liftCheckSchema = z
  .object({
    envelope: envelopeSchema,
    envelopeMass: envelopeMassSchema,
    payloadMassKg: usually(
      quantity('mass', 0, 10000, 'payload hanging below the envelope'),
      USUAL.payloadMassKg,
    ),
    gas: gasSchema,
    ambient: ambientSchema,
  })
  .strict();

export type LiftCheckInput = z.input<typeof liftCheckSchema>;
/** A lift check's inputs as the kind reads them, defaults filled in. */
export type LiftCheckValues = z.output<typeof liftCheckSchema>;

/** Superpressure above which the lift check notes the ideal-gas error (one atmosphere) [Pa]. */
const IDEAL_GAS_NOTE_SUPERPRESSURE_PA = 101325;

/** Warnings about a lift result that every lift-based kind shares. */
export function warnAboutLift(d: Derivation, lift: LiftMasses, gasName: string): void {
  if (lift.grossLiftKg <= 0) {
    d.warn({
      code: 'gas-not-lighter-than-air',
      severity: 'warning',
      message: `The ${gasName.toLowerCase()} in the envelope is not lighter than the surrounding air, so it gives no lift.`,
      field: 'gas',
    });
  } else if (lift.netLiftKg < 0) {
    d.warn({
      code: 'net-lift-negative',
      severity: 'warning',
      message: `The envelope is heavier than its gross lift by ${(-lift.netLiftKg * 1000).toFixed(1)} g: it will not rise even without a payload.`,
      field: 'envelopeMass',
    });
  } else if (lift.freeLiftKg < 0) {
    d.warn({
      code: 'free-lift-negative',
      severity: 'warning',
      message: `Free lift is negative (${(lift.freeLiftKg * 1000).toFixed(1)} g): the envelope cannot carry this payload.`,
      field: 'payloadMassKg',
    });
  }
}

export const liftCheckKind = defineKind({
  id: 'lift-check',
  capabilities: {
    charts: ['lift-sweeps'],
    volumeOutput: 'volume',
    predictsFillLift: true,
    meterImport: false,
    landingArea: false,
  },
  title: 'Lift check',
  description:
    'Gross, net and free lift of a given envelope, gas and payload in the given air, with the masses of displaced air and gas.',
  schema: liftCheckSchema,
  example: {
    envelope: { shape: 'sphere', diameterM: 1.2 },
    envelopeMass: { kind: 'fixed', massKg: 0.18 },
    payloadMassKg: 0.35,
    gas: { gasId: 'helium' },
    ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
  },
  compute(inputs) {
    const d = new Derivation();
    const ambient = deriveAmbient(d, inputs.ambient);
    const gas = deriveGas(d, inputs.gas, ambient);
    const geometry = deriveGeometry(d, inputs.envelope);
    const envelopeMassKg = deriveEnvelopeMass(d, inputs.envelopeMass, geometry);
    const lift = deriveLift(
      d,
      geometry.volumeM3,
      ambient.densityKgM3,
      gas.densityKgM3,
      envelopeMassKg,
      inputs.payloadMassKg,
    );
    const context = ambient.context;
    d.output('airDensity', 'Air density', 'air-density', context);
    d.output('gasDensity', 'Gas density', 'gas-density');
    d.output('volume', 'Envelope volume', 'volume');
    d.output('surfaceArea', 'Envelope surface area', 'surface-area');
    if (inputs.envelope.shape === 'cushion') d.output('filmArea', 'Film cut', 'film-area');
    d.output('frontalArea', 'Frontal area', 'frontal-area');
    d.output('envelopeMass', 'Envelope mass', 'envelope-mass');
    d.output('displacedAirMass', 'Displaced air', 'displaced-air-mass', context);
    d.output('gasMass', 'Gas in the envelope', 'gas-mass');
    d.output('grossLift', 'Gross lift', 'gross-lift', context);
    d.output('netLift', 'Net lift', 'net-lift', context);
    d.output('freeLift', 'Free lift', 'free-lift', context);
    d.output('grossLiftForce', 'Gross lift force', 'gross-lift-force');
    d.output('netLiftForce', 'Net lift force', 'net-lift-force');
    d.output('freeLiftForce', 'Free lift force', 'free-lift-force');
    d.output('liftPerLitre', 'Gross lift per litre', 'lift-per-litre', context);
    warnAboutLift(d, lift, GAS_CATALOGUE[inputs.gas.gasId].name);
    if (inputs.gas.superpressurePa > IDEAL_GAS_NOTE_SUPERPRESSURE_PA) {
      d.warn({
        code: 'ideal-gas-at-pressure',
        severity: 'note',
        message:
          'The gas is held well above ambient pressure: its ideal-gas density is off by about 0.05 % per atmosphere of superpressure (compressibility of H₂ and He).',
        field: 'gas.superpressurePa',
      });
    }
    return d.result();
  },
});
