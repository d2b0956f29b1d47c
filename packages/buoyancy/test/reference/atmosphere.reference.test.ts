import { describe, expect, it } from 'vitest';
import { geometricAltitudeM, standardAtmosphere } from '../../src/index.js';
import { numberCell, readReferenceTable } from './support/read-csv.js';

// U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562): rows of its Table I as published and
// reproduced (see README.md in this folder for each row's provenance and tolerance).
const rows = readReferenceTable(new URL('./data/us-standard-atmosphere-1976.csv', import.meta.url));

describe('standardAtmosphere against the U.S. Standard Atmosphere 1976 tables', () => {
  it('reads every row of the reference table', () => {
    // A truncated file must fail, not pass on fewer rows.
    expect(rows).toHaveLength(20);
    const layersCovered = new Set(
      rows.map((row) => standardAtmosphere(altitudeOf(row)).layerIndex),
    );
    expect([...layersCovered].sort()).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });

  it('matches pressure and density within each row’s relative tolerance', () => {
    let worstRelativeError = 0;
    for (const row of rows) {
      const state = standardAtmosphere(altitudeOf(row));
      for (const [column, computed] of [
        ['pressure_pa', state.pressurePa],
        ['density_kg_m3', state.densityKgM3],
      ] as const) {
        const expected = numberCell(row, column);
        // A printed value is only known to one unit of its last digit (some reproductions
        // truncate rather than round); the row's own tolerance comes on top of that.
        const tolerance =
          printedPrecisionRelative(row[column] ?? '') + numberCell(row, 'relative_tolerance');
        const relativeError = Math.abs(computed / expected - 1);
        worstRelativeError = Math.max(worstRelativeError, relativeError);
        expect(
          relativeError,
          `${column} at ${row.altitude_kind} ${row.altitude_m} m (${row.source})`,
        ).toBeLessThan(tolerance);
      }
    }
    // The worst case stays inside the five significant digits the tables print.
    expect(worstRelativeError).toBeLessThan(1.5e-4);
  });

  it('matches the tabulated kinetic temperature to 0.01 K where the table prints it', () => {
    const withTemperature = rows.filter((row) => row.temperature_k !== undefined);
    expect(withTemperature.length).toBeGreaterThanOrEqual(15);
    for (const row of withTemperature) {
      const state = standardAtmosphere(altitudeOf(row));
      expect(Math.abs(state.temperatureK - numberCell(row, 'temperature_k'))).toBeLessThan(0.01);
    }
  });
});

function altitudeOf(row: Record<string, string | undefined>): number {
  const altitude = numberCell(row, 'altitude_m');
  return row.altitude_kind === 'geopotential' ? geometricAltitudeM(altitude) : altitude;
}

/** One unit of the last printed digit of `cell`, relative to its value ("110.90" -> 9e-5). */
function printedPrecisionRelative(cell: string): number {
  const [mantissa = '', exponent = '0'] = cell.toLowerCase().split('e');
  const decimals = mantissa.includes('.') ? (mantissa.split('.')[1] ?? '').length : 0;
  const unit = 10 ** (Number(exponent) - decimals);
  return unit / Math.abs(Number(cell));
}
