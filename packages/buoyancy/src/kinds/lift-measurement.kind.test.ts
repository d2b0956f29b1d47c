import { describe, expect, it } from 'vitest';
import { fitLiftRetention } from '../measurement/lift-retention.js';
import { evaluate } from './registry.js';

const prediction = {
  envelope: { shape: 'sphere-circumference', circumferenceM: 1.63 },
  envelopeMass: { kind: 'fixed', massKg: 0.0246 },
  gas: { gasId: 'hydrogen' },
  ambient: { mode: 'measured', temperatureK: 293.15, pressurePa: 101325 },
};

describe('lift-measurement', () => {
  it('reads 150 g ballast and a 94.6 g scale reading as 55.4 g net lift', () => {
    // common practice, no published source: a practitioner's measurement of the 163 cm hydrogen
    // sphere — 150 g ballast, scale reading 94.6 g, so 55.4 g measured net lift.
    const result = evaluate('lift-measurement', {
      readings: [{ kind: 'ballast', ballastMassKg: 0.15, scaleReadingKg: 0.0946 }],
    });
    expect(result.outputs.measuredNetLift?.value).toBeCloseTo(0.0554, 12);
  });

  it('compares with the prediction at the logged conditions and finds the purity that explains it', () => {
    const result = evaluate('lift-measurement', {
      readings: [{ kind: 'ballast', ballastMassKg: 0.15, scaleReadingKg: 0.0946 }],
      prediction,
    });
    const predicted = result.outputs.predictedNetLift?.value ?? Number.NaN;
    expect(result.outputs.difference?.value).toBeCloseTo(0.0554 - predicted, 12);
    // Shown in %, as purity is typed.
    expect(result.outputs.explainingPurity?.unit).toBe('%');
    const purity = (result.outputs.explainingPurity?.value ?? Number.NaN) / 100;
    expect(purity).toBeGreaterThan(0.9);
    expect(purity).toBeLessThan(1);
    // The purity found must reproduce the measured lift through the lift check itself.
    const check = evaluate('lift-check', {
      ...prediction,
      payloadMassKg: 0,
      gas: { gasId: 'hydrogen', purity },
    });
    expect(check.outputs.netLift?.value).toBeCloseTo(0.0554, 9);
  });

  it('warns, and gives no purity, when the measurement beats pure gas', () => {
    const result = evaluate('lift-measurement', {
      readings: [{ kind: 'direct', netLiftKg: 0.2 }],
      prediction,
    });
    expect(result.outputs.explainingPurity).toBeUndefined();
    expect(result.warnings.map((warning) => warning.code)).toContain('lift-above-pure-gas');
  });

  it('gives the measured lift an uncertainty from the scale and the ballast, after the GUM', () => {
    // JCGM 100:2008: resolution δ → u = δ/(2√3) (F.2.2.1), tolerance ±a → u = a/√3 (4.3.7),
    // combined in quadrature (5.1.2), expanded with k = 2. Defaults: δ = 1 g, a = 0.5 g.
    const expanded = (deltaKg: number, aKg: number) =>
      2 * Math.sqrt((deltaKg / (2 * Math.sqrt(3))) ** 2 + (aKg / Math.sqrt(3)) ** 2);
    const byDefault = evaluate('lift-measurement', {
      readings: [{ kind: 'ballast', ballastMassKg: 0.15, scaleReadingKg: 0.0946 }],
    });
    expect(byDefault.outputs.measuredUncertainty?.value).toBeCloseTo(expanded(0.001, 0.0005), 12);
    const coarse = evaluate('lift-measurement', {
      readings: [{ kind: 'direct', netLiftKg: 0.05 }],
      instrument: { scaleResolutionKg: 0.01, ballastToleranceKg: 0.002 },
    });
    // A direct reading has no ballast: only the resolution counts.
    expect(coarse.outputs.measuredUncertainty?.value).toBeCloseTo(expanded(0.01, 0), 12);
  });

  it('gives no verdict inside the uncertainty: 0.02 % above the pure-gas prediction', () => {
    const predicted =
      evaluate('lift-check', { ...prediction, payloadMassKg: 0 }).outputs.netLift?.value ?? 0;
    const result = evaluate('lift-measurement', {
      readings: [{ kind: 'direct', netLiftKg: predicted * 1.0002 }],
      prediction,
    });
    const codes = result.warnings.map((warning) => warning.code);
    expect(codes).toContain('within-measurement-uncertainty');
    expect(codes).not.toContain('lift-above-pure-gas');
    // A purity below 1 inside the band carries its own uncertainty.
    const lower = evaluate('lift-measurement', {
      readings: [{ kind: 'direct', netLiftKg: predicted - 0.003 }],
      prediction,
    });
    const purity = (lower.outputs.explainingPurity?.value ?? Number.NaN) / 100;
    const band = (lower.outputs.explainingPurityUncertainty?.value ?? Number.NaN) / 100;
    expect(purity).toBeLessThan(1);
    expect(band).toBeGreaterThan(0);
    // 3 g below against U ≈ 0.8 g: the band is narrower than the purity's shortfall from 1.
    expect(band).toBeLessThan(1 - purity);
  });

  it('fits the half-life of a lift that halves every 5 days exactly', () => {
    // Exponential decay L = L₀·2^(−t/t½): a synthetic series with a known answer.
    const day = 86400;
    const readings = [0, 1, 2, 5, 8].map((days) => ({
      kind: 'direct' as const,
      timeS: days * day,
      netLiftKg: 0.5 * 2 ** (-days / 5),
    }));
    const result = evaluate('lift-measurement', { readings });
    expect(result.outputs.halfLife?.value).toBeCloseTo(5, 9);
    expect(result.outputs.lossRate?.value).toBeCloseTo((100 * Math.LN2) / 5, 9);
    expect(
      fitLiftRetention(readings.map((r) => ({ timeS: r.timeS, netLiftKg: r.netLiftKg }))).rSquared,
    ).toBeCloseTo(1, 12);
  });

  it('refuses a series whose readings are all at the same time', () => {
    expect(() =>
      evaluate('lift-measurement', {
        readings: [
          { kind: 'direct', netLiftKg: 0.1 },
          { kind: 'direct', netLiftKg: 0.09 },
        ],
      }),
    ).toThrow(/different times/);
  });
});
