import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { dryAirDensityKgM3 } from './air-density.js';

describe('dryAirDensityKgM3', () => {
  // U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562), Table I, boundary rows at geopotential
  // heights 0, 11, 20 and 47 km' as reproduced in ../shared reference check values §1.2.
  // Tolerance: 5 significant digits, i.e. 5e-5 relative.
  const rows = [
    { label: 'sea level', temperatureK: 288.15, pressurePa: 101325, densityKgM3: 1.225 },
    { label: 'H = 11 km', temperatureK: 216.65, pressurePa: 22632.1, densityKgM3: 0.36392 },
    { label: 'H = 20 km', temperatureK: 216.65, pressurePa: 5474.89, densityKgM3: 0.088035 },
    { label: 'H = 47 km', temperatureK: 270.65, pressurePa: 110.906, densityKgM3: 1.4275e-3 },
  ];

  it.each(rows)(
    'reproduces the 1976 standard density at $label',
    ({ temperatureK, pressurePa, densityKgM3 }) => {
      const computed = dryAirDensityKgM3(temperatureK, pressurePa);
      expect(Math.abs(computed / densityKgM3 - 1)).toBeLessThan(5e-5);
    },
  );

  it('gives 1.2250 kg/m3 at 288.15 K and 101 325 Pa to four decimals', () => {
    // U.S. Standard Atmosphere 1976, Table I: sea-level density 1.2250 kg/m3.
    expect(dryAirDensityKgM3(288.15, 101325)).toBeCloseTo(1.225, 4);
  });

  it('scales with pressure and inversely with temperature, as the ideal-gas law requires', () => {
    const base = dryAirDensityKgM3(300, 100000);
    expect(dryAirDensityKgM3(300, 50000) / base).toBeCloseTo(0.5, 12);
    expect(dryAirDensityKgM3(400, 100000) / base).toBeCloseTo(0.75, 12);
  });

  it.each([
    ['temperatureK', Number.NaN, 101325],
    ['temperatureK', 10, 101325],
    ['temperatureK', Number.POSITIVE_INFINITY, 101325],
    ['pressurePa', 288.15, -1],
    ['pressurePa', 288.15, 1e7],
  ])('refuses a bad %s with an InputError naming the field', (field, temperatureK, pressurePa) => {
    let caught: unknown;
    try {
      dryAirDensityKgM3(temperatureK, pressurePa);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(InputError);
    expect((caught as InputError).field).toBe(field);
    expect((caught as InputError).range?.unit).toMatch(/^(K|Pa)$/);
  });
});
