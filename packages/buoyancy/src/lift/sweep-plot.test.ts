import { describe, expect, it } from 'vitest';
import { evaluate, KINDS } from '../kinds/registry.js';
import { liftSweeps } from './lift-sweeps.js';
import { sweepPlot } from './sweep-plot.js';

const example = (kind: string) => KINDS.find((candidate) => candidate.id === kind)?.example;

describe('sweepPlot', () => {
  it('converts a sweep into the reader’s units with round axes that show zero lift', () => {
    const [size, temperature] = liftSweeps('lift-check', example('lift-check'));
    if (!size || !temperature) throw new Error('no sweeps');
    const plot = sweepPlot(size, 'us');
    if (!plot) throw new Error('no plot');
    // 1 ft = 0.3048 m exactly (NIST SP 811, appendix B): the 1.2 m sphere is 3.937 ft across.
    expect(plot.x.label).toBe('Diameter (ft)');
    expect(plot.design.x).toBeCloseTo(1.2 / 0.3048, 12);
    // 1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B).
    expect(plot.y.unit).toBe('lb');
    expect(plot.design.y).toBeCloseTo(size.design.freeKg / 0.45359237, 12);
    expect(plot.points).toHaveLength(size.points.length);
    expect(plot.y.domain[0]).toBeLessThanOrEqual(0);
    expect(plot.y.ticks).toContain(0);
    for (const tick of plot.x.ticks) {
      expect(tick).toBeGreaterThanOrEqual(plot.x.domain[0] - 1e-9);
      expect(tick).toBeLessThanOrEqual(plot.x.domain[1] + 1e-9);
    }
    // °F = 1.8·°C + 32 (NIST SP 811, appendix B): 288.15 K is 59 °F.
    const warm = sweepPlot(temperature, 'us');
    expect(warm?.x.label).toBe('Air temperature (°F)');
    expect(warm?.design.x).toBeCloseTo(59, 9);
  });

  it('carries the wanted free lift of a sizing onto the lift axis', () => {
    const inputs = example('envelope-sizing');
    const [sweep] = liftSweeps(
      'envelope-sizing',
      inputs,
      evaluate('envelope-sizing', inputs).outputs,
    );
    if (!sweep) throw new Error('no sweep');
    const plot = sweepPlot(sweep, 'si');
    expect(plot?.y.label).toMatch(/^Lift \((kg|g)\)$/);
    const factor = plot?.y.unit === 'g' ? 1000 : 1;
    expect(plot?.target).toBeCloseTo(0.3 * factor, 9);
    expect(plot?.y.domain[1]).toBeGreaterThanOrEqual(plot?.target ?? Infinity);
  });

  it('gives no plot for a curve of fewer than two points', () => {
    const [sweep] = liftSweeps('lift-check', example('lift-check'));
    if (!sweep) throw new Error('no sweep');
    expect(sweepPlot({ ...sweep, points: sweep.points.slice(0, 1) }, 'si')).toBeUndefined();
  });
});
