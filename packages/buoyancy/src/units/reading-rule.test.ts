import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import type { NumberFormat } from './number-format.js';
import { parseMoney } from './money-text.js';
import { readNumber } from './number-text.js';
import { parseCount, parseQuantity } from './quantity-text.js';
import type { Dimension } from './dimensions.js';

// The one reading rule, as a table: text, number format, dimension and the field's shown unit,
// and the SI value expected or the words of the refusal. Conversion factors are exact
// definitions (NIST SP 811, 2008, Appendix B: ft, in, lb, oz, °F, psi; inHg conventional
// 3 386.389 Pa); °C to K is the offset 273.15 K (BIPM SI Brochure, 9th ed., 2.3.1).
type Case = readonly [
  text: string,
  format: NumberFormat,
  dimension: Dimension,
  shownUnit: string | undefined,
  expected: number | RegExp,
];

const POINT: NumberFormat = 'point-comma';
const COMMA: NumberFormat = 'comma-space';
const COMMA_DOT: NumberFormat = 'comma-point';

const CASES: readonly Case[] = [
  // Decimal marks, in each format.
  ['1.58 m', POINT, 'length', 'm', 1.58],
  ['1,58 m', POINT, 'length', 'm', 1.58],
  ['1,58 m', COMMA, 'length', 'm', 1.58],
  ['1.58 m', COMMA, 'length', 'm', 1.58],
  ['0,25', POINT, 'length', 'm', 0.25],
  ['0,25', COMMA, 'length', 'm', 0.25],
  ['0.25', COMMA_DOT, 'length', 'm', 0.25],
  ['.5 m', POINT, 'length', 'm', 0.5],
  [',5 m', COMMA, 'length', 'm', 0.5],
  // Grouping that reads one way.
  ['1,234.5 m', POINT, 'length', 'm', 1234.5],
  ['1 234,5 m', COMMA, 'length', 'm', 1234.5],
  ['1.234,5 m', COMMA_DOT, 'length', 'm', 1234.5],
  ['1.234,5 m', COMMA, 'length', 'm', 1234.5],
  ['1\u202f234,5 m', COMMA, 'length', 'm', 1234.5],
  ['1\u00a0234.5 m', POINT, 'length', 'm', 1234.5],
  ['1 500 m', POINT, 'length', 'm', 1500],
  ['1,234,567 m', POINT, 'length', 'm', 1234567],
  ['1.234.567 m', COMMA_DOT, 'length', 'm', 1234567],
  ['0,500 m', POINT, 'length', 'm', 0.5],
  // Text that reads two ways: refused with both readings.
  ['1,500 m', POINT, 'length', 'm', /could be 1\.5 or 1500: type 1\.5 or 1500/],
  ['1.500 m', COMMA, 'length', 'm', /could be 1,5 or 1500: type 1,5 or 1500/],
  ['1.500 m', COMMA_DOT, 'length', 'm', /could be 1,5 or 1500/],
  ['10,000', POINT, 'length', 'm', /could be 10 or 10000/],
  ['-2,500 °C', POINT, 'temperature', 'degC', /could be −2\.5 or −2500/],
  // Text that reads in neither way of the format.
  ['1,500.25 m', COMMA, 'length', 'm', /if you meant 1500,25, type 1500,25/],
  ['1.234,5 m', POINT, 'length', 'm', /if you meant 1234\.5, type 1234\.5/],
  ['1,2,3 m', POINT, 'length', 'm', /not a number/],
  ['12,34,567 m', POINT, 'length', 'm', /not a number/],
  // Signs and exponents.
  ['-5 °C', POINT, 'temperature', 'degC', 268.15],
  ['\u22125 °C', POINT, 'temperature', 'degC', 268.15],
  ['+5 °C', COMMA, 'temperature', 'degC', 278.15],
  ['\u221226,85 °C', COMMA, 'temperature', 'degC', 246.3],
  ['1.5e3 m', POINT, 'length', 'm', 1500],
  ['1,5e3 m', COMMA, 'length', 'm', 1500],
  ['2E-3 m', POINT, 'length', 'm', 0.002],
  ['2e\u22123 m', POINT, 'length', 'm', 0.002],
  // Units with and without a space, and symbols people type.
  ['158cm', POINT, 'length', 'm', 1.58],
  ['158 cm', POINT, 'length', 'm', 1.58],
  ['2 ft', POINT, 'length', 'm', 0.6096],
  ['5 lb', COMMA, 'mass', 'kg', 2.26796185],
  ['24,6 g', COMMA, 'mass', 'kg', 0.0246],
  ['68 °F', POINT, 'temperature', 'degC', 293.15],
  ['68°F', POINT, 'temperature', 'degC', 293.15],
  ['68 degF', POINT, 'temperature', 'degC', 293.15],
  ['20 ℃', POINT, 'temperature', 'degC', 293.15],
  ['293,15 K', COMMA, 'temperature', 'degC', 293.15],
  ['293.15K', POINT, 'temperature', 'degC', 293.15],
  ['1013 hPa', POINT, 'pressure', 'hPa', 101300],
  ['29,92 inHg', COMMA, 'pressure', 'hPa', 29.92 * 3386.389],
  ['14.7 psi', POINT, 'pressureDifference', 'Pa', 14.7 * 6894.757293168],
  ['40 ft³', POINT, 'volume', 'm^3', 40 * 0.3048 ** 3],
  ['40 ft^3', POINT, 'volume', 'm^3', 40 * 0.3048 ** 3],
  ['50 g/m²', POINT, 'arealDensity', 'g/m^2', 0.05],
  ['900 ft / min', POINT, 'velocity', 'm/s', 4.572],
  ['27 °F', POINT, 'temperatureDifference', 'K', 15],
  ['15 K', POINT, 'temperatureDifference', 'K', 15],
  // A bare number means the unit the field shows.
  ['158', POINT, 'length', 'cm', 1.58],
  ['158', POINT, 'length', 'm', 158],
  ['5', POINT, 'mass', 'lb', 2.26796185],
  ['20', COMMA, 'temperature', 'degC', 293.15],
  ['68', POINT, 'temperature', 'degF', 293.15],
  ['1013,25', COMMA, 'pressure', 'hPa', 101325],
  // Percentages: a bare number is percent; the % may be typed with or without a space.
  ['98', POINT, 'fraction', '%', 0.98],
  ['98 %', POINT, 'fraction', '%', 0.98],
  ['98%', COMMA, 'fraction', '%', 0.98],
  ['1', POINT, 'fraction', '%', 0.01],
  ['0,98', COMMA, 'fraction', '%', 0.0098],
  ['99,5 %', COMMA, 'fraction', '%', 0.995],
  ['98 m', POINT, 'fraction', '%', /percentage/],
  // Coefficients are plain numbers.
  ['0.35', POINT, 'coefficient', '', 0.35],
  ['0,35', COMMA, 'coefficient', '', 0.35],
  ['35 %', POINT, 'coefficient', '', /plain number/],
  // Wrong dimension, no number, empty, whitespace.
  ['5 kg', POINT, 'length', 'm', /not a length/],
  ['20 m', POINT, 'temperatureDifference', 'K', /not a temperature difference/],
  ['abc', POINT, 'length', 'm', /does not start with a number/],
  // Absolute zero is 0 K = −273.15 °C = −459.67 °F (NIST SP 811, Appendix B): below it, in any
  // unit, the text is refused as no temperature at all.
  ['-300 °C', POINT, 'temperature', 'degC', /below absolute zero/],
  ['−500 °F', POINT, 'temperature', 'degF', /below absolute zero/],
  ['-1 K', POINT, 'temperature', 'K', /below absolute zero/],
  ['-273,15', COMMA, 'temperature', 'degC', 0],
  ['m 5', POINT, 'length', 'm', /does not start with a number/],
  ['', POINT, 'length', 'm', /is empty/],
  ['   ', COMMA, 'length', 'm', /is empty/],
  ['5 furlongs', POINT, 'length', 'm', /“furlongs” where a unit should be/],
  ['  1.58 m  ', POINT, 'length', 'm', 1.58],
];

describe('the reading rule for typed quantities', () => {
  it('has at least sixty cases under both decimal marks', () => {
    expect(CASES.length).toBeGreaterThanOrEqual(60);
    expect(CASES.filter((c) => c[1] === POINT).length).toBeGreaterThan(20);
    expect(CASES.filter((c) => c[1] !== POINT).length).toBeGreaterThan(20);
  });

  it.each(CASES)(
    '"%s" in %s format, a %s field showing %s',
    (text, format, dim, unit, expected) => {
      const read = () => parseQuantity(text, dim, { numberFormat: format, defaultUnit: unit });
      if (expected instanceof RegExp) {
        expect(read).toThrow(InputError);
        expect(read).toThrow(expected);
      } else {
        const valueSI = read();
        expect(Math.abs(valueSI - expected)).toBeLessThanOrEqual(
          1e-9 * Math.max(1, Math.abs(expected)),
        );
      }
    },
  );
});

describe('whole numbers', () => {
  it.each([
    ['12', POINT, 12],
    ['1,200', POINT, /could be 1\.2 or 1200/],
    ['1 200', COMMA, 1200],
    ['1.200', COMMA_DOT, /could be 1,2 or 1200/],
    ['12,000', COMMA_DOT, 12],
    ['2.5', POINT, /whole number/],
    ['six', POINT, /does not start with a number/],
    ['6 cells', POINT, /after the number/],
  ] as const)('"%s" in %s format', (text, format, expected) => {
    const read = () => parseCount(text, { numberFormat: format, field: 'cells' });
    if (expected instanceof RegExp) expect(read).toThrow(expected);
    else expect(read()).toBe(expected);
  });
});

describe('money', () => {
  it.each([
    ['0,25', POINT, 'EUR', 'kWh', 0.25],
    ['0,25', COMMA, 'EUR', 'kWh', 0.25],
    ['0.25 EUR', POINT, 'EUR', 'kWh', 0.25],
    ['0.25 EUR/kWh', POINT, 'EUR', 'kWh', 0.25],
    ['€0.50', POINT, 'EUR', 'kWh', 0.5],
    ['0,50 €', COMMA, 'EUR', 'kWh', 0.5],
    ['EUR 12', POINT, 'EUR', undefined, 12],
    ['$1,234.50', POINT, 'USD', undefined, 1234.5],
    ['£40 /m³', POINT, 'GBP', 'm³', 40],
    ['0.25 USD', POINT, 'EUR', 'kWh', /in EUR/],
    ['0.25 EUR/m³', POINT, 'EUR', 'kWh', /per kWh/],
    ['abc', POINT, 'EUR', 'kWh', /a price such as 0\.25 or 0\.25 EUR/],
    ['-1 EUR', POINT, 'EUR', undefined, /not be negative/],
    ['1,500', POINT, 'EUR', undefined, /could be 1\.5 or 1500/],
  ] as const)('"%s" in %s format, prices in %s per %s', (text, format, currency, per, expected) => {
    const read = () =>
      parseMoney(text, { numberFormat: format, currency, per, field: 'electricity price' });
    if (expected instanceof RegExp) expect(read).toThrow(expected);
    else expect(read()).toBeCloseTo(expected, 12);
  });
});

describe('readNumber', () => {
  it('refuses anything after the number', () => {
    expect(readNumber('0.25 EUR', POINT)).toEqual({
      ok: false,
      reason: 'has “EUR” after the number: type a number only',
    });
    expect(readNumber('0,25', POINT)).toEqual({ ok: true, value: 0.25, rest: '' });
  });
});
