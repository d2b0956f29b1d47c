import { describe, expect, it } from 'vitest';
import { inputFieldInfo } from './input-field';

describe('inputFieldInfo', () => {
  it('reads the label and dimension of a nested input through the schema’s variants', () => {
    expect(inputFieldInfo('flight-profile', 'envelope.shape.diameterM')).toMatchObject({
      dimension: 'length',
      unit: 'm',
    });
    expect(inputFieldInfo('flight-profile', 'payloadMassKg')).toMatchObject({
      dimension: 'mass',
      unit: 'kg',
    });
    expect(inputFieldInfo('lift-check', 'gas.superheatK').dimension).toBe('temperatureDifference');
  });

  it('falls back to the path for an input the schema does not describe', () => {
    expect(inputFieldInfo('lift-check', 'nothing.here')).toEqual({
      label: 'nothing.here',
      unit: '',
    });
  });
});
