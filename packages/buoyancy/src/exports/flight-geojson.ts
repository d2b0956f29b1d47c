import type { DriftPoint } from '../flight/drift.js';
import {
  EXPORT_DIGITS,
  exteriorRing,
  type FlightGeography,
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
  | { type: 'Polygon'; coordinates: [number, number][][] };

export interface GeoJsonFeature {
  type: 'Feature';
  geometry: GeoJsonGeometry;
  properties: Record<string, string | number | boolean>;
}

export interface GeoJsonFeatureCollection {
  type: 'FeatureCollection';
  features: GeoJsonFeature[];
}

function position(point: DriftPoint): [number, number, number] {
  return [
    rounded(point.longitudeDeg, EXPORT_DIGITS.degrees),
    rounded(point.latitudeDeg, EXPORT_DIGITS.degrees),
    rounded(point.altitudeM, EXPORT_DIGITS.metres),
  ];
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
 * region (counter-clockwise, closed). Every feature has a `name` (product words) and a `role`
 * (launch, burst, landing, track, landing-area) for programs; points carry their time since
 * launch [s] and altitude [m], and their UTC time when the launch time is known. RFC 7946 has no
 * altitude reference; these are metres above mean sea level, as the engine computes them.
 */
export function flightGeoJson(geography: FlightGeography): GeoJsonFeatureCollection {
  const { drift, launchTime } = geography;
  const track: GeoJsonFeature = {
    type: 'Feature',
    geometry: { type: 'LineString', coordinates: drift.track.map(position) },
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
  const regions = (geography.landingArea?.regions ?? []).map((region): GeoJsonFeature => ({
    type: 'Feature',
    geometry: { type: 'Polygon', coordinates: [exteriorRing(region.boundary)] },
    properties: {
      name: regionName(region),
      role: 'landing-area',
      probability: region.probability,
      areaM2: Math.round(region.areaM2),
    },
  }));
  return { type: 'FeatureCollection', features: [track, ...points, ...regions] };
}

/** The GeoJSON as compact JSON text with a final newline. */
export function flightGeoJsonText(geography: FlightGeography): string {
  return `${JSON.stringify(flightGeoJson(geography))}\n`;
}
