import { describe, expect, it } from 'vitest';
import { evaluate } from './registry.js';

const ambient = { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 } as const;

describe('envelope-sizing', () => {
  it('sizes a sphere whose lift check gives back the wanted free lift', () => {
    const sizing = evaluate('envelope-sizing', {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.06, fittingsKg: 0.03 },
      payloadMassKg: 0.8,
      target: { kind: 'freeLift', freeLiftKg: 0.4 },
      gas: { gasId: 'helium' },
      ambient,
    });
    const diameterM = sizing.outputs.size?.value ?? Number.NaN;
    const check = evaluate('lift-check', {
      envelope: { shape: 'sphere', diameterM },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.06, fittingsKg: 0.03 },
      payloadMassKg: 0.8,
      gas: { gasId: 'helium' },
      ambient,
    });
    expect(Math.abs((check.outputs.freeLift?.value ?? 0) / 0.4 - 1)).toBeLessThan(1e-9);
    expect(sizing.outputs.gasVolumeNormal?.value).toBeCloseTo(
      ((sizing.outputs.volume?.value ?? 0) * 273.15) / 288.15,
      12,
    );
  });

  it('matches the closed form for a fixed envelope mass: V = (m_env + m_payload + L_free) / (ρ_air − ρ_gas)', () => {
    const inputs = {
      shape: { shape: 'spheroid', polarToEquatorialRatio: 0.7 },
      envelopeMass: { kind: 'fixed', massKg: 0.2 },
      payloadMassKg: 0.3,
      target: { kind: 'freeLift', freeLiftKg: 0.1 },
      gas: { gasId: 'hydrogen' },
      ambient,
    };
    const sizing = evaluate('envelope-sizing', inputs);
    const gas = evaluate('lifting-gas', { gas: inputs.gas, ambient });
    const expectedVolume = 0.6 / (gas.outputs.liftPerCubicMetre?.value ?? Number.NaN);
    expect((sizing.outputs.volume?.value ?? 0) / expectedVolume).toBeCloseTo(1, 10);
  });

  it('gives the free lift an ascent rate needs from the drag balance ½·ρ·w²·C_d·A = L_free·g₀', () => {
    const sizing = evaluate('envelope-sizing', {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'fixed', massKg: 0.6 },
      payloadMassKg: 1,
      target: { kind: 'ascentRate', ascentRateMS: 5, dragCoefficient: 0.3 },
      gas: { gasId: 'helium' },
      ambient,
    });
    const diameterM = sizing.outputs.size?.value ?? Number.NaN;
    const airDensity = evaluate('ambient-air', { ambient }).outputs.density?.value ?? Number.NaN;
    const dragKg = (0.5 * airDensity * 25 * 0.3 * (Math.PI * diameterM ** 2)) / 4 / 9.80665;
    expect((sizing.outputs.freeLift?.value ?? 0) / dragKg).toBeCloseTo(1, 9);
  });

  it('answers that no size can do it when the gas is heavier than air', () => {
    const result = evaluate('envelope-sizing', {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'fixed', massKg: 0.1 },
      payloadMassKg: 0.1,
      target: { kind: 'freeLift', freeLiftKg: 0.1 },
      gas: { gasId: 'hot-air', superheatK: -10 },
      ambient,
    });
    expect(result.outputs.size).toBeUndefined();
    expect(result.warnings.find((warning) => warning.code === 'no-size-possible')?.message).toMatch(
      /not lighter than the air/,
    );
  });

  it('answers that no size can do it when the film is too heavy for the gas', () => {
    // Air heated by 1 K lifts about 0.0042 kg/m³; a sphere of film σ lifts itself only beyond
    // d = 6σ/Δρ, about 700 m for σ = 0.5 kg/m², above the 500 m the engine sizes up to.
    const result = evaluate('envelope-sizing', {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.5 },
      payloadMassKg: 0,
      target: { kind: 'freeLift', freeLiftKg: 1 },
      gas: { gasId: 'hot-air', superheatK: 1 },
      ambient,
    });
    expect(result.outputs.size).toBeUndefined();
    expect(result.warnings.map((warning) => warning.code)).toContain('no-size-possible');
  });
});
