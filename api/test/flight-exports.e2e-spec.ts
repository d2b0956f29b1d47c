import { gpx, kml } from '@tmcw/togeojson';
import { DOMParser } from '@xmldom/xmldom';
import { Ajv } from 'ajv';
import featureCollectionSchema from 'geojson-schema/FeatureCollection.json';
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  type DriftResult,
  flightDrift,
  flightProfileKind,
  type FlightProfileInput,
  type LandingArea,
  landingArea,
  PROFILE_HEADERS,
} from '@loftwright/buoyancy';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

// Outside references for the formats: the geojson.org JSON Schema (npm geojson-schema, validated
// with Ajv), @tmcw/togeojson reading KML and GPX through @xmldom/xmldom, and Papa Parse for the
// CSV (the parser the project already uses). Numbers are compared with the engine's own, run
// here on the same inputs: 6 decimals of a degree round-trip within 0.5e-6°.
const DEGREES_TOLERANCE = 0.5e-6 + 1e-12;
const LAUNCH_TIME = '2026-12-04T09:30:00+01:00';
const TITLE = 'Dune <hill> & "co", ridge';

const FLIGHT: FlightProfileInput = {
  ...flightProfileKind.example,
  launch: { altitudeM: 120, latitudeDeg: 52.2, longitudeDeg: 0.12, time: LAUNCH_TIME },
  wind: {
    layers: [
      { heightM: 0, directionDeg: 250, speedMS: 6 },
      { heightM: 10000, directionDeg: 270, speedMS: 30 },
      { heightM: 30000, directionDeg: 90, speedMS: 8 },
    ],
  },
  landingArea: { runs: 40, seed: 7 },
  timeStepS: 5,
};
const NO_WIND: FlightProfileInput = { ...flightProfileKind.example };

interface ParsedFeature {
  geometry: { type: string; coordinates: unknown };
  properties: Record<string, unknown>;
}

const xml = (text: string) => new DOMParser().parseFromString(text, 'text/xml');

function expectNearTrack(coordinates: number[][], drift: DriftResult): void {
  expect(coordinates).toHaveLength(drift.track.length);
  drift.track.forEach((point, index) => {
    const [lon = NaN, lat = NaN, alt = NaN] = coordinates[index] ?? [];
    expect(Math.abs(lon - point.longitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
    expect(Math.abs(lat - point.latitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
    expect(Math.abs(alt - point.altitudeM)).toBeLessThanOrEqual(0.05 + 1e-9);
  });
}

describe('flight exports (track and profile downloads, landing area)', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let other: TestUser;
  let flightId: string;
  let noWindId: string;
  let liftCheckId: string;
  let drift: DriftResult;
  let area: LandingArea;
  const http = () => request(testApp.app.getHttpServer());
  const url = (id: string, file: string, version = 1) =>
    `/api/calculations/${id}/versions/${version}/exports/${file}`;

  beforeAll(async () => {
    testApp = await createTestApp();
    owner = await createUser(testApp.app, ['designer'], 'owner');
    other = await createUser(testApp.app, ['designer'], 'other');
    const create = async (title: string, kind: string, inputs: unknown): Promise<string> => {
      const created = await http()
        .post('/api/calculations')
        .set(owner.auth)
        .send({ title, kind, inputs });
      expect(created.status).toBe(201);
      return created.body.id as string;
    };
    flightId = await create(TITLE, 'flight-profile', FLIGHT);
    noWindId = await create('Calm day', 'flight-profile', NO_WIND);
    liftCheckId = await create('A lift check', 'lift-check', liftCheckInputs());
    const computed = flightDrift(FLIGHT);
    if (!computed) throw new Error('the fixture flight has no drift');
    drift = computed;
    area = landingArea(FLIGHT);
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('sends GeoJSON that the geojson.org schema accepts, with the track and both areas', async () => {
    const response = await http().get(url(flightId, 'track.geojson')).set(owner.auth);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/geo+json; charset=utf-8');
    expect(response.headers['content-disposition']).toBe(
      `attachment; filename="Dune-hill-co-ridge-v1-track.geojson"; filename*=UTF-8''Dune-hill-co-ridge-v1-track.geojson`,
    );
    const collection = JSON.parse(response.text) as { features: ParsedFeature[] };
    const validate = new Ajv({ strict: false }).compile(featureCollectionSchema);
    expect(validate(collection), JSON.stringify(validate.errors)).toBe(true);
    expectNearTrack(collection.features[0]?.geometry.coordinates as number[][], drift);
    const polygons = collection.features.filter((feature) => feature.geometry.type === 'Polygon');
    expect(polygons.map((polygon) => polygon.properties.name)).toEqual(
      area.regions.map((region) => `${Math.round(region.probability * 100)} % landing area`),
    );
    expect(polygons).toHaveLength(2);
    polygons.forEach((polygon, index) => {
      // The engine draws its boundaries closed and counter-clockwise, so they come out as given.
      const [exterior = []] = polygon.geometry.coordinates as number[][][];
      const boundary = area.regions[index]?.boundary ?? [];
      expect(exterior).toHaveLength(boundary.length);
      boundary.forEach((point, vertex) => {
        const [lon = NaN, lat = NaN] = exterior[vertex] ?? [];
        expect(Math.abs(lon - point.longitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
        expect(Math.abs(lat - point.latitudeDeg)).toBeLessThanOrEqual(DEGREES_TOLERANCE);
      });
    });
  });

  it('sends KML that parses back to the named points, the track and both areas', async () => {
    const response = await http().get(url(flightId, 'track.kml')).set(owner.auth);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe(
      'application/vnd.google-earth.kml+xml; charset=utf-8',
    );
    const document = xml(response.text);
    expect(document.getElementsByTagName('name')[0]?.textContent).toBe(TITLE);
    const features = kml(document).features as unknown as ParsedFeature[];
    expect(features.map((feature) => feature.properties.name)).toEqual([
      'Flight track',
      'Launch',
      'Burst',
      'Landing',
      '50 % landing area',
      '95 % landing area',
    ]);
    expectNearTrack(features[0]?.geometry.coordinates as number[][], drift);
    const landing = features[3]?.geometry.coordinates as number[];
    expect(Math.abs((landing[0] ?? NaN) - drift.landing.longitudeDeg)).toBeLessThanOrEqual(
      DEGREES_TOLERANCE,
    );
    expect(features.filter((feature) => feature.geometry.type === 'Polygon')).toHaveLength(2);
  });

  it('sends GPX whose track points carry the launch time plus the time since launch', async () => {
    const response = await http().get(url(flightId, 'track.gpx')).set(owner.auth);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/gpx+xml; charset=utf-8');
    const features = gpx(xml(response.text)).features as unknown as ParsedFeature[];
    const track = features.find((feature) => feature.properties.name === 'Flight track');
    expectNearTrack(track?.geometry.coordinates as number[][], drift);
    const times = (track?.properties.coordinateProperties as { times: string[] }).times;
    expect(times[0]).toBe('2026-12-04T08:30:00.000Z');
    expect(Date.parse(times.at(-1) ?? '') - Date.parse(LAUNCH_TIME)).toBe(
      Math.round(drift.landing.timeS * 1000),
    );
    const names = features.map((feature) => feature.properties.name);
    expect(names).toEqual(expect.arrayContaining(['Launch', 'Burst', 'Landing']));
    expect(names.filter((name) => String(name).endsWith('landing area'))).toHaveLength(2);
  });

  it('sends the profile as CSV with headings in words and the places along the track', async () => {
    const response = await http().get(url(flightId, 'profile.csv')).set(owner.auth);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
    const parsed = Papa.parse<string[]>(response.text.replace(/^\uFEFF/, '').trim());
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual([
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
    const last = rows.at(-1) ?? [];
    expect(Number(last[7])).toBeCloseTo(drift.landing.latitudeDeg, 6);
    expect(Number(last[8])).toBeCloseTo(drift.landing.longitudeDeg, 6);
    expect(last[4]).toBe('');
  });

  it('answers the landing area the engine computes from the saved inputs', async () => {
    const response = await http()
      .get(`/api/calculations/${flightId}/versions/1/landing-area`)
      .set(owner.auth);
    expect(response.status).toBe(200);
    expect(response.body).toEqual(JSON.parse(JSON.stringify(area)));
    expect(response.body.regions).toHaveLength(2);
  });

  it('hides what the caller may not read and refuses unknown files or versions', async () => {
    expect((await http().get(url(flightId, 'track.kml')).set(other.auth)).status).toBe(404);
    expect(
      (await http().get(`/api/calculations/${flightId}/versions/1/landing-area`).set(other.auth))
        .status,
    ).toBe(404);
    expect((await http().get(url(flightId, 'track.shp')).set(owner.auth)).status).toBe(404);
    expect(
      (
        await http()
          .get(url(flightId, 'track.kml', 9))
          .set(owner.auth)
      ).status,
    ).toBe(404);
    expect((await http().get(url(flightId, 'track.kml'))).status).toBe(401);
  });

  it('refuses a track of a version with no wind, and of another kind, naming the field', async () => {
    const calm = await http().get(url(noWindId, 'track.gpx')).set(owner.auth);
    expect(calm.status).toBe(422);
    expect(calm.body.field).toBe('wind');
    expect(calm.body.message).toBe(
      'Winds aloft: this version has none, so it has no ground track.',
    );
    const unplaced = { altitudeM: FLIGHT.launch.altitudeM, time: LAUNCH_TIME };
    const created = await http()
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Unplaced', kind: 'flight-profile', inputs: { ...FLIGHT, launch: unplaced } });
    const nowhere = await http().get(url(created.body.id, 'track.kml')).set(owner.auth);
    expect(nowhere.status).toBe(422);
    expect(nowhere.body.field).toBe('launch.latitudeDeg');
    const lift = await http().get(url(liftCheckId, 'track.geojson')).set(owner.auth);
    expect(lift.status).toBe(422);
    expect(lift.body.field).toBe('kind');
    const profile = await http().get(url(noWindId, 'profile.csv')).set(owner.auth);
    expect(profile.status).toBe(200);
    const [header] = Papa.parse<string[]>(profile.text.replace(/^\uFEFF/, '').trim()).data;
    expect(header).toEqual([
      PROFILE_HEADERS.time,
      PROFILE_HEADERS.altitude,
      PROFILE_HEADERS.verticalSpeed,
      PROFILE_HEADERS.diameter,
    ]);
  });
});
