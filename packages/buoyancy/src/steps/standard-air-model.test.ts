import { describe, expect, it } from 'vitest';
import { evaluate } from '../kinds/registry.js';

const airDensity = (ambient: unknown) =>
  evaluate('ambient-air', { ambient }).outputs.density?.value ?? Number.NaN;

describe('one air model in standard mode', () => {
  it('gives the same density for no humidity and 0 % relative humidity, exactly', () => {
    for (const altitudeM of [0, 1500, 11000]) {
      const dry = airDensity({ mode: 'standard', altitudeM });
      const zero = airDensity({
        mode: 'standard',
        altitudeM,
        humidity: { kind: 'relative', relativeHumidity: 0 },
      });
      expect(zero).toBe(dry);
    }
    // U.S. Standard Atmosphere 1976, Table I: 1.2250 kg/m³ at sea level.
    expect(airDensity({ mode: 'standard', altitudeM: 0 })).toBeCloseTo(1.225, 4);
  });

  it('mixes water vapour into the standard’s air within the real-gas term of CIPM-2007', () => {
    // Sea level at ISA + 5 K is 20 °C and 101 325 Pa. CIPM-2007 worked value there at 50 %:
    // 1.199 31 kg/m³ (Picard et al. 2008; check-values §2.1). The standard's ideal gas leaves out
    // Z ≈ 0.9996 and uses M₀ = 28.9644 g/mol: agreement within 5e-4 relative.
    const humid = airDensity({
      mode: 'standard',
      altitudeM: 0,
      temperatureOffsetK: 5,
      humidity: { kind: 'relative', relativeHumidity: 0.5 },
    });
    expect(Math.abs(humid / 1.19931 - 1)).toBeLessThan(5e-4);
    // And a little humidity changes it a little: no step between dry and humid.
    const slightly = airDensity({
      mode: 'standard',
      altitudeM: 0,
      humidity: { kind: 'relative', relativeHumidity: 0.001 },
    });
    expect(Math.abs(slightly / airDensity({ mode: 'standard', altitudeM: 0 }) - 1)).toBeLessThan(
      1e-5,
    );
  });
});
