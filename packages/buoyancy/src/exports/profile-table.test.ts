import { describe, expect, it } from 'vitest';
import { driftTrack } from '../flight/drift.js';
import { flightPath } from '../flight/flight-path.js';
import { flightProfileKind } from '../kinds/flight-profile.kind.js';
import { evaluate } from '../kinds/registry.js';
import { windProfile } from '../wind/wind-profile.js';
import { driftAt, flightProfileTable, PROFILE_HEADERS } from './profile-table.js';

// Checks the table against the engine's own series and drift (a format check, no new physics):
// every number must match its source to the column's printed digits.
const input = flightProfileKind.example;
const result = evaluate('flight-profile', input);
const path = flightPath(input);
const drift = driftTrack({
  launch: { latitudeDeg: -33.9, longitudeDeg: 151.2, altitudeM: 120 },
  ascent: path.ascent,
  descent: path.descent,
  wind: windProfile({
    layers: [
      { heightM: 0, directionDeg: 200, speedMS: 5 },
      { heightM: 20000, directionDeg: 300, speedMS: 25 },
    ],
  }),
});
const ascentRows = result.series?.ascent?.rows ?? [];
const descentRows = result.series?.descent?.rows ?? [];

describe('flight profile table', () => {
  it('has unit-bearing headings and a row per series point', () => {
    const table = flightProfileTable(result, drift, '2026-12-04T09:30:00+01:00');
    expect(table.columns.map((column) => column.header)).toEqual([
      PROFILE_HEADERS.time,
      PROFILE_HEADERS.clock,
      PROFILE_HEADERS.altitude,
      PROFILE_HEADERS.verticalSpeed,
      PROFILE_HEADERS.diameter,
      PROFILE_HEADERS.east,
      PROFILE_HEADERS.north,
      PROFILE_HEADERS.latitude,
      PROFILE_HEADERS.longitude,
    ]);
    expect(ascentRows.length).toBeGreaterThan(10);
    expect(descentRows.length).toBeGreaterThan(10);
    expect(table.rows).toHaveLength(ascentRows.length + descentRows.length);
    expect(table.rows[0]?.slice(0, 2)).toEqual([0, '2026-12-04T08:30:00.000Z']);
  });

  it('matches the series and the drift to the printed digits', () => {
    const table = flightProfileTable(result, drift);
    const last = table.rows.at(-1) ?? [];
    const [timeS, altitudeM, rateMS, diameterM, eastM, northM, lat, lon] = last as number[];
    const landingRow = descentRows.at(-1) ?? [];
    expect(timeS).toBeCloseTo(landingRow[0] ?? NaN, 2);
    expect(altitudeM).toBeCloseTo(landingRow[1] ?? NaN, 1);
    expect(rateMS).toBeLessThan(0);
    expect(rateMS).toBeCloseTo(landingRow[2] ?? NaN, 2);
    expect(diameterM).toBeNull();
    expect(eastM).toBeCloseTo(drift.landing.eastM, 1);
    expect(northM).toBeCloseTo(drift.landing.northM, 1);
    expect(lat).toBeCloseTo(drift.landing.latitudeDeg, 6);
    expect(lon).toBeCloseTo(drift.landing.longitudeDeg, 6);
    const firstAscent = ascentRows[0] ?? [];
    expect(table.rows[0]?.[3]).toBeCloseTo(firstAscent[3] ?? NaN, 3);
  });

  it('leaves out place columns without a drift', () => {
    const table = flightProfileTable(result, null);
    expect(table.columns).toHaveLength(4);
    expect(table.rows.every((row) => row.length === 4)).toBe(true);
  });

  it('keeps east and north but leaves out latitude and longitude for a flight without a site', () => {
    const table = flightProfileTable(result, drift, undefined, false);
    expect(table.columns.map((column) => column.header).slice(-2)).toEqual([
      PROFILE_HEADERS.east,
      PROFILE_HEADERS.north,
    ]);
    const last = table.rows.at(-1) ?? [];
    expect(last).toHaveLength(6);
    expect(last[4]).toBeCloseTo(drift.landing.eastM, 1);
  });

  it('interpolates the drift linearly between track points', () => {
    const a = drift.track[10];
    const b = drift.track[11];
    if (!a || !b) throw new Error('track too short');
    const middle = driftAt(drift.track, (a.timeS + b.timeS) / 2);
    expect(middle.eastM).toBeCloseTo((a.eastM + b.eastM) / 2, 9);
    expect(middle.latitudeDeg).toBeCloseTo((a.latitudeDeg + b.latitudeDeg) / 2, 12);
  });
});
