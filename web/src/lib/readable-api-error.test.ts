import { readableIssue } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { labelOfPath, readableApiError } from './readable-api-error';

const shownAs = { unitSystem: 'si', numberFormat: 'comma-space' } as const;
const withRanges = (
  issue: Parameters<typeof readableIssue>[0],
  field: Parameters<typeof readableIssue>[1],
) => readableIssue(issue, field, shownAs);

describe('API errors as sentences with labels', () => {
  it('names a field by the label the form gives, with its range in the units it shows', () => {
    const error = new ApiError(422, 'inputs.ambient.temperatureK must be … (got 500)', undefined, [
      {
        field: 'inputs.ambient.temperatureK',
        reason: 'must be between 173.15 and 423.15 K',
        range: { min: 173.15, max: 423.15, unit: 'K' },
      },
    ]);
    const labels = (field: string) =>
      field === 'inputs.ambient.temperatureK'
        ? ({ label: 'Air temperature', dimension: 'temperature' } as const)
        : undefined;
    // 173.15 K = −100 °C and 423.15 K = 150 °C (°C = K − 273.15).
    expect(readableApiError(error, labels, withRanges)).toEqual([
      'Air temperature must be between \u2212100 °C and 150 °C',
    ]);
  });

  it('drops the property name class-validator puts first, and never shows a path', () => {
    const error = new ApiError(400, 'title: title should not be empty', 'title', [
      { field: 'title', reason: 'title should not be empty' },
      { field: 'readings.1.ballastMassKg', reason: 'must be a number' },
    ]);
    expect(readableApiError(error, undefined)).toEqual([
      'Title should not be empty',
      'Item 2: ballast mass must be a number',
    ]);
  });

  it('keeps a message that names no field as it is', () => {
    expect(readableApiError(new ApiError(409, 'Someone saved first.'), undefined)).toEqual([
      'Someone saved first.',
    ]);
    expect(labelOfPath('tryRanges.envelope.diameterM')).toBe('Diameter');
  });
});
