import { describe, expect, it } from 'vitest';
import { airOfVersion, NO_AIR } from './air-of-version';

describe('the air a fill log starts from', () => {
  it('takes measured air as the version gives it', () => {
    const air = airOfVersion({
      ambient: {
        mode: 'measured',
        temperatureK: 298.15,
        pressurePa: 95000,
        humidity: { kind: 'relative', relativeHumidity: 0.6 },
      },
    });
    expect(air).toEqual({
      temperatureK: 298.15,
      pressurePa: 95000,
      relativeHumidity: 0.6,
      origin: { kind: 'measured' },
    });
  });

  it('works out a standard atmosphere at the version’s altitude', () => {
    const air = airOfVersion({
      ambient: {
        mode: 'standard',
        altitudeM: 1000,
        temperatureOffsetK: 0,
        humidity: { kind: 'dry' },
      },
    });
    // U.S. Standard Atmosphere 1976 at 1 000 m geometric altitude: 281.651 K, 89 876 Pa (row
    // computed from the standard's defining equations, cross-checked against the PDAS table;
    // /work/shared/reference/check-values.md §1.4 and
    // packages/buoyancy/test/reference/data/us-standard-atmosphere-1976.csv). Tolerance: one unit
    // of the last printed digit, 0.001 K and 1 Pa.
    expect(Math.abs(air.temperatureK - 281.651)).toBeLessThanOrEqual(0.001);
    expect(Math.abs(air.pressurePa - 89876)).toBeLessThanOrEqual(1);
    expect(air.relativeHumidity).toBe(0);
    expect(air.origin).toEqual({ kind: 'standard', altitudeM: 1000, temperatureOffsetK: 0 });
  });

  it('matches a published 1976 standard atmosphere value at 5 000 m', () => {
    const air = airOfVersion({ ambient: { mode: 'standard', altitudeM: 5000 } });
    // fluids (C. Bell), ATMOSPHERE_1976(5000) docstring example: T 255.6755 K, p 54 048.29 Pa.
    // Tolerance 1e-5 relative.
    expect(Math.abs(air.temperatureK / 255.6755 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(air.pressurePa / 54048.29 - 1)).toBeLessThan(1e-5);
    // No humidity given: the engine's schema default, dry air.
    expect(air.relativeHumidity).toBe(0);
  });

  it('adds the temperature offset of a warmer day and keeps the standard pressure', () => {
    const air = airOfVersion({
      ambient: {
        mode: 'standard',
        altitudeM: 1000,
        temperatureOffsetK: 10,
        humidity: { kind: 'relative', relativeHumidity: 0.45 },
      },
    });
    // ISA + ΔT: 281.651 K + 10 K, pressure still 89 876 Pa (U.S. Standard Atmosphere 1976 at
    // 1 000 m geometric, check-values.md §1.4). Tolerance 0.001 K and 1 Pa.
    expect(Math.abs(air.temperatureK - 291.651)).toBeLessThanOrEqual(0.001);
    expect(Math.abs(air.pressurePa - 89876)).toBeLessThanOrEqual(1);
    expect(air.relativeHumidity).toBe(0.45);
  });

  it('turns a dew point into the relative humidity with the same water vapour', () => {
    const air = airOfVersion({
      ambient: {
        mode: 'measured',
        temperatureK: 293.15,
        pressurePa: 101325,
        humidity: { kind: 'dewPoint', dewPointK: 283.15 },
      },
    });
    // Saturation vapour pressure over water, Wagner & Pruß (2002, IAPWS): 1228.11 Pa at 10 °C and
    // 2339.19 Pa at 20 °C (check-values.md §2.2), so RH = 1228.11 / 2339.19 = 0.52502. Tolerance
    // 5e-4 absolute: it covers the CIPM-2007 enhancement factor, 1.7e-4 lower at 10 °C than at
    // 20 °C.
    expect(Math.abs((air.relativeHumidity ?? Number.NaN) - 1228.11 / 2339.19)).toBeLessThan(5e-4);
    expect(air.dewPointK).toBe(283.15);
  });

  it('starts a flight profile from its launch site, dry, as that kind computes it', () => {
    const air = airOfVersion({
      launch: { altitudeM: 0, temperatureOffsetK: 0 },
      envelopeMassKg: 1,
    });
    // U.S. Standard Atmosphere 1976, Table I, sea level: 288.150 K, 101 325 Pa. Tolerance 1e-9
    // relative (the defining constants).
    expect(Math.abs(air.temperatureK / 288.15 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(air.pressurePa / 101325 - 1)).toBeLessThan(1e-9);
    expect(air.relativeHumidity).toBe(0);
    expect(air.origin).toEqual({ kind: 'standard', altitudeM: 0, temperatureOffsetK: 0 });
  });

  it('takes a lift measurement’s prediction air', () => {
    const air = airOfVersion({
      readings: [],
      prediction: {
        ambient: {
          mode: 'measured',
          temperatureK: 280,
          pressurePa: 99000,
          humidity: { kind: 'dry' },
        },
      },
    });
    expect(air).toMatchObject({ temperatureK: 280, pressurePa: 99000, relativeHumidity: 0 });
  });

  it('falls back to sea level in the standard atmosphere when the version names no air', () => {
    expect(airOfVersion({ envelope: { shape: 'sphere', diameterM: 1 } })).toBe(NO_AIR);
    expect(airOfVersion(undefined)).toBe(NO_AIR);
    expect(airOfVersion({ ambient: { mode: 'standard', altitudeM: 'high' } })).toBe(NO_AIR);
    // U.S. Standard Atmosphere 1976, Table I, sea level: 288.150 K, 101 325 Pa.
    expect(NO_AIR).toMatchObject({ temperatureK: 288.15, pressurePa: 101325 });
    expect(NO_AIR.relativeHumidity).toBeUndefined();
  });
});
