import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { evaluate, KINDS } from '../kinds/registry.js';
import { inputFieldInfo, readableIssue } from './field-info.js';

const schemaOf = (id: string) => KINDS.find((kind) => kind.id === id)?.inputSchema;

describe('input fields by path', () => {
  it('finds a field through variants and gives its label and dimension', () => {
    expect(inputFieldInfo(schemaOf('lift-check'), 'ambient.temperatureK')).toEqual({
      label: 'Air temperature',
      dimension: 'temperature',
    });
    expect(inputFieldInfo(schemaOf('lift-check'), 'gas.superheatK')?.dimension).toBe(
      'temperatureDifference',
    );
    expect(inputFieldInfo(schemaOf('lift-check'), 'gas.purity')?.dimension).toBe('fraction');
  });

  it('names a list item by its noun and number', () => {
    expect(inputFieldInfo(schemaOf('balloon-rules'), 'packages.1.massKg')).toEqual({
      label: 'Package 2: mass of the package',
      dimension: 'mass',
    });
  });

  it('knows nothing of a path that is not in the schema', () => {
    expect(inputFieldInfo(schemaOf('lift-check'), 'ambient.nonsense')).toBeUndefined();
  });
});

describe('issues in words and display units', () => {
  const refusal = (inputs: unknown) => {
    try {
      evaluate('lift-check', inputs);
    } catch (error) {
      if (error instanceof InputError) return error.issues[0];
    }
    throw new Error('expected a refusal');
  };
  const example = KINDS.find((kind) => kind.id === 'lift-check')?.example as Record<
    string,
    unknown
  >;

  it('gives a range in °C and hPa, in the person’s number format, never in K or Pa', () => {
    const issue = refusal({
      ...example,
      ambient: { mode: 'measured', temperatureK: 500, pressurePa: 101325 },
    });
    if (!issue) throw new Error('expected an issue');
    const field = inputFieldInfo(schemaOf('lift-check'), issue.field);
    // The engine's air-density range: −100 °C to 150 °C is 173.15 K to 423.15 K (°C = K − 273.15,
    // BIPM SI Brochure, 9th ed., 2.3.1).
    expect(readableIssue(issue, field, { unitSystem: 'si', numberFormat: 'point-comma' })).toBe(
      'Air temperature must be between −100 °C and 150 °C',
    );
    expect(readableIssue(issue, field, { unitSystem: 'us', numberFormat: 'comma-space' })).toBe(
      'Air temperature must be between −148 °F and 302 °F',
    );
  });
});
