import { evaluate, standardAtmosphere, type Dimension } from '@loftwright/buoyancy';

/** One point of a sweep, SI units: the varied quantity and the lifts it gives. */
export interface SweepPoint {
  x: number;
  netKg: number;
  freeKg: number;
}

/** What a chart needs: the curve, the design point on it, and what the x axis holds. */
export interface LiftSweep {
  id: 'size' | 'air-temperature' | 'purity';
  title: string;
  xLabel: string;
  xDimension: Dimension;
  points: SweepPoint[];
  design: SweepPoint;
  /** Free lift the design asks for (sizing), drawn as a reference line. */
  targetFreeKg?: number;
}

type Inputs = Record<string, unknown>;
type Envelope = Record<string, unknown> & { shape?: string };

const SAMPLES = 60;

/** Runs the lift check on changed inputs; a point the engine refuses is left out of the curve. */
function liftAt(inputs: Inputs, x: number): SweepPoint | undefined {
  try {
    const { outputs } = evaluate('lift-check', inputs);
    const netKg = outputs.netLift?.value;
    const freeKg = outputs.freeLift?.value;
    if (netKg === undefined || freeKg === undefined) return undefined;
    return { x, netKg, freeKg };
  } catch {
    return undefined;
  }
}

function sweep(
  from: number,
  to: number,
  inputsAt: (value: number) => { inputs: Inputs; x: number },
): SweepPoint[] {
  const points: SweepPoint[] = [];
  for (let index = 0; index <= SAMPLES; index += 1) {
    const { inputs, x } = inputsAt(from + ((to - from) * index) / SAMPLES);
    const point = liftAt(inputs, x);
    if (point) points.push(point);
  }
  return points;
}

/**
 * The envelope's leading dimension (what its size is read by) and a copy scaled so that
 * dimension is `sizeM`, every other length in proportion. Custom volumes have no length.
 */
const ENVELOPE_SCALING: Record<
  string,
  { label: string; lead: string; others: readonly string[] } | undefined
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

function scaledEnvelope(envelope: Envelope, sizeM: number): Envelope {
  const scaling = ENVELOPE_SCALING[envelope.shape ?? ''];
  if (!scaling) return envelope;
  const factor = sizeM / Number(envelope[scaling.lead]);
  const scaled: Envelope = { ...envelope, [scaling.lead]: sizeM };
  for (const other of scaling.others) scaled[other] = Number(envelope[other]) * factor;
  return scaled;
}

/** Net and free lift of the same design made bigger or smaller (0.4× to 2× its size). */
export function sizeSweep(inputs: Inputs): LiftSweep | undefined {
  const envelope = inputs.envelope as Envelope | undefined;
  const scaling = ENVELOPE_SCALING[envelope?.shape ?? ''];
  const sizeM = scaling && envelope ? Number(envelope[scaling.lead]) : Number.NaN;
  if (!scaling || !envelope || !(sizeM > 0)) return undefined;
  const design = liftAt(inputs, sizeM);
  if (!design) return undefined;
  return {
    id: 'size',
    title: `Lift against ${scaling.label.toLowerCase()}`,
    xLabel: scaling.label,
    xDimension: 'length',
    design,
    points: sweep(0.4 * sizeM, 2 * sizeM, (size) => ({
      inputs: { ...inputs, envelope: scaledEnvelope(envelope, size) },
      x: size,
    })),
  };
}

const TEMPERATURE_SPAN_K = 25;

/**
 * Lift of the design on colder and warmer days, 25 K either side. The gas keeps its superheat
 * over the air, so this is the whole fill warming or cooling; measured air keeps its pressure,
 * standard air moves its temperature offset (ISA + ΔT).
 */
export function airTemperatureSweep(inputs: Inputs): LiftSweep | undefined {
  const ambient = inputs.ambient as Record<string, unknown> & { mode?: string };
  let airTemperatureK: number;
  let at: (value: number) => { inputs: Inputs; x: number };
  let range: [number, number];
  if (ambient.mode === 'measured') {
    airTemperatureK = Number(ambient.temperatureK);
    range = [
      Math.max(173.15, airTemperatureK - TEMPERATURE_SPAN_K),
      Math.min(423.15, airTemperatureK + TEMPERATURE_SPAN_K),
    ];
    at = (temperatureK) => ({
      inputs: { ...inputs, ambient: { ...ambient, temperatureK } },
      x: temperatureK,
    });
  } else if (ambient.mode === 'standard') {
    const offsetK = Number(ambient.temperatureOffsetK ?? 0);
    let standardK: number;
    try {
      standardK = standardAtmosphere(Number(ambient.altitudeM)).temperatureK;
    } catch {
      return undefined;
    }
    airTemperatureK = standardK + offsetK;
    range = [
      Math.max(-60, offsetK - TEMPERATURE_SPAN_K),
      Math.min(60, offsetK + TEMPERATURE_SPAN_K),
    ];
    at = (temperatureOffsetK) => ({
      inputs: { ...inputs, ambient: { ...ambient, temperatureOffsetK } },
      x: standardK + temperatureOffsetK,
    });
  } else {
    return undefined;
  }
  const design = liftAt(inputs, airTemperatureK);
  if (!design) return undefined;
  return {
    id: 'air-temperature',
    title: 'Lift against air temperature',
    xLabel: 'Air temperature',
    xDimension: 'temperature',
    design,
    points: sweep(range[0], range[1], at),
  };
}

/** Lift of the design as the gas is diluted with air, from 50 % (the engine's floor) to pure. */
export function puritySweep(inputs: Inputs): LiftSweep | undefined {
  const gas = inputs.gas as Record<string, unknown> & { gasId?: string };
  // Hot air is air: its purity means nothing.
  if (!gas.gasId || gas.gasId === 'hot-air') return undefined;
  const purity = Number(gas.purity ?? 1);
  const design = liftAt(inputs, purity);
  if (!design) return undefined;
  return {
    id: 'purity',
    title: 'Lift against gas purity',
    xLabel: 'Gas purity',
    xDimension: 'fraction',
    design,
    points: sweep(0.5, 1, (value) => ({
      inputs: { ...inputs, gas: { ...gas, purity: value } },
      x: value,
    })),
  };
}

const SIZING_ENVELOPE: Record<string, ((sizeM: number, shape: Inputs) => Envelope) | undefined> = {
  sphere: (diameterM) => ({ shape: 'sphere', diameterM }),
  spheroid: (sizeM, shape) => ({
    shape: 'spheroid',
    equatorialDiameterM: sizeM,
    polarDiameterM: sizeM * Number(shape.polarToEquatorialRatio),
  }),
  capsule: (sizeM, shape) => ({
    shape: 'capsule',
    diameterM: sizeM,
    lengthM: sizeM * Number(shape.lengthToDiameterRatio),
  }),
  cushion: (flatDiameterM) => ({ shape: 'cushion', flatDiameterM }),
};

/**
 * For a sizing, the lift check of envelopes around the size found: the curve crosses the free
 * lift wanted at the answer, so the chart shows how much a size off the answer costs or gains.
 */
export function sizingSweep(
  inputs: Inputs,
  requiredSizeM: number | undefined,
): LiftSweep | undefined {
  const shape = inputs.shape as Inputs & { shape?: string };
  const makeEnvelope = SIZING_ENVELOPE[shape.shape ?? ''];
  if (!makeEnvelope || requiredSizeM === undefined || !(requiredSizeM > 0)) return undefined;
  const check = (sizeM: number) => ({
    inputs: {
      envelope: makeEnvelope(sizeM, shape),
      envelopeMass: inputs.envelopeMass,
      payloadMassKg: inputs.payloadMassKg,
      gas: inputs.gas,
      ambient: inputs.ambient,
    },
    x: sizeM,
  });
  const designCheck = check(requiredSizeM);
  const design = liftAt(designCheck.inputs, requiredSizeM);
  if (!design) return undefined;
  const target = inputs.target as { kind?: string; freeLiftKg?: number } | undefined;
  return {
    id: 'size',
    title: 'Lift against size, around the size found',
    xLabel:
      shape.shape === 'spheroid'
        ? 'Equatorial diameter'
        : shape.shape === 'cushion'
          ? 'Flat diameter'
          : 'Diameter',
    xDimension: 'length',
    design,
    targetFreeKg: target?.kind === 'freeLift' ? target.freeLiftKg : undefined,
    points: sweep(0.5 * requiredSizeM, 1.6 * requiredSizeM, check),
  };
}
