import { describe, expect, it } from 'vitest';
import { evaluate } from '../kinds/registry.js';
import { fastLift, sweepSphereDiameter } from './fast-lift.js';

describe('fastLift', () => {
  it('gives the same free lift as the lift-check kind for measured dry air', () => {
    const kind = evaluate('lift-check', {
      envelope: { shape: 'sphere', diameterM: 0.9 },
      envelopeMass: { kind: 'fixed', massKg: 0.05 },
      payloadMassKg: 0.1,
      gas: { gasId: 'helium', purity: 0.97 },
      ambient: { mode: 'measured', temperatureK: 290, pressurePa: 99000 },
    });
    const fast = fastLift({
      volumeM3: (Math.PI * 0.9 ** 3) / 6,
      envelopeMassKg: 0.05,
      payloadMassKg: 0.1,
      airTemperatureK: 290,
      airPressurePa: 99000,
      airVapourMoleFraction: 0,
      gas: { gasId: 'helium', temperatureK: 290, pressurePa: 99000, purity: 0.97 },
    });
    expect(fast.freeLiftKg).toBeCloseTo(kind.outputs.freeLift?.value ?? Number.NaN, 12);
  });

  it('sweeps net lift upwards with diameter and crosses zero where the film outweighs the gas', () => {
    const sweep = sweepSphereDiameter(
      {
        payloadMassKg: 0,
        airTemperatureK: 288.15,
        airPressurePa: 101325,
        airVapourMoleFraction: 0,
        gas: { gasId: 'helium', temperatureK: 288.15, pressurePa: 101325 },
      },
      { fixedMassKg: 0, arealDensityKgM2: 0.1 },
      0.1,
      3,
      1000,
    );
    expect(sweep).toHaveLength(1000);
    // Net lift of a sphere of film σ is zero at d = 6σ/(ρ_air − ρ_gas) (sphere volume and area).
    const crossing = sweep.findIndex((point) => point.netLiftKg > 0);
    const expectedD = (6 * 0.1) / (1.22552 - 0.16928);
    expect(sweep[crossing]?.diameterM).toBeGreaterThan(expectedD - 0.005);
    expect(sweep[crossing - 1]?.diameterM).toBeLessThan(expectedD + 0.005);
  });
});
