import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { meterEnergy } from './meter-energy.js';

describe('meterEnergy', () => {
  it('integrates constant power exactly: 100 W for one hour is 100 Wh', () => {
    // E = P·t = 100 W × 3600 s = 360 000 J = 100 Wh (SI definition of the watt-hour).
    const result = meterEnergy({
      kind: 'power',
      samples: [0, 900, 1800, 2700, 3600].map((timeS) => ({ timeS, powerW: 100 })),
    });
    expect(result.energyJ).toBe(360000);
    expect(result.durationS).toBe(3600);
    expect(result.meanPowerW).toBe(100);
  });

  it('integrates a linear ramp exactly with the trapezoidal rule', () => {
    // P rising from 0 to 200 W over 600 s: ∫P dt = ½·200·600 = 60 000 J.
    const result = meterEnergy({
      kind: 'power',
      samples: [
        { timeS: 0, powerW: 0 },
        { timeS: 150, powerW: 50 },
        { timeS: 600, powerW: 200 },
      ],
    });
    expect(result.energyJ).toBeCloseTo(60000, 9);
  });

  it('reads a cumulative register as last less first', () => {
    const result = meterEnergy({
      kind: 'cumulative',
      samples: [
        { timeS: 0, energyJ: 3.6e6 },
        { timeS: 1800, energyJ: 3.6e6 + 4.5e5 },
      ],
    });
    expect(result.energyJ).toBeCloseTo(4.5e5, 9);
  });

  it('names samples out of order and registers that count down', () => {
    try {
      meterEnergy({
        kind: 'cumulative',
        samples: [
          { timeS: 0, energyJ: 100 },
          { timeS: 0, energyJ: 90 },
        ],
      });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).issues.map((issue) => issue.field)).toEqual([
        'samples.1.timeS',
        'samples.1.energyJ',
      ]);
    }
  });
});
