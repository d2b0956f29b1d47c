import { gpx, kml } from '@tmcw/togeojson';
import { DOMParser } from '@xmldom/xmldom';
import { Ajv } from 'ajv';
import featureCollectionSchema from 'geojson-schema/FeatureCollection.json' with { type: 'json' };
import { describe, expect, it } from 'vitest';
import { driftTrack, type DriftResult } from '../flight/drift.js';
import { flightPath } from '../flight/flight-path.js';
import { flightProfileKind } from '../kinds/flight-profile.kind.js';
import type { GroundPoint, LandingArea } from '../landing/landing-area-types.js';
import { windProfile } from '../wind/wind-profile.js';
import { flightGeoJson } from './flight-geojson.js';
import { flightGpx } from './flight-gpx.js';
import { flightKml } from './flight-kml.js';
import { fixedText } from './flight-geography.js';
import { xmlText } from './xml-text.js';

// Parsers and schema used as the outside reference: the geojson.org JSON Schema (package
// geojson-schema, validated with Ajv), and @tmcw/togeojson reading KML and GPX through
// @xmldom/xmldom. Coordinates are written to 6 decimals, so they round-trip within 0.5e-6°.
const DEGREES_TOLERANCE = 0.5e-6 + 1e-12;
const path = flightPath(flightProfileKind.example);
const drift: DriftResult = driftTrack({
  launch: { latitudeDeg: 52.2, longitudeDeg: 0.12, altitudeM: 120 },
  ascent: path.ascent,
  descent: path.descent,
  wind: windProfile({
    layers: [
      { heightM: 0, directionDeg: 250, speedMS: 6 },
      { heightM: 10000, directionDeg: 270, speedMS: 30 },
      { heightM: 30000, directionDeg: 90, speedMS: 8 },
    ],
  }),
});
const LAUNCH_TIME = '2026-12-04T09:30:00+01:00';

function ring(centre: GroundPoint, radiusDeg: number, clockwise: boolean): GroundPoint[] {
  const points = Array.from({ length: 12 }, (_, index) => {
    const angle = ((clockwise ? -1 : 1) * index * Math.PI) / 6;
    return {
      latitudeDeg: centre.latitudeDeg + radiusDeg * Math.sin(angle),
      longitudeDeg: centre.longitudeDeg + radiusDeg * Math.cos(angle),
    };
  });
  return [...points, points[0] as GroundPoint];
}

// A hand-made landing area around the landing point: the 95 % ring is given clockwise and must
// come out counter-clockwise.
const landing = drift.landing;
const landingArea: LandingArea = {
  runs: [],
  regions: [
    { probability: 0.5, boundary: ring(landing, 0.02, false), boundaryEastNorthM: [], areaM2: 1 },
    { probability: 0.95, boundary: ring(landing, 0.05, true), boundaryEastNorthM: [], areaM2: 2 },
  ],
  nominal: { ...landing, flightTimeS: drift.flightTimeS, burstAltitudeM: drift.burst.altitudeM },
  spreads: { burstDiameter: 0.07, ascentRate: 0.05, descentDrag: 0.1, windSpeed: 0.1 },
  seed: 1,
  failedRuns: 0,
};
const geography = {
  title: 'Test <flight> & "friends"',
  drift,
  landingArea,
  launchTime: LAUNCH_TIME,
};

interface ParsedFeature {
  geometry: { type: string; coordinates: unknown };
  properties: Record<string, unknown>;
}

function parseXml(text: string) {
  return new DOMParser().parseFromString(text, 'text/xml');
}

/** Shoelace in (lon, lat), written here independently of the exporter: > 0 counter-clockwise. */
function shoelace(positions: readonly number[][]): number {
  let sum = 0;
  for (let i = 1; i < positions.length; i += 1) {
    const [x0 = NaN, y0 = NaN] = positions[i - 1] ?? [];
    const [x1 = NaN, y1 = NaN] = positions[i] ?? [];
    sum += x0 * y1 - x1 * y0;
  }
  return sum / 2;
}

function expectNearTrack(coordinates: number[][], withAltitude: boolean): void {
  expect(coordinates).toHaveLength(drift.track.length);
  drift.track.forEach((point, index) => {
    const [lon = NaN, lat = NaN, alt = NaN] = coordinates[index] ?? [];
    expect(Math.abs(lon - point.longitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
    expect(Math.abs(lat - point.latitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
    if (withAltitude) expect(Math.abs(alt - point.altitudeM)).toBeLessThanOrEqual(0.05 + 1e-9);
  });
}

describe('flight GeoJSON', () => {
  const collection = flightGeoJson(geography);

  it('is a FeatureCollection by the geojson.org schema', () => {
    const validate = new Ajv({ strict: false }).compile(featureCollectionSchema);
    expect(validate(collection), JSON.stringify(validate.errors)).toBe(true);
  });

  it('holds the track in lon, lat, altitude order, the named points and both areas', () => {
    const features = collection.features as unknown as ParsedFeature[];
    expect(features.map((feature) => feature.properties.name)).toEqual([
      'Flight track',
      'Launch',
      'Burst',
      'Landing',
      '50 % landing area',
      '95 % landing area',
    ]);
    expectNearTrack(features[0]?.geometry.coordinates as number[][], true);
    expect(features[1]?.properties.time).toBe('2026-12-04T08:30:00.000Z');
    const polygons = features.filter((feature) => feature.geometry.type === 'Polygon');
    expect(polygons).toHaveLength(2);
    for (const polygon of polygons) {
      const [exterior = []] = polygon.geometry.coordinates as number[][][];
      expect(exterior[0]).toEqual(exterior.at(-1));
      // RFC 7946 section 3.1.6: exterior rings counter-clockwise.
      expect(shoelace(exterior)).toBeGreaterThan(0);
    }
  });
});

describe('flight KML', () => {
  const text = flightKml(geography);
  const document = parseXml(text);
  const features = kml(document).features as unknown as ParsedFeature[];

  it('parses back to the track, the named points and both areas', () => {
    expect(features.map((feature) => feature.properties.name)).toEqual([
      'Flight track',
      'Launch',
      'Burst',
      'Landing',
      '50 % landing area',
      '95 % landing area',
    ]);
    expectNearTrack(features[0]?.geometry.coordinates as number[][], true);
    const polygons = features.filter((feature) => feature.geometry.type === 'Polygon');
    expect(polygons).toHaveLength(2);
    const [exterior = []] = polygons[1]?.geometry.coordinates as number[][][];
    expect(shoelace(exterior)).toBeGreaterThan(0);
    expect(features[3]?.properties.timestamp).toBe(
      new Date(Date.parse(LAUNCH_TIME) + Math.round(drift.landing.timeS * 1000)).toISOString(),
    );
  });

  it('escapes the title and draws the track at absolute altitudes', () => {
    const name = document.getElementsByTagName('Document')[0]?.getElementsByTagName('name')[0];
    expect(name?.textContent).toBe(geography.title);
    const line = document.getElementsByTagName('LineString')[0];
    expect(line?.getElementsByTagName('altitudeMode')[0]?.textContent).toBe('absolute');
  });
});

describe('flight GPX', () => {
  const features = gpx(parseXml(flightGpx(geography))).features as unknown as ParsedFeature[];

  it('holds waypoints, the timed track and one track per area', () => {
    // togeojson lists tracks before waypoints.
    expect(features.map((feature) => feature.properties.name)).toEqual([
      'Flight track',
      '50 % landing area',
      '95 % landing area',
      'Launch',
      'Burst',
      'Landing',
    ]);
    const track = features[0] as ParsedFeature;
    expectNearTrack(track.geometry.coordinates as number[][], true);
    const times = (track.properties.coordinateProperties as { times: string[] }).times;
    expect(times).toHaveLength(drift.track.length);
    const launchMs = Date.parse(LAUNCH_TIME);
    expect(Date.parse(times.at(-1) ?? '') - launchMs).toBe(Math.round(drift.landing.timeS * 1000));
    expect(times[0]).toBe('2026-12-04T08:30:00.000Z');
    const [lon = NaN, lat = NaN] = features[5]?.geometry.coordinates as number[];
    expect(Math.abs(lon - drift.landing.longitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
    expect(Math.abs(lat - drift.landing.latitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
  });

  it('writes no times without a launch time', () => {
    const text = flightGpx({ title: 'No clock', drift });
    expect(text).not.toContain('<time>');
    expect(text).not.toContain('landing area');
  });
});

describe('landing-area notes and left-out runs in the files', () => {
  const noted = {
    ...geography,
    landingArea: {
      ...landingArea,
      runs: Array.from({ length: 37 }, () => landingArea.nominal),
      failedRuns: 3,
      notes: [{ code: 'landing-area-widened', severity: 'note' as const, message: 'Widened.' }],
    },
  };

  it('GeoJSON: on each region, and in words on the collection, still valid by the schema', () => {
    const collection = flightGeoJson(noted);
    const validate = new Ajv({ strict: false }).compile(featureCollectionSchema);
    expect(validate(collection), JSON.stringify(validate.errors)).toBe(true);
    const regions = collection.features.filter((f) => f.properties.role === 'landing-area');
    for (const region of regions) {
      expect(region.properties.failedRuns).toBe(3);
      expect(region.properties.noteCodes).toEqual(['landing-area-widened']);
    }
    expect(collection.landingArea).toEqual({
      runs: 40,
      failedRuns: 3,
      notes: [{ code: 'landing-area-widened', message: 'Widened.' }],
    });
    expect(flightGeoJson(geography).landingArea?.notes).toEqual([]);
  });

  it('KML: in each region’s description and ExtendedData', () => {
    const features = kml(parseXml(flightKml(noted))).features as unknown as ParsedFeature[];
    const region = features.find((feature) => feature.properties.name === '95 % landing area');
    expect(String(region?.properties.description)).toContain('37 of 40 runs landed; 3 left out.');
    expect(String(region?.properties.description)).toContain('Widened. [landing-area-widened]');
    expect(region?.properties.failedRuns).toBe('3');
  });
});

describe('export text helpers', () => {
  it('escapes XML and drops characters XML 1.0 cannot hold', () => {
    expect(xmlText(`a<b>&"c'\u0001`)).toBe('a&lt;b&gt;&amp;&quot;c&apos;');
  });

  it('writes fixed digits without a negative zero', () => {
    expect(fixedText(-0.00000004, 6)).toBe('0.000000');
    expect(fixedText(-1.25e-7, 1)).toBe('0.0');
    expect(fixedText(-12.34567, 2)).toBe('-12.35');
  });
});
