import { describe, expect, it } from 'vitest';
import { stepNumber } from './step-number';

describe('numbers in a derivation', () => {
  it.each([
    [101325, 'point-comma', '101,325'],
    [101325, 'comma-space', '101\u202f325'],
    [1.2250001, 'comma-point', '1,225'],
    [-26.850000000000023, 'point-comma', '\u221226.85'],
    [6.02214076e23, 'point-comma', '6.0221 × 10²³'],
    [0.000123456, 'comma-space', '1,2346 × 10⁻⁴'],
    [0, 'comma-point', '0'],
  ] as const)('%s in %s is %s', (value, format, expected) => {
    expect(stepNumber(value, format)).toBe(expected);
  });
});
