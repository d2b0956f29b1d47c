import { describe, expect, it } from 'vitest';
import { seededNormals } from './normal-draws.js';

describe('seededNormals', () => {
  const draws = (seed: number, count: number) => {
    const normal = seededNormals(seed);
    return Array.from({ length: count }, () => normal());
  };

  it('repeats for a seed and differs between seeds', () => {
    expect(draws(1, 50)).toEqual(draws(1, 50));
    expect(draws(2, 50)).not.toEqual(draws(1, 50));
  });

  it('draws a standard normal distribution', () => {
    // Standard normal table (NIST/SEMATECH e-Handbook, §1.3.6.7.1): P(|z| ≤ 1) = 0.6827,
    // P(|z| ≤ 1.96) = 0.9500. With 40 000 draws the sampling error of a share is below 0.0024
    // (one standard deviation), of the mean 0.005; the bands are four of them.
    const values = draws(3, 40000);
    const mean = values.reduce((sum, x) => sum + x, 0) / values.length;
    const variance = values.reduce((sum, x) => sum + (x - mean) ** 2, 0) / (values.length - 1);
    const share = (limit: number) =>
      values.filter((x) => Math.abs(x) <= limit).length / values.length;
    expect(Math.abs(mean)).toBeLessThan(0.02);
    expect(Math.abs(variance - 1)).toBeLessThan(0.03);
    expect(Math.abs(share(1) - 0.6827)).toBeLessThan(0.01);
    expect(Math.abs(share(1.96) - 0.95)).toBeLessThan(0.005);
  });
});
