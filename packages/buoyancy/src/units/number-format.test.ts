import { describe, expect, it } from 'vitest';
import { formatNumber } from './number-format.js';

const NNBSP = '\u202f';

describe('numbers as each format writes them', () => {
  it.each([
    // Digits in groups of three from five digits on; four-digit numbers stay whole (BIPM SI
    // Brochure, 9th ed., 5.4.4).
    // The whole part is never rounded into zeros.
    [12345.678, 'point-comma', {}, '12,346'],
    [12345.678, 'comma-space', { significantDigits: 7 }, `12${NNBSP}345,68`],
    [12345.678, 'comma-point', { significantDigits: 7 }, '12.345,68'],
    [1234.5, 'point-comma', {}, '1235'],
    [1234.5, 'comma-space', { significantDigits: 5 }, '1234,5'],
    [-0.25, 'comma-point', {}, '\u22120,2500'],
    [-0.25, 'point-comma', { trimZeros: true }, '\u22120.25'],
    [0.0001234, 'point-comma', {}, '0.0001234'],
    [2.5, 'comma-space', { decimals: 1 }, '2,5'],
    [-3.14159, 'point-comma', { decimals: 2 }, '\u22123.14'],
    [-0.001, 'point-comma', { decimals: 1 }, '0.0'],
    [123456, 'point-comma', { grouping: false }, '123456'],
  ] as const)('%s written %s with %o is %s', (value, format, options, expected) => {
    expect(formatNumber(value, format, options)).toBe(expected);
  });
});
