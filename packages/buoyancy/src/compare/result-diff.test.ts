import { describe, expect, it } from 'vitest';
import { diffInputs, diffOutputs } from './result-diff.js';

describe('result diff', () => {
  it('lists changed, added and removed input leaves by dotted path', () => {
    const changes = diffInputs(
      { envelope: { shape: 'sphere', diameterM: 1.2 }, payloadMassKg: 0.35, tags: ['a'] },
      { envelope: { shape: 'sphere', diameterM: 1.5 }, gas: { gasId: 'helium' }, tags: ['a'] },
    );
    expect(changes).toEqual([
      { path: 'envelope.diameterM', from: 1.2, to: 1.5 },
      { path: 'gas.gasId', from: null, to: 'helium' },
      { path: 'payloadMassKg', from: 0.35, to: null },
    ]);
  });

  it('finds nothing between equal inputs', () => {
    expect(diffInputs({ a: [1, { b: 2 }] }, { a: [1, { b: 2 }] })).toEqual([]);
  });

  it('lists outputs whose value, unit or presence changed', () => {
    const out = (value: number, unit = 'kg') => ({ value, unit, label: 'Free lift' });
    expect(
      diffOutputs(
        { freeLift: out(0.5), netLift: out(1), gone: out(2) },
        { freeLift: out(0.6), netLift: out(1), grossLift: out(3, 'kg') },
      ).map((change) => [change.name, change.from, change.to]),
    ).toEqual([
      ['freeLift', 0.5, 0.6],
      ['gone', 2, null],
      ['grossLift', null, 3],
    ]);
  });
});

describe('diffOutputs: the same result is not a change', () => {
  const record = (value: number) => ({ lift: { value, unit: 'kg', label: 'Free lift' } });
  it('does not list results that agree within 1e-9 of the larger', () => {
    expect(diffOutputs(record(0.1 + 0.2), record(0.3))).toEqual([]);
    expect(diffOutputs(record(1.234), record(1.234 * (1 + 5e-10)))).toEqual([]);
  });
  it('lists a result that moved by more', () => {
    expect(diffOutputs(record(1.234), record(1.234 * (1 + 1e-6)))).toHaveLength(1);
  });
});
