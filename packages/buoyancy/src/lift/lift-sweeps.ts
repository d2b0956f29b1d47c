import { AIR_TEMPERATURE_RANGE_K } from '../atmosphere/air-density.js';
import { TEMPERATURE_OFFSET_RANGE_K } from '../atmosphere/standard-atmosphere.js';
import {
  ENVELOPE_SIZE_RANGE_M,
  envelopeGeometry,
  type EnvelopeGeometry,
  type EnvelopeShape,
} from '../envelope/envelope-geometry.js';
import { ComputationError, InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import {
  envelopeAtSize,
  type EnvelopeSizingValues,
  type ShapeFamily,
} from '../kinds/envelope-sizing.kind.js';
import type { LiftCheckValues } from '../kinds/lift-check.kind.js';
import { evaluate, kindCapabilities, normaliseInputs } from '../kinds/registry.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import {
  CAPSULE_LENGTH_RANGE_M,
  CIRCUMFERENCE_RANGE_M,
  type EnvelopeInput,
  type EnvelopeMassInput,
} from '../schema/envelope-schema.js';
import { liftMasses } from '../steps/lift-steps.js';
import type { Dimension } from '../units/dimensions.js';
import { ambientAirNumbers, type AirNumbers, gasDensityInAirKgM3 } from './lift-conditions.js';

/** One point of a sweep, SI units: the varied quantity and the lifts it gives. */
export interface SweepPoint {
  readonly x: number;
  readonly netKg: number;
  readonly freeKg: number;
}

export type LiftSweepId = 'size' | 'air-temperature' | 'purity';

/** What a chart needs: the curve, the design point on it, and what the x axis holds. */
export interface LiftSweep {
  readonly id: LiftSweepId;
  readonly title: string;
  readonly xLabel: string;
  readonly xDimension: Dimension;
  readonly points: readonly SweepPoint[];
  readonly design: SweepPoint;
  /** Free lift the design asks for (sizing), drawn as a reference line. */
  readonly targetFreeKg?: number;
}

/** Even steps across a sweep: 61 points, ends included. */
export const SWEEP_INTERVALS = 60;

/** Results a sweep may read (a sizing's size), as a calculation result carries them. */
export type SweepOutputs = Readonly<Record<string, { readonly value: number } | undefined>>;

/**
 * The lift charts a kind offers (its capabilities' `lift-sweeps` and `sizing-sweep`), computed on
 * the fast path: the inputs are validated once and resolved to SI numbers, then each point costs
 * only the geometry, densities and lift balance it changes. A point the lift check would refuse
 * is left out of its curve; a curve without a design point is left out. Kinds whose inputs cannot
 * be read give none.
 * @param outputs the kind's results, if already computed (a sizing's `size`); without them a
 * sizing is evaluated once to find its size
 */
export function liftSweeps(kindId: string, inputs: unknown, outputs?: SweepOutputs): LiftSweep[] {
  const charts = kindCapabilities(kindId).charts;
  if (!charts.includes('lift-sweeps') && !charts.includes('sizing-sweep')) return [];
  let values: unknown;
  try {
    values = normaliseInputs(kindId, inputs);
  } catch (error) {
    if (error instanceof InputError) return [];
    throw error;
  }
  const sweeps: (LiftSweep | undefined)[] = [];
  if (charts.includes('lift-sweeps')) {
    // A kind offering lift sweeps reads a lift check's inputs.
    const check = values as LiftCheckValues;
    sweeps.push(sizeSweep(check), airTemperatureSweep(check), puritySweep(check));
  }
  if (charts.includes('sizing-sweep')) {
    const sizeM = outputs ? outputs.size?.value : sizeFoundM(kindId, values);
    sweeps.push(sizingSweep(values as EnvelopeSizingValues, sizeM));
  }
  return sweeps.filter((sweep): sweep is LiftSweep => sweep !== undefined);
}

/** The fall-back where no result was given: the sizing itself, once. */
function sizeFoundM(kindId: string, values: unknown): number | undefined {
  return attempt(() => evaluate(kindId, values).outputs.size?.value);
}

/** Runs `compute`, giving undefined where the engine refuses the inputs or the result. */
function attempt<T>(compute: () => T): T | undefined {
  try {
    return compute();
  } catch (error) {
    if (error instanceof InputError || error instanceof ComputationError) return undefined;
    throw error;
  }
}

const within = (value: number, range: { readonly min: number; readonly max: number }) =>
  value >= range.min && value <= range.max;

/** The envelope and payload of a lift check, resolved once for a sweep that keeps them. */
interface Envelope {
  readonly volumeM3: number;
  readonly envelopeMassKg: number;
  readonly payloadMassKg: number;
}

/** Net and free lift of an envelope in air of `airDensityKgM3` with gas of `gasDensityKgM3`. */
function liftPoint(
  x: number,
  envelope: Envelope,
  airDensityKgM3: number,
  gasDensityKgM3: number,
): SweepPoint | undefined {
  const lift = liftMasses(
    envelope.volumeM3,
    airDensityKgM3,
    gasDensityKgM3,
    envelope.envelopeMassKg,
    envelope.payloadMassKg,
  );
  // The lift check refuses a result that is not a finite number; so does the curve.
  if (!Number.isFinite(lift.netLiftKg) || !Number.isFinite(lift.freeLiftKg)) return undefined;
  return { x, netKg: lift.netLiftKg, freeKg: lift.freeLiftKg };
}

/** `SWEEP_INTERVALS` even steps from `from` to `to`; refused points are left out. */
function sampled(
  from: number,
  to: number,
  pointAt: (value: number) => SweepPoint | undefined,
): SweepPoint[] {
  const points: SweepPoint[] = [];
  for (let index = 0; index <= SWEEP_INTERVALS; index += 1) {
    const point = attempt(() => pointAt(from + ((to - from) * index) / SWEEP_INTERVALS));
    if (point) points.push(point);
  }
  return points;
}

/** The sphere variants as a diameter, as the lift check's geometry step reduces them. */
function shapeOf(envelope: EnvelopeInput): EnvelopeShape {
  switch (envelope.shape) {
    case 'sphere-radius':
      return { shape: 'sphere', diameterM: 2 * envelope.radiusM };
    case 'sphere-circumference':
      return { shape: 'sphere', diameterM: envelope.circumferenceM / Math.PI };
    default:
      return envelope;
  }
}

/** The envelope's mass: as weighed, or film per area times its cut plus fittings [kg]. */
function envelopeMassKg(mass: EnvelopeMassInput, geometry: EnvelopeGeometry): number {
  return mass.kind === 'fixed'
    ? mass.massKg
    : mass.arealDensityKgM2 * geometry.filmAreaM2 + mass.fittingsKg;
}

/** The envelope's volume and mass, with the payload: what a sweep that keeps it holds fixed. */
function resolvedEnvelope(
  envelope: EnvelopeInput,
  mass: EnvelopeMassInput,
  payloadMassKg: number,
): Envelope {
  const geometry = envelopeGeometry(shapeOf(envelope));
  return {
    volumeM3: geometry.volumeM3,
    envelopeMassKg: envelopeMassKg(mass, geometry),
    payloadMassKg,
  };
}

/** Air and gas of a lift check resolved once, for sweeps that keep them. */
function resolvedAir(ambient: AmbientInput, gas: LiftCheckValues['gas']) {
  const air = ambientAirNumbers(ambient);
  return { air, gasDensityKgM3: gasDensityInAirKgM3(gas, air) };
}

type Lengths = Readonly<Record<string, number>>;

/**
 * The envelope's leading dimension (what its size is read by) and the lengths that scale with it.
 * Custom volumes have no length.
 */
const ENVELOPE_SCALING: Readonly<
  Record<string, { label: string; lead: string; others: readonly string[] } | undefined>
> = {
  sphere: { label: 'Diameter', lead: 'diameterM', others: [] },
  'sphere-radius': { label: 'Radius', lead: 'radiusM', others: [] },
  'sphere-circumference': { label: 'Circumference', lead: 'circumferenceM', others: [] },
  spheroid: {
    label: 'Equatorial diameter',
    lead: 'equatorialDiameterM',
    others: ['polarDiameterM'],
  },
  capsule: { label: 'Diameter', lead: 'diameterM', others: ['lengthM'] },
  cushion: { label: 'Flat diameter', lead: 'flatDiameterM', others: [] },
};

/** The range the inputs accept for each length a size sweep scales [m]. */
const LENGTH_RANGE_M: Readonly<Record<string, { min: number; max: number }>> = {
  circumferenceM: CIRCUMFERENCE_RANGE_M,
  lengthM: CAPSULE_LENGTH_RANGE_M,
};

/** Net and free lift of the same design made bigger or smaller (0.4× to 2× its size). */
export function sizeSweep(inputs: LiftCheckValues): LiftSweep | undefined {
  const scaling = ENVELOPE_SCALING[inputs.envelope.shape];
  const lengths = inputs.envelope as unknown as Lengths;
  const sizeM = scaling ? (lengths[scaling.lead] ?? Number.NaN) : Number.NaN;
  if (!scaling || !(sizeM > 0)) return undefined;
  const conditions = attempt(() => resolvedAir(inputs.ambient, inputs.gas));
  if (!conditions) return undefined;
  const { air, gasDensityKgM3 } = conditions;
  const liftOf = (envelope: EnvelopeInput, x: number) =>
    liftPoint(
      x,
      resolvedEnvelope(envelope, inputs.envelopeMass, inputs.payloadMassKg),
      air.densityKgM3,
      gasDensityKgM3,
    );
  const design = attempt(() => liftOf(inputs.envelope, sizeM));
  if (!design) return undefined;
  const scaledTo = (size: number) => {
    const factor = size / sizeM;
    const scaled: Record<string, unknown> = { ...inputs.envelope, [scaling.lead]: size };
    for (const other of scaling.others) scaled[other] = (lengths[other] ?? Number.NaN) * factor;
    const fits = [scaling.lead, ...scaling.others].every((name) =>
      within(scaled[name] as number, LENGTH_RANGE_M[name] ?? ENVELOPE_SIZE_RANGE_M),
    );
    return fits ? (scaled as unknown as EnvelopeInput) : undefined;
  };
  return {
    id: 'size',
    title: `Lift against ${scaling.label.toLowerCase()}`,
    xLabel: scaling.label,
    xDimension: 'length',
    design,
    points: sampled(0.4 * sizeM, 2 * sizeM, (size) => {
      const envelope = scaledTo(size);
      return envelope ? liftOf(envelope, size) : undefined;
    }),
  };
}

/** How far either side of the design's air temperature the temperature sweep reaches [K]. */
const TEMPERATURE_SPAN_K = 25;

/**
 * Lift of the design on colder and warmer days, 25 K either side. The gas keeps its superheat
 * over the air, so this is the whole fill warming or cooling; measured air keeps its pressure,
 * standard air moves its temperature offset (ISA + ΔT). Each point computes the air anew.
 */
export function airTemperatureSweep(inputs: LiftCheckValues): LiftSweep | undefined {
  const ambient = inputs.ambient;
  const envelope = attempt(() =>
    resolvedEnvelope(inputs.envelope, inputs.envelopeMass, inputs.payloadMassKg),
  );
  if (!envelope) return undefined;
  const liftIn = (air: AirNumbers) =>
    liftPoint(air.temperatureK, envelope, air.densityKgM3, gasDensityInAirKgM3(inputs.gas, air));
  const design = attempt(() => liftIn(ambientAirNumbers(ambient)));
  if (!design) return undefined;
  let points: SweepPoint[];
  if (ambient.mode === 'measured') {
    const range = AIR_TEMPERATURE_RANGE_K;
    points = sampled(
      Math.max(range.min, ambient.temperatureK - TEMPERATURE_SPAN_K),
      Math.min(range.max, ambient.temperatureK + TEMPERATURE_SPAN_K),
      (temperatureK) =>
        within(temperatureK, range)
          ? liftIn(ambientAirNumbers({ ...ambient, temperatureK }))
          : undefined,
    );
  } else {
    const range = TEMPERATURE_OFFSET_RANGE_K;
    const offsetK = ambient.temperatureOffsetK;
    points = sampled(
      Math.max(range.min, offsetK - TEMPERATURE_SPAN_K),
      Math.min(range.max, offsetK + TEMPERATURE_SPAN_K),
      (temperatureOffsetK) =>
        within(temperatureOffsetK, range)
          ? liftIn(ambientAirNumbers({ ...ambient, temperatureOffsetK }))
          : undefined,
    );
  }
  return {
    id: 'air-temperature',
    title: 'Lift against air temperature',
    xLabel: 'Air temperature',
    xDimension: 'temperature',
    design,
    points,
  };
}

/** Lift of the design as the gas is diluted with air, from 50 % (the engine's floor) to pure. */
export function puritySweep(inputs: LiftCheckValues): LiftSweep | undefined {
  const gas = inputs.gas;
  // Heated air is air: its purity means nothing.
  if (GAS_CATALOGUE[gas.gasId].isHeatedAir) return undefined;
  const resolved = attempt(() => ({
    air: ambientAirNumbers(inputs.ambient),
    envelope: resolvedEnvelope(inputs.envelope, inputs.envelopeMass, inputs.payloadMassKg),
  }));
  if (!resolved) return undefined;
  const { air, envelope } = resolved;
  const liftAt = (purity: number) =>
    within(purity, { min: MIN_PURITY, max: 1 })
      ? liftPoint(purity, envelope, air.densityKgM3, gasDensityInAirKgM3({ ...gas, purity }, air))
      : undefined;
  const design = attempt(() => liftAt(gas.purity));
  if (!design) return undefined;
  return {
    id: 'purity',
    title: 'Lift against gas purity',
    xLabel: 'Gas purity',
    xDimension: 'fraction',
    design,
    points: sampled(MIN_PURITY, 1, liftAt),
  };
}

const SIZING_LABEL: Record<ShapeFamily['shape'], string> = {
  sphere: 'Diameter',
  spheroid: 'Equatorial diameter',
  capsule: 'Diameter',
  cushion: 'Flat diameter',
};

/**
 * For a sizing, the lift check of envelopes around the size found (0.5× to 1.6×): the curve
 * crosses the free lift wanted at the answer, so the chart shows how much a size off the answer
 * costs or gains.
 */
export function sizingSweep(
  inputs: EnvelopeSizingValues,
  requiredSizeM: number | undefined,
): LiftSweep | undefined {
  if (requiredSizeM === undefined || !(requiredSizeM > 0)) return undefined;
  const conditions = attempt(() => resolvedAir(inputs.ambient, inputs.gas));
  if (!conditions) return undefined;
  const { air, gasDensityKgM3 } = conditions;
  const liftAt = (sizeM: number) =>
    liftPoint(
      sizeM,
      resolvedEnvelope(
        envelopeAtSize(inputs.shape, sizeM),
        inputs.envelopeMass,
        inputs.payloadMassKg,
      ),
      air.densityKgM3,
      gasDensityKgM3,
    );
  const design = attempt(() => liftAt(requiredSizeM));
  if (!design) return undefined;
  return {
    id: 'size',
    title: 'Lift against size, around the size found',
    xLabel: SIZING_LABEL[inputs.shape.shape],
    xDimension: 'length',
    design,
    ...(inputs.target.kind === 'freeLift' ? { targetFreeKg: inputs.target.freeLiftKg } : {}),
    points: sampled(0.5 * requiredSizeM, 1.6 * requiredSizeM, liftAt),
  };
}
