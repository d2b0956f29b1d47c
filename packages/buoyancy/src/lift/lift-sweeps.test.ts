import { describe, expect, it } from 'vitest';
import { standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { InputError } from '../errors.js';
import type { EnvelopeSizingValues } from '../kinds/envelope-sizing.kind.js';
import type { LiftCheckValues } from '../kinds/lift-check.kind.js';
import { evaluate, KINDS, normaliseInputs } from '../kinds/registry.js';
import {
  airTemperatureSweep,
  type LiftSweep,
  liftSweeps,
  puritySweep,
  sizeSweep,
  sizingSweep,
  SWEEP_INTERVALS,
  type SweepPoint,
} from './lift-sweeps.js';

type Inputs = Record<string, unknown>;

const ENVELOPE_KG = 0.12;
const PAYLOAD_KG = 0.25;
const liftCheck = (overrides: Inputs = {}) =>
  normaliseInputs('lift-check', {
    envelope: { shape: 'sphere', diameterM: 1.4 },
    envelopeMass: { kind: 'fixed', massKg: ENVELOPE_KG },
    payloadMassKg: PAYLOAD_KG,
    gas: { gasId: 'hydrogen', purity: 0.97 },
    ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
    ...overrides,
  }) as LiftCheckValues;
const sizing = (overrides: Inputs = {}) =>
  normaliseInputs('envelope-sizing', {
    shape: { shape: 'spheroid', polarToEquatorialRatio: 0.8 },
    envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.02 },
    payloadMassKg: 0.5,
    target: { kind: 'freeLift', freeLiftKg: 0.3 },
    gas: { gasId: 'helium' },
    ambient: { mode: 'standard', altitudeM: 200 },
    ...overrides,
  }) as EnvelopeSizingValues;
const gross = (point: { netKg: number }) => point.netKg + ENVELOPE_KG;

describe('lift sweeps for the charts: physics', () => {
  it('puts the design point on the curve the lift check gives for the same inputs', () => {
    const inputs = liftCheck();
    const sweep = sizeSweep(inputs);
    const direct = evaluate('lift-check', inputs).outputs;
    expect(sweep?.design.x).toBe(1.4);
    expect(sweep?.design.freeKg).toBeCloseTo(direct.freeLift?.value ?? Number.NaN, 12);
    expect(sweep?.points).toHaveLength(SWEEP_INTERVALS + 1);
  });

  it('grows gross lift with the cube of the diameter', () => {
    // Sphere volume πd³/6 (Euclid, Elements XII.18: spheres are to each other as the cubes of
    // their diameters); the displaced air less the gas scales with it.
    const sweep = sizeSweep(liftCheck());
    const first = sweep?.points[0];
    const last = sweep?.points.at(-1);
    if (!first || !last) throw new Error('no points');
    expect(gross(last) / gross(first)).toBeCloseTo((last.x / first.x) ** 3, 9);
  });

  it('scales every length of a capsule together', () => {
    // A capsule with every length scaled by k has k³ its volume (similar solids: Euclid XII.18).
    const sweep = sizeSweep(
      liftCheck({ envelope: { shape: 'capsule', diameterM: 0.8, lengthM: 2.4 } }),
    );
    const first = sweep?.points[0];
    const last = sweep?.points.at(-1);
    if (!first || !last) throw new Error('no points');
    expect(gross(last) / gross(first)).toBeCloseTo((last.x / first.x) ** 3, 9);
  });

  it('lowers lift in inverse proportion to the absolute air temperature at fixed pressure', () => {
    // Ideal-gas law (Charles's law): at fixed pressure ρ ∝ 1/T for air and gas alike, so the
    // gross lift ρ_air − ρ_gas of a fixed volume times T stays constant. The engine's CIPM-2007
    // compressibility of air (Z ≈ 0.9996 at 15 °C, nearer 1 when warmer) moves ρ·T by about 5e-4
    // over the 50 K span; the ideal law is held to 1e-3.
    const points = airTemperatureSweep(liftCheck())?.points ?? [];
    expect(points.length).toBeGreaterThan(50);
    const first = points[0] ?? { x: 0, netKg: 0, freeKg: 0 };
    const constant = gross(first) * first.x;
    for (const point of points)
      expect(Math.abs((gross(point) * point.x) / constant - 1)).toBeLessThan(1e-3);
    expect(gross(first)).toBeGreaterThan(gross(points.at(-1) ?? first));
    expect(first.x).toBeCloseTo(288.15 - 25, 9);
  });

  it('reads a standard day at its altitude as the air temperature', () => {
    const sweep = airTemperatureSweep(
      liftCheck({ ambient: { mode: 'standard', altitudeM: 0, temperatureOffsetK: 5 } }),
    );
    // US Standard Atmosphere 1976, Table I: 288.15 K at sea level.
    expect(sweep?.design.x).toBeCloseTo(288.15 + 5, 9);
  });

  it('makes dry gross lift proportional to purity when the impurity is air', () => {
    // Ideal mixture (Dalton/Amagat): ρ_mix = x·ρ_gas + (1 − x)·ρ_air, so ρ_air − ρ_mix =
    // x·(ρ_air − ρ_gas); the air's CIPM-2007 compressibility, which the gas does not share,
    // leaves about 2e-4.
    const sweep = puritySweep(liftCheck());
    const pure = sweep?.points.at(-1);
    const half = sweep?.points[0];
    if (!pure || !half) throw new Error('no points');
    expect(half.x).toBe(0.5);
    expect(pure.x).toBe(1);
    expect(Math.abs(gross(half) / gross(pure) - 0.5)).toBeLessThan(5e-4);
    expect(sweep?.design.x).toBe(0.97);
  });

  it('draws no purity chart for hot air', () => {
    expect(puritySweep(liftCheck({ gas: { gasId: 'hot-air', superheatK: 80 } }))).toBeUndefined();
  });

  it('crosses the wanted free lift at the size the sizing found', () => {
    // The sizing solves V(s)·(ρ_air − ρ_gas) − m_env(s) − m_payload = L_free (Brent 1973); the
    // lift check of the envelope it found must give that free lift back.
    const inputs = sizing();
    const size = evaluate('envelope-sizing', inputs).outputs.size?.value;
    const sweep = sizingSweep(inputs, size);
    expect(sweep?.targetFreeKg).toBe(0.3);
    expect(sweep?.design.freeKg).toBeCloseTo(0.3, 6);
    expect(sweep?.xLabel).toBe('Equatorial diameter');
  });
});

/** Net and free lift of the full lift check (validation and derivation), or undefined if refused. */
function checked(inputs: Inputs): SweepPoint | undefined {
  try {
    const { outputs } = evaluate('lift-check', inputs);
    const netKg = outputs.netLift?.value;
    const freeKg = outputs.freeLift?.value;
    return netKg === undefined || freeKg === undefined ? undefined : { x: 0, netKg, freeKg };
  } catch (error) {
    if (error instanceof InputError) return undefined;
    throw error;
  }
}

const SCALED: Record<string, { lead: string; others: string[] }> = {
  sphere: { lead: 'diameterM', others: [] },
  'sphere-radius': { lead: 'radiusM', others: [] },
  'sphere-circumference': { lead: 'circumferenceM', others: [] },
  spheroid: { lead: 'equatorialDiameterM', others: ['polarDiameterM'] },
  capsule: { lead: 'diameterM', others: ['lengthM'] },
  cushion: { lead: 'flatDiameterM', others: [] },
};

/**
 * The lift-check inputs a point of a sweep stands for, built here from the sweep's x alone, as a
 * person would change the one input by hand.
 */
function liftCheckAt(kind: string, inputs: Inputs, sweep: LiftSweep, x: number): Inputs {
  if (kind === 'envelope-sizing') {
    const shape = inputs.shape as Inputs & { shape: string };
    const envelope =
      shape.shape === 'spheroid'
        ? {
            shape: 'spheroid',
            equatorialDiameterM: x,
            polarDiameterM: x * Number(shape.polarToEquatorialRatio),
          }
        : shape.shape === 'capsule'
          ? { shape: 'capsule', diameterM: x, lengthM: x * Number(shape.lengthToDiameterRatio) }
          : shape.shape === 'cushion'
            ? { shape: 'cushion', flatDiameterM: x }
            : { shape: 'sphere', diameterM: x };
    const { envelopeMass, payloadMassKg, gas, ambient } = inputs;
    return { envelope, envelopeMass, payloadMassKg, gas, ambient };
  }
  if (sweep.id === 'size') {
    const envelope = inputs.envelope as Inputs & { shape: string };
    const scaling = SCALED[envelope.shape];
    if (!scaling) throw new Error(`no size for ${envelope.shape}`);
    const factor = x / Number(envelope[scaling.lead]);
    const scaled: Inputs = { ...envelope, [scaling.lead]: x };
    for (const other of scaling.others) scaled[other] = Number(envelope[other]) * factor;
    return { ...inputs, envelope: scaled };
  }
  if (sweep.id === 'purity') return { ...inputs, gas: { ...(inputs.gas as Inputs), purity: x } };
  const ambient = inputs.ambient as Inputs;
  return ambient.mode === 'measured'
    ? { ...inputs, ambient: { ...ambient, temperatureK: x } }
    : {
        ...inputs,
        ambient: {
          ...ambient,
          temperatureOffsetK: x - standardAtmosphere(Number(ambient.altitudeM)).temperatureK,
        },
      };
}

/** |fast − full| within 1e-9 of the lift's size (a lift near zero is held to 1e-12 kg). */
function expectSameLift(fast: SweepPoint, full: SweepPoint | undefined, where: string): void {
  if (!full) throw new Error(`the lift check refused ${where}`);
  for (const key of ['netKg', 'freeKg'] as const) {
    const scale = Math.max(Math.abs(full[key]), 1e-3);
    expect(Math.abs(fast[key] - full[key]) / scale, `${key} ${where}`).toBeLessThan(1e-9);
  }
}

const LIFT_CHECKS: [string, Inputs][] = [
  ['sphere, hydrogen, measured dry air', {}],
  [
    'spheroid of film, helium, standard air at 50 % humidity on a warm day',
    {
      envelope: { shape: 'spheroid', equatorialDiameterM: 2.2, polarDiameterM: 1.6 },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.04, fittingsKg: 0.03 },
      gas: { gasId: 'helium' },
      ambient: {
        mode: 'standard',
        altitudeM: 350,
        temperatureOffsetK: 5,
        humidity: { kind: 'relative', relativeHumidity: 0.5 },
      },
    },
  ],
  [
    'capsule, helium under superpressure, measured air with a dew point',
    {
      envelope: { shape: 'capsule', diameterM: 0.9, lengthM: 3, axis: 'horizontal' },
      gas: { gasId: 'helium', purity: 0.99, superpressurePa: 500 },
      ambient: {
        mode: 'measured',
        temperatureK: 293.15,
        pressurePa: 98500,
        humidity: { kind: 'dewPoint', dewPointK: 268.15 },
      },
    },
  ],
  [
    'cushion of film, damp hydrogen, standard air at altitude',
    {
      envelope: { shape: 'cushion', flatDiameterM: 1.3 },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.02 },
      gas: { gasId: 'hydrogen', purity: 0.95, relativeHumidity: 0.3 },
      ambient: { mode: 'standard', altitudeM: 1500 },
    },
  ],
  [
    'sphere by radius, hot air, measured humid air',
    {
      envelope: { shape: 'sphere-radius', radiusM: 4 },
      envelopeMass: { kind: 'fixed', massKg: 18 },
      payloadMassKg: 60,
      gas: { gasId: 'hot-air', superheatK: 80 },
      ambient: {
        mode: 'measured',
        temperatureK: 285,
        pressurePa: 100000,
        humidity: { kind: 'relative', relativeHumidity: 0.7 },
      },
    },
  ],
  [
    'sphere by circumference, hot air, standard air with humidity',
    {
      envelope: { shape: 'sphere-circumference', circumferenceM: 20 },
      envelopeMass: { kind: 'fixed', massKg: 9 },
      payloadMassKg: 5,
      gas: { gasId: 'hot-air', superheatK: 70 },
      ambient: {
        mode: 'standard',
        altitudeM: 500,
        temperatureOffsetK: -4,
        humidity: { kind: 'relative', relativeHumidity: 0.4 },
      },
    },
  ],
  [
    'custom volume (no size sweep)',
    { envelope: { shape: 'custom', volumeM3: 2.5 }, gas: { gasId: 'helium' } },
  ],
];

const SIZINGS: [string, Inputs][] = [
  ['spheroid of film, helium, wanted free lift, standard air', {}],
  [
    'capsule of film, hydrogen, wanted ascent rate, measured humid air',
    {
      shape: { shape: 'capsule', lengthToDiameterRatio: 3 },
      target: { kind: 'ascentRate', ascentRateMS: 3 },
      gas: { gasId: 'hydrogen' },
      ambient: {
        mode: 'measured',
        temperatureK: 291,
        pressurePa: 99000,
        humidity: { kind: 'relative', relativeHumidity: 0.6 },
      },
    },
  ],
  [
    'sphere of fixed mass, hot air, standard air',
    {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'fixed', massKg: 12 },
      payloadMassKg: 30,
      target: { kind: 'freeLift', freeLiftKg: 5 },
      gas: { gasId: 'hot-air', superheatK: 90 },
      ambient: { mode: 'standard', altitudeM: 300 },
    },
  ],
  [
    'cushion of film, helium, measured air',
    {
      shape: { shape: 'cushion' },
      ambient: { mode: 'measured', temperatureK: 280, pressurePa: 101000 },
    },
  ],
];

/** A few points of every sweep: both ends, some between, and the design point. */
function samplePoints(sweep: LiftSweep): SweepPoint[] {
  const { points } = sweep;
  return [0, 1, 17, 30, 44, points.length - 1]
    .map((index) => points[index])
    .filter((point): point is SweepPoint => point !== undefined)
    .concat(sweep.design);
}

describe('lift sweeps on the fast path agree with the lift check through evaluate', () => {
  it.each(LIFT_CHECKS)('for a lift check: %s', (_name, overrides) => {
    const inputs = liftCheck(overrides) as unknown as Inputs;
    const sweeps = liftSweeps('lift-check', inputs);
    const hotAir = (inputs.gas as Inputs).gasId === 'hot-air';
    const custom = (inputs.envelope as Inputs).shape === 'custom';
    expect(sweeps.map((sweep) => sweep.id)).toEqual([
      ...(custom ? [] : ['size']),
      'air-temperature',
      ...(hotAir ? [] : ['purity']),
    ]);
    for (const sweep of sweeps) {
      expect(sweep.points).toHaveLength(SWEEP_INTERVALS + 1);
      for (const point of samplePoints(sweep)) {
        const full = checked(liftCheckAt('lift-check', inputs, sweep, point.x));
        expectSameLift(point, full, `${sweep.id} at ${point.x}`);
      }
    }
  });

  it.each(SIZINGS)('for a sizing: %s', (_name, overrides) => {
    const inputs = sizing(overrides) as unknown as Inputs;
    const result = evaluate('envelope-sizing', inputs);
    const sweeps = liftSweeps('envelope-sizing', inputs, result.outputs);
    expect(sweeps.map((sweep) => sweep.id)).toEqual(['size']);
    const [sweep] = sweeps;
    if (!sweep) throw new Error('no sweep');
    expect(sweep.design.x).toBe(result.outputs.size?.value);
    expect(sweep.design.freeKg).toBe(result.outputs.freeLift?.value);
    expect(sweep.points).toHaveLength(SWEEP_INTERVALS + 1);
    for (const point of samplePoints(sweep)) {
      const full = checked(liftCheckAt('envelope-sizing', inputs, sweep, point.x));
      expectSameLift(point, full, `size ${point.x}`);
    }
  });
});

/** The x values of a sweep's even grid from `from` to `to`, as the sweep steps through them. */
const grid = (from: number, to: number) =>
  Array.from(
    { length: SWEEP_INTERVALS + 1 },
    (_, index) => from + ((to - from) * index) / SWEEP_INTERVALS,
  );

describe('lift sweeps leave out exactly the points the lift check refuses', () => {
  it.each<[string, Inputs, LiftSweep['id'], (inputs: Inputs) => [number, number]]>([
    [
      'a sphere so large that twice its size is beyond 500 m',
      { envelope: { shape: 'sphere', diameterM: 300 } },
      'size',
      () => [120, 600],
    ],
    [
      'a sphere by radius so small that 0.4× is below the 1 cm inputs accept',
      { envelope: { shape: 'sphere-radius', radiusM: 0.02 } },
      'size',
      () => [0.008, 0.04],
    ],
    [
      'hot air that would pass the hottest gas the engine takes',
      {
        envelope: { shape: 'sphere', diameterM: 10 },
        gas: { gasId: 'hot-air', superheatK: 15 },
        ambient: { mode: 'measured', temperatureK: 400, pressurePa: 101325 },
      },
      'air-temperature',
      () => [375, 423.15],
    ],
    [
      'measured air colder than its dew point',
      {
        ambient: {
          mode: 'measured',
          temperatureK: 290,
          pressurePa: 101325,
          humidity: { kind: 'dewPoint', dewPointK: 282 },
        },
      },
      'air-temperature',
      () => [265, 315],
    ],
  ])('%s', (_name, overrides, id, span) => {
    const inputs = liftCheck(overrides) as unknown as Inputs;
    const sweep = liftSweeps('lift-check', inputs).find((candidate) => candidate.id === id);
    if (!sweep) throw new Error(`no ${id} sweep`);
    const [from, to] = span(inputs);
    const accepted = grid(from, to).filter(
      (x) => checked(liftCheckAt('lift-check', inputs, sweep, x)) !== undefined,
    );
    expect(accepted.length).toBeGreaterThan(5);
    expect(accepted.length).toBeLessThan(SWEEP_INTERVALS + 1);
    expect(sweep.points.map((point) => point.x)).toEqual(accepted);
  });
});

describe('liftSweeps by kind', () => {
  const example = (kind: string) => KINDS.find((candidate) => candidate.id === kind)?.example;

  it('gives the charts the kind’s capabilities name, and none for other kinds', () => {
    expect(liftSweeps('lift-check', example('lift-check')).map((sweep) => sweep.id)).toEqual([
      'size',
      'air-temperature',
      'purity',
    ]);
    expect(liftSweeps('envelope-sizing', example('envelope-sizing'))).toHaveLength(1);
    expect(liftSweeps('flight-profile', example('flight-profile'))).toEqual([]);
    expect(liftSweeps('no-such-kind', {})).toEqual([]);
  });

  it('finds a sizing’s size itself when no result is given', () => {
    const inputs = example('envelope-sizing');
    const outputs = evaluate('envelope-sizing', inputs).outputs;
    expect(liftSweeps('envelope-sizing', inputs)).toEqual(
      liftSweeps('envelope-sizing', inputs, outputs),
    );
  });

  it('draws nothing for inputs the kind refuses, or a sizing with no answer', () => {
    expect(liftSweeps('lift-check', { envelope: { shape: 'sphere' } })).toEqual([]);
    expect(liftSweeps('envelope-sizing', example('envelope-sizing'), {})).toEqual([]);
  });
});
