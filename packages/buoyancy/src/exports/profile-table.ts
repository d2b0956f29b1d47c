import type { CalculationResult, DataSeries } from '../derivation.js';
import type { DriftPoint, DriftResult } from '../flight/drift.js';
import { EXPORT_DIGITS, pointTimeText, rounded } from './flight-geography.js';

/** One column of the profile table: its heading (unit in words) and its cells' digits. */
export interface ProfileColumn {
  readonly header: string;
  /** Digits after the point, for number columns. */
  readonly digits?: number;
}

export type ProfileCell = number | string | null;

/** The flight profile as a table for CSV or a spreadsheet: headings, then a row per moment. */
export interface ProfileTable {
  readonly columns: readonly ProfileColumn[];
  readonly rows: readonly (readonly ProfileCell[])[];
}

export const PROFILE_HEADERS = {
  time: 'Time since launch (seconds)',
  clock: 'Time (UTC, ISO 8601)',
  altitude: 'Altitude above mean sea level (metres)',
  verticalSpeed: 'Vertical speed, up positive (metres per second)',
  diameter: 'Balloon diameter (metres)',
  east: 'Distance east of launch (metres)',
  north: 'Distance north of launch (metres)',
  latitude: 'Latitude (degrees north, WGS 84)',
  longitude: 'Longitude (degrees east, WGS 84)',
} as const;

interface ProfileMoment {
  timeS: number;
  altitudeM: number;
  verticalSpeedMS: number;
  diameterM: number | null;
}

function column(series: DataSeries, key: string): number {
  return series.columns.findIndex((candidate) => candidate.key === key);
}

/** The ascent and descent series of a flight-profile result, in time order. */
function profileMoments(result: CalculationResult): ProfileMoment[] {
  const moments: ProfileMoment[] = [];
  for (const name of ['ascent', 'descent']) {
    const series = result.series?.[name];
    if (!series) continue;
    const [time, altitude, rate, diameter] = ['time', 'altitude', 'ascentRate', 'diameter'].map(
      (key) => column(series, key),
    ) as [number, number, number, number];
    for (const row of series.rows) {
      moments.push({
        timeS: row[time] as number,
        altitudeM: row[altitude] as number,
        verticalSpeedMS: row[rate] as number,
        diameterM: diameter >= 0 ? (row[diameter] as number) : null,
      });
    }
  }
  return moments;
}

/**
 * The drift at a time since launch: linear between the track's points (the series are thinned
 * from the same integration, so most times are a track point's own).
 */
export function driftAt(track: readonly DriftPoint[], timeS: number): DriftPoint {
  let low = 0;
  let high = track.length - 1;
  if (timeS <= (track[0] as DriftPoint).timeS) return track[0] as DriftPoint;
  if (timeS >= (track[high] as DriftPoint).timeS) return track[high] as DriftPoint;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if ((track[middle] as DriftPoint).timeS <= timeS) low = middle;
    else high = middle;
  }
  const a = track[low] as DriftPoint;
  const b = track[high] as DriftPoint;
  const f = b.timeS === a.timeS ? 0 : (timeS - a.timeS) / (b.timeS - a.timeS);
  const mix = (x: number, y: number): number => x + f * (y - x);
  return {
    timeS,
    altitudeM: mix(a.altitudeM, b.altitudeM),
    latitudeDeg: mix(a.latitudeDeg, b.latitudeDeg),
    longitudeDeg: mix(a.longitudeDeg, b.longitudeDeg),
    eastM: mix(a.eastM, b.eastM),
    northM: mix(a.northM, b.northM),
  };
}

/**
 * The flight profile (a row per point of the published ascent and descent series, at most 600
 * each) with, when there is a drift, the distance east and north of launch and the latitude and
 * longitude at each time; with a launch time, the UTC time of each row. Numbers are rounded to
 * their column's digits; a cell that does not apply (diameter under the parachute) is null.
 */
export function flightProfileTable(
  result: CalculationResult,
  drift: DriftResult | null,
  launchTime?: string,
  /** Whether the flight has a launch site; without one, places are east and north only. */
  hasSite = true,
): ProfileTable {
  const h = PROFILE_HEADERS;
  const onMap = drift !== null && hasSite;
  const clock = launchTime !== undefined;
  const columns: ProfileColumn[] = [
    { header: h.time, digits: EXPORT_DIGITS.seconds },
    ...(clock ? [{ header: h.clock }] : []),
    { header: h.altitude, digits: EXPORT_DIGITS.metres },
    { header: h.verticalSpeed, digits: EXPORT_DIGITS.metresPerSecond },
    { header: h.diameter, digits: 3 },
    ...(drift
      ? [
          { header: h.east, digits: EXPORT_DIGITS.metres },
          { header: h.north, digits: EXPORT_DIGITS.metres },
        ]
      : []),
    ...(onMap
      ? [
          { header: h.latitude, digits: EXPORT_DIGITS.degrees },
          { header: h.longitude, digits: EXPORT_DIGITS.degrees },
        ]
      : []),
  ];
  const rows = profileMoments(result).map((moment): ProfileCell[] => {
    const place = drift ? driftAt(drift.track, moment.timeS) : null;
    const cells: ProfileCell[] = [
      moment.timeS,
      ...(clock ? [pointTimeText(launchTime, moment.timeS) ?? null] : []),
      moment.altitudeM,
      moment.verticalSpeedMS,
      moment.diameterM,
      ...(place ? [place.eastM, place.northM] : []),
      ...(place && onMap ? [place.latitudeDeg, place.longitudeDeg] : []),
    ];
    return cells.map((cell, index) => {
      const digits = columns[index]?.digits;
      return typeof cell === 'number' && digits !== undefined ? rounded(cell, digits) : cell;
    });
  });
  return { columns, rows };
}
