import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { formatQuantity, parseQuantity } from './quantity-text.js';

describe('parseQuantity', () => {
  it.each([
    // Exact conversion factors: NIST SP 811 (2008), Appendix B (ft, lb, in, °F and psi definitions).
    ['163 cm', 'length', 1.63],
    ['2 ft', 'length', 0.6096],
    ['5 lb', 'mass', 2.26796185],
    ['24.6 g', 'mass', 0.0246],
    ['68 degF', 'temperature', 293.15],
    ['20 °C', 'temperature', 293.15],
    ['1013 hPa', 'pressure', 101300],
    ['29.92 inHg', 'pressure', 29.92 * 3386.389],
    ['14.7 psi', 'pressureDifference', 14.7 * 6894.757293168],
    ['73 L', 'volume', 0.073],
    ['40 ft^3', 'volume', 40 * 0.3048 ** 3],
    ['900 ft/min', 'velocity', 4.572],
    ['50 g/m²', 'arealDensity', 0.05],
    ['508 Wh', 'energy', 508 * 3600],
    ['27 degF', 'temperatureDifference', 15],
    ['15 K', 'temperatureDifference', 15],
    ['98 %', 'fraction', 0.98],
    // A bare number in a share is a percentage, as the field shows it.
    ['0.98', 'fraction', 0.0098],
  ] as const)('reads "%s" as a %s of %s (SI)', (text, dimension, expected) => {
    expect(Math.abs(parseQuantity(text, dimension) / expected - 1)).toBeLessThan(1e-9);
  });

  it('reads an angle in degrees with decimals, with or without its sign, and radians too', () => {
    expect(parseQuantity('47.5', 'angle')).toBeCloseTo(47.5, 12);
    expect(parseQuantity('47.5°', 'angle')).toBeCloseTo(47.5, 12);
    expect(parseQuantity('-8.25 °', 'angle')).toBeCloseTo(-8.25, 12);
    // 1 rad = 180/π degrees (BIPM SI Brochure, 9th ed., Table 4: 1° = (π/180) rad).
    expect(parseQuantity('1 rad', 'angle')).toBeCloseTo(180 / Math.PI, 10);
    expect(() => parseQuantity('47 m', 'angle')).toThrow(InputError);
    // A place to five decimals of a degree, about a metre on the ground.
    expect(formatQuantity(47.5, 'angle', 'si').text).toBe('47.50000°');
    expect(formatQuantity(-178.123456, 'angle', 'us').text).toBe('−178.12346°');
  });

  it('reads a bare number in the field’s default unit', () => {
    expect(parseQuantity('163', 'length', { defaultUnit: 'cm' })).toBeCloseTo(1.63, 12);
    expect(parseQuantity('1,5', 'length')).toBe(1.5);
    expect(parseQuantity('1,5', 'length', { numberFormat: 'comma-space' })).toBe(1.5);
  });

  it('refuses text of the wrong dimension or no number, naming the field', () => {
    expect(() => parseQuantity('5 kg', 'length', { field: 'envelope.diameterM' })).toThrow(
      /envelope.diameterM: is not a length/,
    );
    expect(() => parseQuantity('lots', 'mass')).toThrow(InputError);
    expect(() => parseQuantity('', 'mass')).toThrow(/empty/);
    expect(() => parseQuantity('20 degC', 'temperatureDifference')).not.toThrow();
    expect(() => parseQuantity('20 m', 'temperatureDifference')).toThrow(InputError);
  });
});

describe('formatQuantity', () => {
  it('shows small masses in grams (SI) and ounces (US customary)', () => {
    expect(formatQuantity(0.0566, 'mass', 'si').text).toBe('56.60 g');
    // 1 oz = 28.349 523 125 g exactly (NIST SP 811, Appendix B).
    expect(formatQuantity(0.0566, 'mass', 'us').value).toBeCloseTo(56.6 / 28.349523125, 9);
    expect(formatQuantity(2, 'mass', 'us').unit).toBe('lb');
  });

  it('shows temperatures in °C or °F and air pressure in hPa or inHg', () => {
    expect(formatQuantity(293.15, 'temperature', 'si').text).toBe('20.00 °C');
    expect(formatQuantity(293.15, 'temperature', 'us').text).toBe('68.00 °F');
    expect(formatQuantity(101325, 'pressure', 'si').text).toBe('1013 hPa');
    expect(formatQuantity(101325, 'pressure', 'us').value).toBeCloseTo(29.921, 3);
  });

  it('honours a chosen unit and percentage for fractions', () => {
    expect(formatQuantity(0.0731, 'volume', 'si', { unit: 'L' }).text).toBe('73.10 L');
    expect(formatQuantity(0.95, 'fraction', 'si').text).toBe('95.00 %');
  });
});
