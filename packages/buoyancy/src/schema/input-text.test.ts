import { describe, expect, it } from 'vitest';
import { KINDS } from '../kinds/registry.js';
import { describeInputs, inputValueText, sharedUnit } from './input-text.js';

const SI = { unitSystem: 'si', numberFormat: 'point-comma' } as const;
const US = { unitSystem: 'us', numberFormat: 'point-comma' } as const;
const schemaOf = (id: string) => KINDS.find((kind) => kind.id === id)?.inputSchema;

describe('describeInputs: inputs as the editor labels them, with units', () => {
  it('prints every kind’s example without an internal key, a bare SI time or raw JSON', () => {
    for (const kind of KINDS) {
      const sections = describeInputs(kind.inputSchema, kind.example, SI);
      const lines = sections.flatMap((section) => section.lines);
      expect(lines.length, kind.id).toBeGreaterThan(0);
      for (const line of lines) {
        // camelCase keys, dotted paths and JSON never reach a label or a value.
        expect(line.label, `${kind.id} ${line.path}`).not.toMatch(/[a-z][A-Z]|\.|[{}[\]]/);
        expect(line.text, `${kind.id} ${line.path}`).not.toMatch(/[{}[\]"]/);
      }
      for (const title of sections.map((section) => section.title)) {
        if (title !== null) expect(title, kind.id).not.toMatch(/[a-z][A-Z]/);
      }
    }
  });

  it('names choices by their titles and groups fields in the editor’s sections', () => {
    const sections = describeInputs(
      schemaOf('lift-check'),
      {
        envelope: { shape: 'sphere', diameterM: 1 },
        envelopeMass: { kind: 'fixed', massKg: 0.1 },
        payloadMassKg: 0.2,
        gas: { gasId: 'helium', purity: 1 },
        ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
      },
      SI,
    );
    const envelope = sections.find((section) => section.title === 'Envelope shape and size');
    expect(envelope?.lines.map((line) => line.text)).toEqual(['Sphere', '1 m']);
    const gas = sections.find((section) => section.title === 'Lifting gas');
    expect(gas?.lines.map((line) => line.text)).toEqual(['Helium', '100 %']);
    // 288.15 K is 15 °C by definition of the Celsius scale (SI Brochure, 9th ed., 2.3.1).
    const air = sections.find((section) => section.title === 'Ambient air');
    expect(air?.lines.map((line) => line.text)).toContain('15 °C');
  });

  it('prints in the reader’s unit system: 1 m as 3.281 ft (NIST SP 811: 1 ft = 0.3048 m)', () => {
    const schema = { type: 'number', dimension: 'length' };
    expect(inputValueText(schema, 1, US)).toBe('3.281 ft');
    expect(inputValueText(schema, 1, { ...US, numberFormat: 'comma-point' })).toBe('3,281 ft');
  });

  it('shows 43,200 s as 12 h, and two times in one shared unit', () => {
    const schema = { type: 'number', dimension: 'time' };
    expect(inputValueText(schema, 43_200, SI)).toBe('12 h');
    const unit = sharedUnit(schema, [7668, 6522], SI);
    expect(inputValueText(schema, 7668, { ...SI, unit })).toBe('2.13 h');
    expect(inputValueText(schema, 6522, { ...SI, unit })).toBe('1.812 h');
  });
});

describe('fieldSchemaAt and inputLabel: a changed input by its path', () => {
  it('finds a field that only one variant of a union has', async () => {
    const { fieldSchemaAt, inputLabel } = await import('./input-text.js');
    const schema = schemaOf('lift-check');
    expect(fieldSchemaAt(schema, 'envelope.radiusM')).toMatchObject({ dimension: 'length' });
    expect(inputLabel(schema, 'envelope.radiusM')).toBe('Radius');
    expect(inputValueText(fieldSchemaAt(schema, 'gas.gasId'), 'helium', SI)).toBe('Helium');
    expect(inputValueText(fieldSchemaAt(schema, 'envelope.shape'), 'sphere-radius', SI)).toBe(
      'Sphere radius',
    );
  });
});
