import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { fillDesignFromVersion, reduceFillLog } from './fill-log.js';

// A 1.00 m helium sphere of 0.150 kg, weighed in a hall at 15 °C and 101 325 Pa, dry.
const design = {
  envelope: { shape: 'sphere', diameterM: 1 },
  envelopeMass: { kind: 'fixed', massKg: 0.15 },
  gas: { gasId: 'helium' },
};
const ambient = { temperatureK: 288.15, pressurePa: 101325 };

describe('reduceFillLog', () => {
  it('reduces a ballast reading and compares it with the lift predicted in the logged air', () => {
    // Worked by hand:
    //   measured net lift = ballast − scale = 0.500 − 0.140 = 0.360 kg
    //   V = π·d³/6 = 0.523599 m³
    //   ρ_air (dry, 15 °C, 101 325 Pa) = 1.2250 kg/m³ (US Standard Atmosphere 1976, Table I,
    //     sea level; CIPM-2007 gives 1.2254 with its 400 ppm CO₂, which the engine uses)
    //   ρ_He = p·M/(R·T) = 101325 × 0.0040026 / (8.31446 × 288.15) = 0.169283 kg/m³
    //   predicted net lift = V·(ρ_air − ρ_He) − m_env
    //     = 0.523599 × (1.2254 − 0.169283) − 0.150 = 0.40298 kg
    //   measured less predicted = 0.360 − 0.40298 = −0.04298 kg
    const { result, points } = reduceFillLog({
      ambient,
      design,
      readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.14 }],
    });
    expect(result.outputs.measuredNetLift?.value).toBeCloseTo(0.36, 12);
    expect(result.outputs.predictedNetLift?.value).toBeCloseTo(0.40298, 3);
    expect(result.outputs.difference?.value).toBeCloseTo(-0.04298, 3);
    // Less lift than pure helium: the purity that explains it lies below 1.
    expect(result.outputs.explainingPurity?.value).toBeLessThan(100);
    expect(points).toEqual([
      { timeS: 0, measuredKg: 0.36, predictedKg: result.outputs.predictedNetLift?.value },
    ]);
  });

  it('carries the logged instruments into the measured lift’s uncertainty', () => {
    const log = {
      ambient,
      design,
      readings: [{ kind: 'ballast' as const, timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.14 }],
    };
    const withDefaults = reduceFillLog(log).result.outputs.measuredUncertainty?.value ?? NaN;
    const coarse = reduceFillLog({
      ...log,
      instrument: { scaleResolutionKg: 0.01, ballastToleranceKg: 0.002 },
    }).result.outputs.measuredUncertainty?.value;
    // GUM (JCGM 100:2008) 4.3.7 and F.2.2.1: a resolution δ and a tolerance ±a as rectangular
    // distributions, u = δ/(2√3) and a/√3, expanded with k = 2.
    const expected = 2 * Math.hypot(0.01 / (2 * Math.sqrt(3)), 0.002 / Math.sqrt(3));
    expect(coarse).toBeCloseTo(expected, 12);
    expect(withDefaults).toBeCloseTo(
      2 * Math.hypot(0.001 / (2 * Math.sqrt(3)), 0.0005 / Math.sqrt(3)),
      12,
    );
    expect(() =>
      reduceFillLog({ ...log, instrument: { scaleResolutionKg: -1, ballastToleranceKg: 0 } }),
    ).toThrow(/instrument\.scaleResolutionKg/);
  });

  it('predicts each reading at the air logged with it', () => {
    // At fixed pressure the gross lift goes as 1/T (ideal gas): 10 K colder is
    // 288.15/278.15 = 1.03595 times the gross lift, 0.55298 kg × 1.03595 = 0.57286 kg,
    // so the net lift rises by about 0.0199 kg (CIPM-2007 compressibility aside).
    const { points } = reduceFillLog({
      ambient,
      design,
      readings: [
        { kind: 'direct', timeS: 0, netLiftKg: 0.39 },
        { kind: 'direct', timeS: 43200, netLiftKg: 0.37, airTemperatureK: 278.15 },
      ],
    });
    const [warm, cold] = points;
    expect((cold?.predictedKg ?? 0) - (warm?.predictedKg ?? 0)).toBeCloseTo(0.0199, 3);
  });

  it('fits the loss of lift over a series of days', () => {
    // Lift halves every two days: L = 0.4·2^(−t/2 d); the exponential fit returns the half-life.
    const day = 86400;
    const readings = [0, 1, 2, 3, 4].map((days) => ({
      kind: 'direct' as const,
      timeS: days * day,
      netLiftKg: 0.4 * 2 ** (-days / 2),
    }));
    const { result } = reduceFillLog({ ambient, readings });
    expect(result.outputs.halfLife?.unit).toBe('days');
    expect(result.outputs.halfLife?.value).toBeCloseTo(2, 9);
    expect(result.outputs.predictedNetLift).toBeUndefined();
  });

  it('names the reading and field of an impossible air reading', () => {
    try {
      reduceFillLog({
        ambient,
        design,
        readings: [
          { kind: 'direct', timeS: 0, netLiftKg: 0.39 },
          { kind: 'direct', timeS: 60, netLiftKg: 0.39, pressurePa: 5e6 },
        ],
      });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).issues.map((issue) => issue.field)).toEqual([
        'readings.1.pressurePa',
      ]);
    }
  });

  it('takes the design from lift-check versions only', () => {
    expect(fillDesignFromVersion('lift-check', { ...design, payloadMassKg: 1 })).toEqual(design);
    expect(fillDesignFromVersion('flight-profile', design)).toBeUndefined();
  });
});
