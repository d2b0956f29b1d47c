import type { DriftPoint } from '../flight/drift.js';
import {
  EXPORT_DIGITS,
  exteriorRingPieces,
  type FlightGeography,
  flightTrackPieces,
  launchLongitudeDeg,
  namedFlightPoints,
  pointTimeText,
  regionName,
  rounded,
  TRACK_NAME,
} from './flight-geography.js';

/** A position of RFC 7946 section 3.1.1: longitude, latitude and, where known, altitude [m]. */
export type GeoJsonPosition = [number, number] | [number, number, number];

export type GeoJsonGeometry =
  | { type: 'Point'; coordinates: GeoJsonPosition }
  | { type: 'LineString'; coordinates: GeoJsonPosition[] }
  | { type: 'MultiLineString'; coordinates: GeoJsonPosition[][] }
  | { type: 'Polygon'; coordinates: [number, number][][] }
  | { type: 'MultiPolygon'; coordinates: [number, number][][][] };

export interface GeoJsonFeature {
  type: 'Feature';
  geometry: GeoJsonGeometry;
  properties: Record<string, string | number | boolean | string[]>;
}

/** A landing-area note as the files carry it: its stable code and its words. */
export interface GeoJsonNote {
  code: string;
  message: string;
}

export interface GeoJsonFeatureCollection {
  type: 'FeatureCollection';
  features: GeoJsonFeature[];
  /**
   * Foreign members (RFC 7946 section 6.1) when a landing area is drawn: its runs left out and
   * its notes (stable codes), which belong to the whole estimate rather than to one region.
   */
  landingArea?: { runs: number; failedRuns: number; notes: GeoJsonNote[] };
}

function position(point: DriftPoint): [number, number, number] {
  return [
    rounded(point.longitudeDeg, EXPORT_DIGITS.degrees),
    rounded(point.latitudeDeg, EXPORT_DIGITS.degrees),
    rounded(point.altitudeM, EXPORT_DIGITS.metres),
  ];
}

/** The track: a LineString, or a MultiLineString cut at the antimeridian (RFC 7946 §3.1.9). */
function trackGeometry(geography: FlightGeography): GeoJsonGeometry {
  const pieces = flightTrackPieces(geography).map((piece) => piece.map(position));
  return pieces.length === 1
    ? { type: 'LineString', coordinates: pieces[0] as GeoJsonPosition[] }
    : { type: 'MultiLineString', coordinates: pieces };
}

/** A region: a Polygon, or a MultiPolygon cut at the antimeridian (RFC 7946 §3.1.9). */
function regionGeometry(
  boundary: Parameters<typeof exteriorRingPieces>[0],
  referenceDeg: number,
): GeoJsonGeometry {
  const rings = exteriorRingPieces(boundary, referenceDeg);
  return rings.length === 1
    ? { type: 'Polygon', coordinates: [rings[0] as [number, number][]] }
    : { type: 'MultiPolygon', coordinates: rings.map((ring) => [ring]) };
}

function withTime(
  properties: GeoJsonFeature['properties'],
  time: string | undefined,
): GeoJsonFeature['properties'] {
  return time === undefined ? properties : { ...properties, time };
}

/**
 * A flight as a GeoJSON FeatureCollection (RFC 7946): the track as a LineString with altitudes
 * above mean sea level, Points for launch, burst and landing, and a Polygon for each landing
 * region (counter-clockwise, closed). A track or region across the antimeridian is cut there into
 * a MultiLineString or MultiPolygon, as RFC 7946 section 3.1.9 asks; every longitude stays in
 * −180 to 180. Landing regions carry the runs left out (`failedRuns`) and the notes' codes
 * (`noteCodes`); the collection carries the notes' words in a foreign member `landingArea`. Every feature has a `name` (product words) and a `role`
 * (launch, burst, landing, track, landing-area) for programs; points carry their time since
 * launch [s] and altitude [m], and their UTC time when the launch time is known. RFC 7946 has no
 * altitude reference; these are metres above mean sea level, as the engine computes them.
 */
export function flightGeoJson(geography: FlightGeography): GeoJsonFeatureCollection {
  const { drift, launchTime } = geography;
  const track: GeoJsonFeature = {
    type: 'Feature',
    geometry: trackGeometry(geography),
    properties: {
      name: TRACK_NAME,
      role: 'track',
      title: geography.title,
      flightTimeS: rounded(drift.flightTimeS, EXPORT_DIGITS.seconds),
      groundDistanceM: rounded(drift.groundDistanceM, EXPORT_DIGITS.metres),
      initialBearingDeg: rounded(drift.initialBearingDeg, 2),
      landed: drift.landed,
    },
  };
  const points = namedFlightPoints(drift).map(({ name, role, point }): GeoJsonFeature => ({
    type: 'Feature',
    geometry: { type: 'Point', coordinates: position(point) },
    properties: withTime(
      {
        name,
        role,
        timeS: rounded(point.timeS, EXPORT_DIGITS.seconds),
        altitudeM: rounded(point.altitudeM, EXPORT_DIGITS.metres),
      },
      pointTimeText(launchTime, point.timeS),
    ),
  }));
  const area = geography.landingArea;
  const notes = (area?.notes ?? []).map(({ code, message }) => ({ code, message }));
  const regions = (area?.regions ?? []).map((region): GeoJsonFeature => ({
    type: 'Feature',
    geometry: regionGeometry(region.boundary, launchLongitudeDeg(geography)),
    properties: {
      name: regionName(region),
      role: 'landing-area',
      probability: region.probability,
      areaM2: Math.round(region.areaM2),
      failedRuns: area?.failedRuns ?? 0,
      noteCodes: notes.map((note) => note.code),
    },
  }));
  const collection: GeoJsonFeatureCollection = {
    type: 'FeatureCollection',
    features: [track, ...points, ...regions],
  };
  if (!area) return collection;
  return {
    ...collection,
    landingArea: { runs: area.runs.length + area.failedRuns, failedRuns: area.failedRuns, notes },
  };
}

/** The GeoJSON as compact JSON text with a final newline. */
export function flightGeoJsonText(geography: FlightGeography): string {
  return `${JSON.stringify(flightGeoJson(geography))}\n`;
}
