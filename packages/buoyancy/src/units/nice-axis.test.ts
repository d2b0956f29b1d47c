import { describe, expect, it } from 'vitest';
import { niceAxis, tickDecimals } from './nice-axis.js';

describe('niceAxis', () => {
  it('covers the data with round ends and evenly spaced ticks', () => {
    const { domain, ticks } = niceAxis(0.137, 2.91);
    expect(domain[0]).toBeLessThanOrEqual(0.137);
    expect(domain[1]).toBeGreaterThanOrEqual(2.91);
    expect(ticks[0]).toBe(domain[0]);
    expect(ticks.at(-1)).toBe(domain[1]);
    expect(ticks).toEqual([0, 1, 2, 3]);
  });

  it('spans negative values and zero', () => {
    expect(niceAxis(-0.42, 0.9).ticks).toEqual([-0.5, 0, 0.5, 1]);
  });

  it('widens a flat range instead of dividing by zero', () => {
    const { domain } = niceAxis(3, 3);
    expect(domain[0]).toBeLessThan(3);
    expect(domain[1]).toBeGreaterThan(3);
  });

  it('picks enough decimals to tell the ticks apart', () => {
    expect(tickDecimals([0, 0.25, 0.5])).toBe(2);
    expect(tickDecimals([0, 5, 10])).toBe(0);
    expect(tickDecimals([0, 0.5, 1])).toBe(1);
  });
});
