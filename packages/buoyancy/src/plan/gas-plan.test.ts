import { describe, expect, it } from 'vitest';
import type { InputError } from '../errors.js';
import { planGas } from './gas-plan.js';

const fill = { temperatureK: 288.15, pressurePa: 101325 };

describe('planGas', () => {
  it('adds up the lines and runs the total through the gas supply', () => {
    // 6 × 0.50 m³ + 2 × 1.25 m³ = 5.50 m³ at 15 °C, 101.325 kPa.
    const plan = planGas({
      lines: [
        { label: 'Small sondes', volumeM3: 0.5, count: 6 },
        { label: 'Tethered sphere', volumeM3: 1.25, count: 2 },
      ],
      fill,
      prices: { currency: 'EUR', bulkGasPerM3: 40 },
    });
    expect(plan.lines.map((line) => line.totalM3)).toEqual([3, 2.5]);
    expect(plan.totalM3).toBeCloseTo(5.5, 12);
    expect(plan.result.outputs.totalVolume?.value).toBeCloseTo(5.5, 12);
    // Normal volume (0 °C, 101.325 kPa) by the ideal-gas law: 5.5 × 273.15 / 288.15 = 5.21369 m³,
    // at 40 EUR per normal m³: 208.55 EUR.
    expect(plan.result.outputs.totalVolumeNormal?.value).toBeCloseTo(5.21369, 4);
    expect(plan.result.outputs.bulkCost?.value).toBeCloseTo(208.55, 1);
  });

  it('gives the electrolyser running time for the whole plan by Faraday’s law', () => {
    // 1 m³ of hydrogen at 0 °C, 101.325 kPa is n = pV/RT = 44.615 mol; at 100 A in 10 cells,
    // Faraday: ṅ = 10·100/(2·96485.33) = 5.1821e-3 mol/s, so 8609 s = 143.5 min.
    const plan = planGas({
      lines: [{ label: 'Sphere', volumeM3: 1, count: 1 }],
      fill: { temperatureK: 273.15, pressurePa: 101325 },
      electrolyser: {
        currentA: 100,
        cellsInSeries: 10,
        voltage: { kind: 'cell', cellVoltageV: 2 },
      },
    });
    expect(plan.result.outputs.timeToFill?.unit).toBe('min');
    expect(plan.result.outputs.timeToFill?.value).toBeCloseTo(143.5, 0);
  });

  it('names the line of a bad count or volume', () => {
    try {
      planGas({
        lines: [
          { label: 'A', volumeM3: 1, count: 1 },
          { label: 'B', volumeM3: 0, count: 1.5 },
        ],
        fill,
      });
      expect.unreachable();
    } catch (error) {
      expect((error as InputError).issues.map((issue) => issue.field)).toEqual([
        'lines.1.volumeM3',
        'lines.1.count',
      ]);
    }
  });
});
