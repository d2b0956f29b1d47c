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

  it('gives every choice in every kind a title for each of its values', () => {
    const choices: { path: string; schema: Record<string, unknown> }[] = [];
    const walk = (node: unknown, path: string) => {
      if (Array.isArray(node)) node.forEach((child, index) => walk(child, `${path}[${index}]`));
      else if (node && typeof node === 'object') {
        const schema = node as Record<string, unknown>;
        if (Array.isArray(schema.enum)) choices.push({ path, schema });
        for (const [key, child] of Object.entries(schema)) walk(child, `${path}.${key}`);
      }
    };
    for (const kind of KINDS) walk(kind.inputSchema, kind.id);
    // gasId (three kinds) and the balloon rules' profileId and operation, at least.
    expect(choices.length).toBeGreaterThanOrEqual(5);
    for (const { path, schema } of choices) {
      const titles = (schema.enumTitles ?? {}) as Record<string, unknown>;
      expect(Object.keys(titles).sort(), path).toEqual(
        (schema.enum as string[]).map(String).sort(),
      );
      for (const title of Object.values(titles)) expect(title, path).toMatch(/^[A-Z]/);
    }
  });
});

describe('kind capabilities', () => {
  it('names, for every kind that offers a volume, a result in m³ its example gives', async () => {
    const { KINDS, evaluate, kindCapabilities } = await import('./registry.js');
    const withVolume = KINDS.filter((kind) => kind.capabilities.volumeOutput);
    expect(withVolume.map((kind) => kind.id).sort()).toEqual([
      'envelope-geometry',
      'envelope-sizing',
      'flight-profile',
      'lift-check',
    ]);
    for (const kind of withVolume) {
      const output = evaluate(kind.id, kind.example).outputs[kind.capabilities.volumeOutput ?? ''];
      expect(output?.unit, kind.id).toBe('m³');
    }
    expect(kindCapabilities('no-such-kind')).toEqual({
      charts: [],
      predictsFillLift: false,
      meterImport: false,
      landingArea: false,
    });
  });
});
