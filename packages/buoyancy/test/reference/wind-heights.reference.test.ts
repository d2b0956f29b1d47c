import { describe, expect, it } from 'vitest';
import {
  geometricAltitudeM,
  geopotentialAltitudeM,
  readWindProfile,
  windProfile,
} from '../../src/index.js';
import { numberCell, readReferenceTable } from './support/read-csv.js';

// Pressure altitudes of the standard pressure surfaces (wxonline.info, "Standard Atmosphere"; see
// README.md in this folder).
const pressureAltitudes = readReferenceTable(
  new URL('./data/standard-pressure-altitudes.csv', import.meta.url),
);
// U.S. Standard Atmosphere 1976, Table I rows (see README.md in this folder).
const ussa = readReferenceTable(new URL('./data/us-standard-atmosphere-1976.csv', import.meta.url));

describe('pressure levels without temperatures', () => {
  it('are placed at the standard pressure altitudes of the published table, within 1 m', () => {
    expect(pressureAltitudes).toHaveLength(10);
    const text = [
      'PRES DRCT SKNT',
      ...pressureAltitudes.map((row, index) => `${row.pressure_hpa} ${index * 10} 20`),
    ].join('\n');
    const reading = readWindProfile(text, {
      pressure: { column: 'PRES', unit: 'hPa' },
      direction: { column: 'DRCT' },
      speed: { column: 'SKNT', unit: 'kn' },
    });
    expect(reading.bad).toEqual([]);
    const heights = reading.profile?.heightsM ?? new Float64Array();
    expect(heights).toHaveLength(10);
    pressureAltitudes.forEach((row, index) => {
      // A pressure altitude is a geopotential height; the table prints whole feet.
      const expectedM = numberCell(row, 'pressure_altitude_ft') * 0.3048;
      expect(Math.abs(geopotentialAltitudeM(heights[index] ?? NaN) - expectedM)).toBeLessThan(1);
    });
  });
});

describe('pressure levels with temperatures (hypsometric equation)', () => {
  it('come back at the heights of the 1976 table’s rows up to 50 km, within 0.5 m', () => {
    const rows = ussa
      .filter((row) => row.temperature_k !== undefined)
      .map((row) => {
        const altitude = numberCell(row, 'altitude_m');
        return {
          heightM: row.altitude_kind === 'geopotential' ? geometricAltitudeM(altitude) : altitude,
          temperatureK: numberCell(row, 'temperature_k'),
          pressurePa: numberCell(row, 'pressure_pa'),
        };
      })
      .filter((row) => row.heightM <= 50000)
      .sort((a, b) => a.heightM - b.heightM);
    // Sea level, 1, 5, 11 km, the layer bases 11, 20, 32, 47 km', 15, 25, 47 and 50 km.
    expect(rows).toHaveLength(12);
    const [surface, ...aloft] = rows;
    if (!surface) throw new Error('no sea-level row');
    // The sea-level row gives its height; every other level only its pressure and temperature.
    const profile = windProfile({
      layers: [
        { ...surface, directionDeg: 0, speedMS: 5 },
        ...aloft.map(({ pressurePa, temperatureK }) => ({
          pressurePa,
          temperatureK,
          directionDeg: 0,
          speedMS: 5,
        })),
      ],
    });
    expect(profile.heightSources.slice(1).every((source) => source === 'hypsometric')).toBe(true);
    // Consecutive rows always lie within one layer of constant lapse rate, where the log-mean
    // temperature makes the equation exact. The printed digits (five of pressure, three
    // decimals of temperature) leave about 0.1 m per level; 0.5 m allows for their sum.
    aloft.forEach((row, index) => {
      expect(Math.abs((profile.heightsM[index + 1] ?? NaN) - row.heightM)).toBeLessThan(0.5);
    });
  });
});
