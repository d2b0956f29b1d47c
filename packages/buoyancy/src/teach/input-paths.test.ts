import { describe, expect, it } from 'vitest';
import {
  numberAtPath,
  numericInputPaths,
  valuesOutsideRanges,
  withNumberAtPath,
} from './input-paths.js';

const inputs = {
  envelope: { shape: 'sphere', diameterM: 1.2 },
  payloadMassKg: 0.3,
  gas: { gasId: 'helium', purity: 0.98 },
};

describe('input paths', () => {
  it('reads a nested number and nothing else', () => {
    expect(numberAtPath(inputs, 'envelope.diameterM')).toBe(1.2);
    expect(numberAtPath(inputs, 'envelope.shape')).toBeUndefined();
    expect(numberAtPath(inputs, 'envelope.missing')).toBeUndefined();
    expect(numberAtPath(inputs, 'toString')).toBeUndefined();
  });

  it('replaces one number in a copy and leaves the original untouched', () => {
    const changed = withNumberAtPath(inputs, 'envelope.diameterM', 1.5);
    expect(changed.envelope.diameterM).toBe(1.5);
    expect(inputs.envelope.diameterM).toBe(1.2);
    expect(changed.gas).toBe(inputs.gas);
    expect(() => withNumberAtPath(inputs, 'envelope.nope.deeper', 1)).toThrow(RangeError);
  });

  it('lists the numeric leaves in input order', () => {
    expect(numericInputPaths(inputs)).toEqual([
      'envelope.diameterM',
      'payloadMassKg',
      'gas.purity',
    ]);
  });

  it('reports values outside a range, both ends allowed', () => {
    expect(valuesOutsideRanges(inputs, { payloadMassKg: { min: 0.3, max: 1 } })).toEqual([]);
    expect(valuesOutsideRanges(inputs, { payloadMassKg: { min: 0.31, max: 1 } })).toEqual([
      { path: 'payloadMassKg', value: 0.3, min: 0.31, max: 1 },
    ]);
  });
});
