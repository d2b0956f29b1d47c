import { evaluate, normaliseInputs } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { airTemperatureSweep, puritySweep, sizeSweep, sizingSweep } from './lift-sweeps';

const ENVELOPE_KG = 0.12;
const PAYLOAD_KG = 0.25;
const liftCheck = (overrides: Record<string, unknown> = {}) =>
  normaliseInputs('lift-check', {
    envelope: { shape: 'sphere', diameterM: 1.4 },
    envelopeMass: { kind: 'fixed', massKg: ENVELOPE_KG },
    payloadMassKg: PAYLOAD_KG,
    gas: { gasId: 'hydrogen', purity: 0.97 },
    ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
    ...overrides,
  }) as Record<string, unknown>;
const gross = (point: { netKg: number }) => point.netKg + ENVELOPE_KG;

describe('lift sweeps for the charts', () => {
  it('puts the design point on the curve the engine gives for the same inputs', () => {
    const inputs = liftCheck();
    const sweep = sizeSweep(inputs);
    const direct = evaluate('lift-check', inputs).outputs;
    expect(sweep?.design.x).toBe(1.4);
    expect(sweep?.design.freeKg).toBeCloseTo(direct.freeLift?.value ?? Number.NaN, 12);
    expect(sweep?.points).toHaveLength(61);
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
    const sweep = airTemperatureSweep(liftCheck());
    const points = sweep?.points ?? [];
    expect(points.length).toBeGreaterThan(50);
    const constant = gross(points[0] ?? { netKg: 0 }) * (points[0]?.x ?? 0);
    for (const point of points)
      expect(Math.abs((gross(point) * point.x) / constant - 1)).toBeLessThan(1e-3);
    expect(gross(points[0] ?? { netKg: 0 })).toBeGreaterThan(gross(points.at(-1) ?? { netKg: 0 }));
    expect(points[0]?.x).toBeCloseTo(288.15 - 25, 9);
  });

  it('reads a standard day at its altitude as the air temperature', () => {
    const sweep = airTemperatureSweep(
      liftCheck({ ambient: { mode: 'standard', altitudeM: 0, temperatureOffsetK: 5 } }),
    );
    // US Standard Atmosphere 1976, Table I: 288.15 K at sea level.
    expect(sweep?.design.x).toBeCloseTo(288.15 + 5, 9);
  });

  it('makes dry gross lift proportional to purity when the impurity is air', () => {
    // Ideal mixture (Dalton/Amagat): ρ_mix = x·ρ_gas + (1 − x)·ρ_air, so ρ_air − ρ_mix = x·(ρ_air − ρ_gas);
    // the air's CIPM-2007 compressibility, which the gas does not share, leaves about 2e-4.
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
    const inputs = normaliseInputs('envelope-sizing', {
      shape: { shape: 'spheroid', polarToEquatorialRatio: 0.8 },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.02 },
      payloadMassKg: 0.5,
      target: { kind: 'freeLift', freeLiftKg: 0.3 },
      gas: { gasId: 'helium' },
      ambient: { mode: 'standard', altitudeM: 200 },
    }) as Record<string, unknown>;
    const size = evaluate('envelope-sizing', inputs).outputs.size?.value;
    const sweep = sizingSweep(inputs, size);
    expect(sweep?.targetFreeKg).toBe(0.3);
    expect(sweep?.design.freeKg).toBeCloseTo(0.3, 6);
    expect(sweep?.xLabel).toBe('Equatorial diameter');
  });
});
