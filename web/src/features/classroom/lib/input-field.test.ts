import { describe, expect, it } from 'vitest';
import { inputFieldInfo } from './input-field';

describe('inputFieldInfo', () => {
  it('reads the unit and description of a nested input through the schema’s variants', () => {
    const inputs = {
      envelope: { kind: 'fixed', shape: { shape: 'sphere', diameterM: 2 } },
      payloadMassKg: 0.03,
    };
    expect(inputFieldInfo('flight-profile', inputs, 'envelope.shape.diameterM').unit).toBe('m');
    expect(inputFieldInfo('flight-profile', inputs, 'payloadMassKg')).toMatchObject({ unit: 'kg' });
  });

  it('falls back to the path for an input the schema does not describe', () => {
    expect(inputFieldInfo('lift-check', {}, 'nothing.here')).toEqual({
      label: 'nothing.here',
      unit: '',
    });
  });
});
