import { describe, expect, it } from 'vitest';
import { ComputationError } from '../errors.js';
import { findRoot } from './find-root.js';

describe('findRoot (Brent)', () => {
  it('finds √2 as the root of x² − 2', () => {
    expect(findRoot((x) => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 12);
  });

  it('finds the Dottie number, the root of cos x − x (0.739085133215160…, OEIS A003957)', () => {
    expect(findRoot((x) => Math.cos(x) - x, 0, 1)).toBeCloseTo(0.73908513321516, 12);
  });

  it('handles a root at a bracket end and a reversed bracket', () => {
    expect(findRoot((x) => x - 3, 3, 5)).toBe(3);
    expect(findRoot((x) => x ** 3 - 27, 10, 0)).toBeCloseTo(3, 10);
  });

  it('refuses a bracket without a sign change', () => {
    expect(() => findRoot((x) => x * x + 1, -1, 1)).toThrow(ComputationError);
  });
});
