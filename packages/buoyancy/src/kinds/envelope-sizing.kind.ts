import * as z from 'zod';
import {
  NORMAL_PRESSURE_PA,
  NORMAL_TEMPERATURE_K,
  STANDARD_GRAVITY_M_PER_S2,
} from '../constants.js';
import { Derivation, v } from '../derivation.js';
import { ENVELOPE_SIZE_RANGE_M, type EnvelopeShape } from '../envelope/envelope-geometry.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { findRoot } from '../numerics/find-root.js';
import { ambientSchema } from '../schema/ambient-schema.js';
import { capsuleAxis, envelopeMassSchema, type EnvelopeInput } from '../schema/envelope-schema.js';
import { gasSchema } from '../schema/gas-schema.js';
import { quantity } from '../schema/quantity-schema.js';
import { SOURCES } from '../sources.js';
import { deriveAmbient } from '../steps/ambient-steps.js';
import { deriveGas } from '../steps/gas-steps.js';
import { deriveEnvelopeMass, deriveGeometry } from '../steps/geometry-steps.js';
import { deriveLift } from '../steps/lift-steps.js';
import {
  capsuleGeometry,
  cushionGeometry,
  sphereGeometry,
  spheroidGeometry,
  type EnvelopeGeometry,
} from '../envelope/envelope-geometry.js';
import { DEFAULT_BALLOON_DRAG_COEFFICIENT } from '../flight/drag-defaults.js';
import { defineKind } from './kind.js';
import { warnAboutLift } from './lift-check.kind.js';
import { usually } from '../schema/usual-range.js';
import { USUAL } from '../schema/usual-ranges.js';

const shapeFamilySchema = z
  .discriminatedUnion('shape', [
    z.object({ shape: z.literal('sphere') }).strict(),
    z
      .object({
        shape: z.literal('spheroid'),
        polarToEquatorialRatio: quantity(
          'coefficient',
          0.2,
          5,
          'polar diameter over equatorial diameter (below 1: oblate)',
        ),
      })
      .strict(),
    z
      .object({
        shape: z.literal('capsule'),
        lengthToDiameterRatio: quantity('coefficient', 1, 20, 'overall length over diameter'),
        axis: capsuleAxis,
      })
      .strict(),
    z.object({ shape: z.literal('cushion') }).strict(),
  ])
  .meta({ description: 'Shape of the envelope to size; its proportions stay fixed' });

const targetSchema = z
  .discriminatedUnion('kind', [
    z
      .object({
        kind: z.literal('freeLift'),
        freeLiftKg: quantity('mass', 0, 10000, 'free lift wanted'),
      })
      .strict(),
    z
      .object({
        kind: z.literal('ascentRate'),
        ascentRateMS: usually(
          quantity('velocity', 0.1, 20, 'initial rate of climb wanted'),
          USUAL.ascentRateMS,
        ),
        dragCoefficient: quantity(
          'coefficient',
          0.05,
          2,
          'drag coefficient on the frontal area',
        ).default(DEFAULT_BALLOON_DRAG_COEFFICIENT),
      })
      .strict(),
  ])
  .meta({ description: 'What the envelope must achieve at the fill conditions' });

export const envelopeSizingSchema = z
  .object({
    shape: shapeFamilySchema,
    envelopeMass: envelopeMassSchema,
    payloadMassKg: usually(
      quantity('mass', 0, 10000, 'payload hanging below the envelope'),
      USUAL.payloadMassKg,
    ),
    target: targetSchema,
    gas: gasSchema,
    ambient: ambientSchema,
  })
  .strict();

export type EnvelopeSizingInput = z.input<typeof envelopeSizingSchema>;
/** A sizing's inputs as the kind reads them, defaults filled in. */
export type EnvelopeSizingValues = z.output<typeof envelopeSizingSchema>;
export type ShapeFamily = z.output<typeof shapeFamilySchema>;

/** The envelope of a family at characteristic size s (diameter, equatorial or flat diameter). */
export function envelopeAtSize(family: ShapeFamily, sizeM: number): EnvelopeInput & EnvelopeShape {
  switch (family.shape) {
    case 'sphere':
      return { shape: 'sphere', diameterM: sizeM };
    case 'spheroid':
      return {
        shape: 'spheroid',
        equatorialDiameterM: sizeM,
        polarDiameterM: sizeM * family.polarToEquatorialRatio,
      };
    case 'capsule':
      return {
        shape: 'capsule',
        diameterM: sizeM,
        lengthM: sizeM * family.lengthToDiameterRatio,
        axis: family.axis,
      };
    case 'cushion':
      return { shape: 'cushion', flatDiameterM: sizeM };
  }
}

/** Geometry of the family at size s, unvalidated: the root search passes through small sizes. */
function familyGeometry(family: ShapeFamily, sizeM: number): EnvelopeGeometry {
  switch (family.shape) {
    case 'sphere':
      return sphereGeometry(sizeM);
    case 'spheroid':
      return spheroidGeometry(sizeM, sizeM * family.polarToEquatorialRatio);
    case 'capsule':
      return capsuleGeometry(sizeM, sizeM * family.lengthToDiameterRatio, family.axis);
    case 'cushion':
      return cushionGeometry(sizeM);
  }
}

const SIZE_LABEL: Record<ShapeFamily['shape'], string> = {
  sphere: 'Diameter',
  spheroid: 'Equatorial diameter',
  capsule: 'Diameter',
  cushion: 'Flat diameter of each disc',
};

export const envelopeSizingKind = defineKind({
  id: 'envelope-sizing',
  capabilities: {
    charts: ['sizing-sweep'],
    volumeOutput: 'volume',
    predictsFillLift: false,
    meterImport: false,
    landingArea: false,
    fillCard: true,
  },
  title: 'Envelope sizing',
  description:
    'The size an envelope must have to lift a payload with a wanted free lift or initial ascent rate, its mass when made of a film of given areal density, and the gas it takes.',
  schema: envelopeSizingSchema,
  example: {
    shape: { shape: 'sphere' },
    envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.02 },
    payloadMassKg: 0.5,
    target: { kind: 'freeLift', freeLiftKg: 0.3 },
    gas: { gasId: 'helium' },
    ambient: { mode: 'standard', altitudeM: 200 },
  },
  compute(inputs) {
    const d = new Derivation();
    const ambient = deriveAmbient(d, inputs.ambient);
    const gas = deriveGas(d, inputs.gas, ambient);
    const liftPerVolume = ambient.densityKgM3 - gas.densityKgM3;
    const target = inputs.target;
    const extraFreeLiftKg = (sizeM: number) => {
      if (target.kind === 'freeLift') return target.freeLiftKg;
      const frontalAreaM2 = familyGeometry(inputs.shape, sizeM).frontalAreaM2;
      return (
        (0.5 *
          ambient.densityKgM3 *
          target.ascentRateMS ** 2 *
          target.dragCoefficient *
          frontalAreaM2) /
        STANDARD_GRAVITY_M_PER_S2
      );
    };
    const envelopeKg = (sizeM: number) => {
      if (inputs.envelopeMass.kind === 'fixed') return inputs.envelopeMass.massKg;
      const filmAreaM2 = familyGeometry(inputs.shape, sizeM).filmAreaM2;
      return inputs.envelopeMass.arealDensityKgM2 * filmAreaM2 + inputs.envelopeMass.fittingsKg;
    };
    // Free lift left over at size s: zero at the answer.
    const surplusKg = (sizeM: number) =>
      familyGeometry(inputs.shape, sizeM).volumeM3 * liftPerVolume -
      envelopeKg(sizeM) -
      inputs.payloadMassKg -
      extraFreeLiftKg(sizeM);

    const gasName = GAS_CATALOGUE[inputs.gas.gasId].name;
    if (liftPerVolume <= 0) {
      d.warn({
        code: 'no-size-possible',
        severity: 'warning',
        message: `No size can do this: the ${gasName.toLowerCase()} is not lighter than the air (${gas.densityKgM3.toFixed(4)} against ${ambient.densityKgM3.toFixed(4)} kg/m³), so a bigger envelope only gets heavier.`,
        field: 'gas',
      });
      return d.result();
    }
    const maxSizeM = ENVELOPE_SIZE_RANGE_M.max;
    if (surplusKg(maxSizeM) <= 0) {
      d.warn({
        code: 'no-size-possible',
        severity: 'warning',
        message: `No size up to ${maxSizeM} m can do this: the envelope material grows heavier as fast as the lift does (film too heavy for this gas and air, or the ascent-rate drag too high).`,
        field: inputs.envelopeMass.kind === 'areal' ? 'envelopeMass.arealDensityKgM2' : 'target',
      });
      return d.result();
    }
    // The surplus falls from −(fixed masses) at s → 0 to a minimum, then grows with s³: the root
    // beyond the minimum is the only one, so bracket from the smallest size upwards.
    let lowM: number = ENVELOPE_SIZE_RANGE_M.min;
    let highM = lowM;
    while (surplusKg(highM) <= 0) {
      lowM = highM;
      highM = Math.min(highM * 2, maxSizeM);
    }
    const sizeM =
      surplusKg(lowM) >= 0 ? lowM : findRoot(surplusKg, lowM, highM, { xTolerance: 1e-12 * highM });
    d.step({
      id: 'required-size',
      label: `${SIZE_LABEL[inputs.shape.shape]} needed (solved numerically)`,
      formula:
        target.kind === 'freeLift'
          ? 'V(s)·(ρ_air − ρ_gas) − m_env(s) − m_payload − L_free = 0'
          : 'V(s)·(ρ_air − ρ_gas) − m_env(s) − m_payload − ρ_air·w²·C_d·A(s)/(2·g₀) = 0',
      values: [
        v('ρ_air − ρ_gas', liftPerVolume, 'kg/m³'),
        v('m_payload', inputs.payloadMassKg, 'kg'),
        ...(target.kind === 'freeLift'
          ? [v('L_free', target.freeLiftKg, 'kg')]
          : [v('w', target.ascentRateMS, 'm/s'), v('C_d', target.dragCoefficient, '')]),
      ],
      result: v('s', sizeM, 'm'),
      source:
        "Brent's method on the lift balance (Brent, Algorithms for Minimization without Derivatives, 1973)",
    });
    const geometry = deriveGeometry(d, envelopeAtSize(inputs.shape, sizeM));
    const envelopeMassKg = deriveEnvelopeMass(d, inputs.envelopeMass, geometry);
    const lift = deriveLift(
      d,
      geometry.volumeM3,
      ambient.densityKgM3,
      gas.densityKgM3,
      envelopeMassKg,
      inputs.payloadMassKg,
    );
    d.step({
      id: 'gas-volume-normal',
      label: 'Gas volume at normal conditions (0 °C, 101.325 kPa)',
      formula: 'V_n = V·(p_gas / p_n)·(T_n / T_gas)',
      values: [
        v('V', geometry.volumeM3, 'm³'),
        v('p_gas', gas.pressurePa, 'Pa'),
        v('p_n', NORMAL_PRESSURE_PA, 'Pa'),
        v('T_n', NORMAL_TEMPERATURE_K, 'K'),
        v('T_gas', gas.temperatureK, 'K'),
      ],
      result: v(
        'V_n',
        (geometry.volumeM3 * gas.pressurePa * NORMAL_TEMPERATURE_K) /
          (NORMAL_PRESSURE_PA * gas.temperatureK),
        'm³',
      ),
      source: SOURCES.normalConditions,
    });
    d.output('size', SIZE_LABEL[inputs.shape.shape], 'required-size');
    d.output('volume', 'Envelope volume (gas at fill conditions)', 'volume', ambient.context);
    d.output('surfaceArea', 'Envelope surface area', 'surface-area');
    if (inputs.shape.shape === 'cushion') d.output('filmArea', 'Film cut', 'film-area');
    d.output('envelopeMass', 'Envelope mass', 'envelope-mass');
    d.output('gasVolumeNormal', 'Gas at normal conditions', 'gas-volume-normal');
    d.output('gasMass', 'Gas in the envelope', 'gas-mass');
    d.output('grossLift', 'Gross lift', 'gross-lift', ambient.context);
    d.output('netLift', 'Net lift', 'net-lift', ambient.context);
    d.output('freeLift', 'Free lift', 'free-lift', ambient.context);
    warnAboutLift(d, lift, gasName);
    return d.result();
  },
});
