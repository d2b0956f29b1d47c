import { describe, expect, it } from 'vitest';
import { evaluate } from '../kinds/registry.js';
import { isWithheldValue, withheldByDerivation } from './withhold.js';

// A 1 m helium sphere in the 1976 standard atmosphere at sea level.
const inputs = {
  envelope: { shape: 'sphere', diameterM: 1 },
  envelopeMass: { kind: 'fixed', massKg: 0.1 },
  payloadMassKg: 0.2,
  gas: { gasId: 'helium' },
  ambient: { mode: 'standard', altitudeM: 0 },
};

describe('withheldByDerivation', () => {
  const result = evaluate('lift-check', inputs);
  const grossStep = result.outputs.grossLift?.stepId ?? '';

  it('withholds the hidden step and every later step fed with its number, in any unit', () => {
    const withheld = withheldByDerivation(result.steps, new Set([grossStep]));
    expect(withheld.stepIds.has(grossStep)).toBe(true);
    const gross = result.outputs.grossLift?.value ?? NaN;
    // Net and free lift are computed from the gross lift, and so are their forces in newtons.
    for (const name of ['netLift', 'freeLift', 'grossLiftForce', 'freeLiftForce']) {
      const output = result.outputs[name];
      if (!output) continue;
      expect(withheld.stepIds.has(output.stepId), name).toBe(true);
      expect(withheld.values, name).toContain(output.value);
    }
    expect(withheld.values).toContain(gross);
    // Lift per litre is fed the gross lift converted to grams: withheld by its symbol.
    const perLitre = result.steps.find((s) => s.id === result.outputs.liftPerLitre?.stepId);
    expect(perLitre && withheld.stepIds.has(perLitre.id)).toBe(true);
    // No result left in any shown step is a withheld number.
    for (const step of result.steps.filter((s) => !withheld.stepIds.has(s.id))) {
      expect(isWithheldValue(withheld, step.result), step.id).toBe(false);
    }
  });

  it('leaves the steps that feed the hidden one (its inputs) shown', () => {
    const withheld = withheldByDerivation(result.steps, new Set([grossStep]));
    const grossIndex = result.steps.findIndex((step) => step.id === grossStep);
    expect(grossIndex).toBeGreaterThan(0);
    for (const step of result.steps.slice(0, grossIndex)) {
      expect(withheld.stepIds.has(step.id), step.id).toBe(false);
    }
  });

  it('catches a number converted to another unit by a later step', () => {
    const steps = [
      step('t', 'time in minutes', 90, []),
      step('h', 'time in hours', 1.5, [['t', 90]]),
      step('cost', 'cost', 3, [['h', 1.5]]),
      step('other', 'unrelated', 7, [['x', 2]]),
    ];
    const withheld = withheldByDerivation(steps, new Set(['t']));
    expect([...withheld.stepIds]).toEqual(['t', 'h', 'cost']);
    expect(withheld.values).toEqual([90, 1.5, 3]);
    // Fed under the hidden symbol in another unit (seconds), still the same quantity.
    const converted = withheldByDerivation(
      [...steps, step('s', 'time in seconds', 5400, [['t', 5400]])],
      new Set(['t']),
    );
    expect(converted.stepIds.has('s')).toBe(true);
  });
});

function step(id: string, label: string, result: number, values: [string, number][]) {
  return {
    id,
    label,
    formula: `${id} = …`,
    values: values.map(([symbol, value]) => ({ symbol, value, unit: '' })),
    result: { symbol: id, value: result, unit: '' },
    source: 'test',
  };
}
