import { gpx, kml } from '@tmcw/togeojson';
import { DOMParser } from '@xmldom/xmldom';
import { Ajv } from 'ajv';
import featureCollectionSchema from 'geojson-schema/FeatureCollection.json' with { type: 'json' };
import { describe, expect, it } from 'vitest';
import { standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { flightDrift, landingArea } from '../landing/landing-area.js';
import { exteriorRing, exteriorRingPieces, signedAreaDeg2 } from './flight-geography.js';
import { flightGeoJson } from './flight-geojson.js';
import { flightGpx } from './flight-gpx.js';
import { flightKml } from './flight-kml.js';

// Outside references: RFC 7946 section 3.1.9 (a geometry crossing the antimeridian SHOULD be cut
// in two, as a MultiLineString or MultiPolygon), the geojson.org JSON Schema (Ajv), and
// @tmcw/togeojson reading the KML and GPX back. Everything else is plain geometry written here.

// A flight at 40° S carried east by a steady westerly, from 0° E first to find how far it goes.
const layers = [0, 10000, 20000, 30000].map((heightM) => ({
  heightM,
  directionDeg: 270,
  speedMS: 6,
  temperatureK: standardAtmosphere(heightM).temperatureK,
}));
const balloon = {
  envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' },
  parachute: { areaM2: 0.8 },
  wind: { layers },
} as const;
const probe = flightDrift({
  ...balloon,
  launch: { altitudeM: 20, latitudeDeg: -40, longitudeDeg: 0 },
});
const driftDeg = probe?.landing.longitudeDeg ?? Number.NaN;
// Launched so the nominal flight lands 0.01° east of the antimeridian: the track crosses it and
// the landing regions straddle it (the launch is near 179.5° E).
const launchLongitudeDeg = 180.01 - driftDeg;
const input = {
  ...balloon,
  launch: { altitudeM: 20, latitudeDeg: -40, longitudeDeg: launchLongitudeDeg },
};
const drift = flightDrift(input);
const area = landingArea(input, { runs: 40 });
if (!drift) throw new Error('expected a drift with a wind');
const geography = { title: 'Across the date line', drift, landingArea: area };

type Position = number[];

/** Largest longitude step between neighbours of a line [°]. */
function largestStepDeg(line: readonly Position[]): number {
  let largest = 0;
  for (let index = 1; index < line.length; index += 1) {
    const a = line[index - 1]?.[0] ?? Number.NaN;
    const b = line[index]?.[0] ?? Number.NaN;
    largest = Math.max(largest, Math.abs(b - a));
  }
  return largest;
}

/** Shoelace in (lon, lat), written here independently of the exporter: > 0 counter-clockwise. */
function shoelace(positions: readonly Position[]): number {
  let sum = 0;
  for (let i = 1; i < positions.length; i += 1) {
    const [x0 = NaN, y0 = NaN] = positions[i - 1] ?? [];
    const [x1 = NaN, y1 = NaN] = positions[i] ?? [];
    sum += x0 * y1 - x1 * y0;
  }
  return sum / 2;
}

/** The boundary with longitudes made continuous here (each within 180° of the one before). */
function continuousBoundary(boundary: readonly { latitudeDeg: number; longitudeDeg: number }[]) {
  let previous = launchLongitudeDeg;
  return boundary.map(({ latitudeDeg, longitudeDeg }) => {
    let lon = longitudeDeg;
    while (lon - previous > 180) lon -= 360;
    while (lon - previous < -180) lon += 360;
    previous = lon;
    return [lon, latitudeDeg];
  });
}

const inRange = (positions: readonly Position[]) =>
  positions.every(([lon = NaN]) => lon >= -180 && lon <= 180);

describe('a region away from the antimeridian', () => {
  it('comes out whole, in the order and from the point it was drawn', () => {
    const boundary = Array.from({ length: 13 }, (_, index) => ({
      latitudeDeg: 52 + 0.01 * Math.sin((index * Math.PI) / 6),
      longitudeDeg: 5 + 0.01 * Math.cos((index * Math.PI) / 6),
    }));
    expect(exteriorRingPieces(boundary, 5)).toEqual([exteriorRing(boundary, 5)]);
    expect(exteriorRing(boundary, 5)[0]).toEqual([5.01, 52]);
  });
});

describe('a flight across the antimeridian', () => {
  it('is set up as meant: launch near 179.5° E, landing just east of 180°', () => {
    expect(launchLongitudeDeg).toBeGreaterThan(179);
    expect(launchLongitudeDeg).toBeLessThan(180);
    expect(drift.landing.longitudeDeg).toBeLessThan(-179.9);
    const ring95 = exteriorRing(area.regions[1]?.boundary ?? [], launchLongitudeDeg);
    // Continuous near the launch: a small ring that turns counter-clockwise, not one round the globe.
    expect(
      Math.max(...ring95.map(([lon]) => lon)) - Math.min(...ring95.map(([lon]) => lon)),
    ).toBeLessThan(1);
    expect(signedAreaDeg2(ring95)).toBeGreaterThan(0);
    expect(Math.min(...ring95.map(([lon]) => lon))).toBeLessThan(180);
    expect(Math.max(...ring95.map(([lon]) => lon))).toBeGreaterThan(180);
  });

  it('GeoJSON cuts the track into a MultiLineString at ±180° (RFC 7946 §3.1.9)', () => {
    const collection = flightGeoJson(geography);
    const validate = new Ajv({ strict: false }).compile(featureCollectionSchema);
    expect(validate(collection), JSON.stringify(validate.errors)).toBe(true);
    const track = collection.features[0]?.geometry;
    expect(track?.type).toBe('MultiLineString');
    const [west = [], east = []] = (track?.coordinates ?? []) as Position[][];
    expect(west.at(-1)?.[0]).toBe(180);
    expect(east[0]?.[0]).toBe(-180);
    expect(west.at(-1)?.[1]).toBe(east[0]?.[1]);
    for (const line of [west, east]) {
      expect(inRange(line)).toBe(true);
      expect(largestStepDeg(line)).toBeLessThan(0.1);
    }
    // Every track point is still there, plus the two on the meridian.
    expect(west.length + east.length).toBe(drift.track.length + 2);
  });

  it('GeoJSON cuts each region into a MultiPolygon of counter-clockwise rings of the same area', () => {
    const collection = flightGeoJson(geography);
    const regions = collection.features.filter((f) => f.properties.role === 'landing-area');
    expect(regions).toHaveLength(2);
    regions.forEach((feature, index) => {
      expect(feature.geometry.type).toBe('MultiPolygon');
      const polygons = feature.geometry.coordinates as Position[][][];
      expect(polygons).toHaveLength(2);
      let pieces = 0;
      for (const [exterior = []] of polygons) {
        expect(exterior[0]).toEqual(exterior.at(-1));
        expect(inRange(exterior)).toBe(true);
        expect(shoelace(exterior)).toBeGreaterThan(0);
        pieces += shoelace(exterior);
      }
      // The pieces together cover the continuous ring (shoelace is additive under a cut); the
      // files round to 1e-6° (RFC 7946 §11.2), on a ring some 0.01° across, hence 1e-3.
      const whole = shoelace(continuousBoundary(area.regions[index]?.boundary ?? []));
      expect(Math.abs(pieces / Math.abs(whole) - 1)).toBeLessThan(1e-3);
    });
  });

  it('KML and GPX read back without a segment jumping round the globe', () => {
    const parse = (text: string) => new DOMParser().parseFromString(text, 'text/xml');
    const fromKml = kml(parse(flightKml(geography))).features;
    const fromGpx = gpx(parse(flightGpx(geography))).features;
    const lines: Position[][] = [];
    for (const feature of [...fromKml, ...fromGpx]) {
      const geometry = feature.geometry;
      if (!geometry) continue;
      const parts = geometry.type === 'GeometryCollection' ? geometry.geometries : [geometry];
      for (const part of parts) {
        if (part.type === 'LineString') lines.push(part.coordinates);
        if (part.type === 'MultiLineString') lines.push(...part.coordinates);
        if (part.type === 'Polygon') lines.push(...part.coordinates);
      }
    }
    // Track and two regions from each format, each cut in two.
    expect(lines.length).toBe(12);
    for (const line of lines) {
      expect(inRange(line)).toBe(true);
      expect(largestStepDeg(line)).toBeLessThan(0.1);
    }
  });
});
