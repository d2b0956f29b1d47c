import { describe, expect, it } from 'vitest';
import { evaluate, KINDS } from './registry.js';

describe('the kind registry', () => {
  it.each(KINDS.map((kind) => [kind.id, kind] as const))(
    '%s evaluates its documented example, with a step behind every output',
    (_id, kind) => {
      const result = evaluate(kind.id, kind.example);
      const stepIds = new Set(result.steps.map((step) => step.id));
      expect(Object.keys(result.outputs).length).toBeGreaterThan(0);
      for (const [name, output] of Object.entries(result.outputs)) {
        expect(stepIds.has(output.stepId), `${kind.id}.${name} has no step`).toBe(true);
        expect(Number.isFinite(output.value)).toBe(true);
      }
      for (const step of result.steps) {
        expect(step.label.length).toBeGreaterThan(3);
        expect(step.source.length).toBeGreaterThan(3);
        for (const value of step.values) expect(Number.isFinite(value.value)).toBe(true);
      }
    },
  );

  it('publishes a JSON Schema with units and ranges for every kind', () => {
    for (const kind of KINDS) {
      const schema = kind.inputSchema;
      expect(schema.type).toBe('object');
      expect(JSON.stringify(schema)).toContain('"unit"');
      expect(JSON.stringify(schema)).toContain('"minimum"');
    }
  });
});
