import { evaluate, KINDS } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { supplyCostsPerFill } from './supply-costs';

describe('supply cost per fill', () => {
  it('shares each source’s total over the fills', () => {
    const inputs = KINDS.find((kind) => kind.id === 'gas-supply')?.example as {
      fill: { count: number; volumeM3: number };
      prices: { currency: string };
    };
    const result = evaluate('gas-supply', inputs);
    const { currency, costs } = supplyCostsPerFill(result, inputs);
    expect(currency).toBe('EUR');
    expect(costs.map((cost) => cost.source)).toEqual([
      'Electrolysis',
      'Cylinders',
      'Delivered gas',
    ]);
    const bulk = costs.find((cost) => cost.source === 'Delivered gas');
    expect(bulk?.perFill).toBeCloseTo(
      (result.outputs.bulkCost?.value ?? 0) / inputs.fill.count,
      12,
    );
  });

  it('leaves out sources that were not priced', () => {
    const result = evaluate('gas-supply', {
      fill: { volumeM3: 1, temperatureK: 288.15, pressurePa: 101325 },
      cylinder: { gasId: 'helium', waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15 },
    });
    expect(supplyCostsPerFill(result, { fill: { volumeM3: 1 } }).costs).toEqual([]);
  });
});
