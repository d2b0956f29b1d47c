import { AIR_PRESSURE_RANGE_PA, AIR_TEMPERATURE_RANGE_K } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { FILL_LOG_RANGES, outsideRange } from './fill-log-ranges';

describe('the ranges a fill log is checked against in the browser', () => {
  it('are the engine’s: its air ranges and the lift-measurement kind’s published ones', () => {
    expect(FILL_LOG_RANGES.temperatureK).toBe(AIR_TEMPERATURE_RANGE_K);
    expect(FILL_LOG_RANGES.pressurePa).toBe(AIR_PRESSURE_RANGE_PA);
    // The numbers of packages/buoyancy/src/kinds/lift-measurement.kind.ts and of the relative
    // humidity check in packages/buoyancy/src/measurement/fill-log.ts.
    expect(FILL_LOG_RANGES.relativeHumidity).toEqual({ min: 0, max: 1 });
    expect(FILL_LOG_RANGES.timeS).toEqual({ min: 0, max: 3.2e7 });
    expect(FILL_LOG_RANGES.ballastMassKg).toEqual({ min: 0, max: 10000 });
    expect(FILL_LOG_RANGES.scaleReadingKg).toEqual({ min: -10000, max: 10000 });
    expect(FILL_LOG_RANGES.netLiftKg).toEqual({ min: -10000, max: 10000 });
  });

  it('lets an empty field pass and refuses a value past either end', () => {
    expect(outsideRange(undefined, FILL_LOG_RANGES.relativeHumidity)).toBe(false);
    expect(outsideRange(1, FILL_LOG_RANGES.relativeHumidity)).toBe(false);
    expect(outsideRange(1.5, FILL_LOG_RANGES.relativeHumidity)).toBe(true);
    expect(outsideRange(-0.01, FILL_LOG_RANGES.relativeHumidity)).toBe(true);
    expect(outsideRange(Number.NaN, FILL_LOG_RANGES.relativeHumidity)).toBe(true);
  });
});
