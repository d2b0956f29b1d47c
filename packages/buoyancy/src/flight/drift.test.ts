import fc from 'fast-check';
import { Geodesic } from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { ComputationError, InputError } from '../errors.js';
import { flightProfileKind } from '../kinds/flight-profile.kind.js';
import { evaluate } from '../kinds/registry.js';
import { windComponentsMS, windProfile, type WindProfile } from '../wind/wind-profile.js';
import { driftTrack, type DriftResult } from './drift.js';
import { flightPath, type FlightPathPoint } from './flight-path.js';

// Reference library throughout: geographiclib-geodesic (C. F. F. Karney, "Algorithms for
// geodesics", J. Geodesy 87 (2013) 43–55), Geodesic.WGS84 Direct and Inverse.
const WGS84 = Geodesic.WGS84;
const path = flightPath(flightProfileKind.example);
const flightTimeS = (path.descent.at(-1) ?? path.ascent.at(-1))?.timeS ?? NaN;

function uniform(directionDeg: number, speedMS: number): WindProfile {
  return windProfile({
    layers: [
      { heightM: -500, directionDeg, speedMS },
      { heightM: 50000, directionDeg, speedMS },
    ],
  });
}

function drift(wind: WindProfile, latitudeDeg = 52.2, longitudeDeg = 0.12): DriftResult {
  return driftTrack({
    launch: { latitudeDeg, longitudeDeg, altitudeM: 120 },
    ascent: path.ascent,
    descent: path.descent,
    wind,
  });
}

/** Metres between two points (GeographicLib Inverse). */
function separationM(a: { latitudeDeg: number; longitudeDeg: number }, lat: number, lon: number) {
  return WGS84.Inverse(a.latitudeDeg, a.longitudeDeg, lat, lon).s12 ?? NaN;
}

/**
 * The track as an independent chain of GeographicLib Direct steps: for each step of the path, the
 * wind at the step's mid altitude (u/v linear in height, computed here) carries the point along a
 * geodesic of that length and azimuth.
 */
function chainedDirect(
  latitudeDeg: number,
  longitudeDeg: number,
  points: readonly FlightPathPoint[],
  windAtM: (altitudeM: number) => { uMS: number; vMS: number },
) {
  let lat = latitudeDeg;
  let lon = longitudeDeg;
  for (let index = 1; index < points.length; index += 1) {
    const a = points[index - 1] as FlightPathPoint;
    const b = points[index] as FlightPathPoint;
    const { uMS, vMS } = windAtM((a.altitudeM + b.altitudeM) / 2);
    const dt = b.timeS - a.timeS;
    const distance = Math.hypot(uMS, vMS) * dt;
    if (distance === 0) continue;
    const step = WGS84.Direct(lat, lon, (Math.atan2(uMS, vMS) * 180) / Math.PI, distance);
    lat = step.lat2 ?? NaN;
    lon = step.lon2 ?? NaN;
  }
  return { lat, lon };
}

describe('flightPath', () => {
  it('is the path the flight-profile kind reports (same times to burst and on the ground)', () => {
    const result = evaluate('flight-profile', flightProfileKind.example);
    expect(path.end).toBe('burst');
    expect(path.ascent.at(-1)?.timeS).toBeCloseTo(result.outputs.ascentTime?.value ?? NaN, 9);
    expect(flightTimeS).toBeCloseTo(result.outputs.flightTime?.value ?? NaN, 9);
    expect(path.ascent.at(-1)?.altitudeM).toBeCloseTo(
      result.outputs.burstAltitude?.value ?? NaN,
      6,
    );
    expect(path.descent.at(-1)?.altitudeM).toBeCloseTo(120, 9);
  });
});

describe('driftTrack', () => {
  it('in a uniform south wind lands where GeographicLib Direct puts speed × time due north', () => {
    const result = drift(uniform(180, 10));
    const distanceM = 10 * flightTimeS;
    const reference = WGS84.Direct(52.2, 0.12, 0, distanceM);
    // Within 1 m per 10 km of track.
    expect(separationM(result.landing, reference.lat2 ?? NaN, reference.lon2 ?? NaN)).toBeLessThan(
      distanceM / 1e4,
    );
    expect(Math.abs(result.groundDistanceM - distanceM)).toBeLessThan(distanceM / 1e4);
    expect(Math.abs(result.initialBearingDeg)).toBeLessThan(0.01);
    expect(result.landing.northM).toBeCloseTo(distanceM, 6);
    expect(result.landing.eastM).toBeCloseTo(0, 6);
    expect(result.flightTimeS).toBeCloseTo(flightTimeS, 9);
    expect(result.landed).toBe(true);
  });

  it('in a uniform south-west wind follows the chained geodesic steps, and reports the inverse as GeographicLib does', () => {
    const result = drift(uniform(225, 15));
    const { uMS, vMS } = windComponentsMS(225, 15);
    const reference = chainedDirect(52.2, 0.12, [...path.ascent, ...path.descent], () => ({
      uMS,
      vMS,
    }));
    const distanceM = 15 * flightTimeS;
    expect(separationM(result.landing, reference.lat, reference.lon)).toBeLessThan(distanceM / 1e4);
    // Carried speed × time along the wind: east and north shares of a 45° wind.
    expect(result.landing.eastM).toBeCloseTo(distanceM / Math.SQRT2, 6);
    const inverse = WGS84.Inverse(
      52.2,
      0.12,
      result.landing.latitudeDeg,
      result.landing.longitudeDeg,
    );
    expect(Math.abs(result.groundDistanceM - (inverse.s12 ?? NaN))).toBeLessThan(0.5);
    expect(Math.abs(result.initialBearingDeg - (inverse.azi1 ?? NaN))).toBeLessThan(0.01);
  });

  it('in a sheared, veering profile follows the chained geodesic steps', () => {
    const levels = [
      { heightM: 0, directionDeg: 270, speedMS: 5 },
      { heightM: 3000, directionDeg: 300, speedMS: 15 },
      { heightM: 11000, directionDeg: 0, speedMS: 40 },
      { heightM: 14000, directionDeg: 90, speedMS: 10 },
      // Below the burst altitude, so the top of the flight is above the profile.
      { heightM: 16000, directionDeg: 120, speedMS: 20 },
    ];
    const wind = windProfile({ layers: levels });
    const result = drift(wind);
    const components = levels.map((level) => ({
      heightM: level.heightM,
      ...windComponentsMS(level.directionDeg, level.speedMS),
    }));
    const windAtM = (altitudeM: number) => {
      const upper = components.findIndex((level) => level.heightM > altitudeM);
      if (upper <= 0) return components.at(upper === 0 ? 0 : -1) ?? { uMS: 0, vMS: 0 };
      const low = components[upper - 1] as (typeof components)[number];
      const high = components[upper] as (typeof components)[number];
      const t = (altitudeM - low.heightM) / (high.heightM - low.heightM);
      return { uMS: low.uMS + t * (high.uMS - low.uMS), vMS: low.vMS + t * (high.vMS - low.vMS) };
    };
    const reference = chainedDirect(52.2, 0.12, [...path.ascent, ...path.descent], windAtM);
    const carriedM = result.track.reduce((sum, point, index) => {
      const before = result.track[index - 1];
      return before
        ? sum + Math.hypot(point.eastM - before.eastM, point.northM - before.northM)
        : sum;
    }, 0);
    expect(separationM(result.landing, reference.lat, reference.lon)).toBeLessThan(carriedM / 1e4);
    expect(result.burst.altitudeM).toBeGreaterThan(16000);
    expect(result.burst.altitudeM).toBeCloseTo(path.ascent.at(-1)?.altitudeM ?? NaN, 9);
    expect(result.notes.map((note) => note.code)).toContain('wind-above-profile');
  });

  it('in calm air lands at the launch site', () => {
    const result = drift(uniform(0, 0));
    expect(result.landing.latitudeDeg).toBe(52.2);
    expect(result.landing.longitudeDeg).toBe(0.12);
    expect(result.groundDistanceM).toBe(0);
    expect(result.initialBearingDeg).toBe(0);
  });

  it.each([
    [78.22, 15.65, 270, 20],
    [-80, 100, 135, 25],
    [0, 179.9, 270, 30],
  ])(
    'at latitude %s°, longitude %s° (wind from %s° at %s m/s) follows the chained geodesic steps',
    (latitudeDeg, longitudeDeg, directionDeg, speedMS) => {
      const result = drift(uniform(directionDeg, speedMS), latitudeDeg, longitudeDeg);
      const { uMS, vMS } = windComponentsMS(directionDeg, speedMS);
      const reference = chainedDirect(
        latitudeDeg,
        longitudeDeg,
        [...path.ascent, ...path.descent],
        () => ({ uMS, vMS }),
      );
      expect(separationM(result.landing, reference.lat, reference.lon)).toBeLessThan(
        (speedMS * flightTimeS) / 1e4,
      );
      expect(result.landing.longitudeDeg).toBeGreaterThan(-180);
      expect(result.landing.longitudeDeg).toBeLessThanOrEqual(180);
    },
  );

  it('refuses bad inputs by field path', () => {
    const wind = uniform(0, 5);
    const field = (action: () => unknown) => {
      try {
        action();
      } catch (error) {
        if (error instanceof InputError) return error.field;
        throw error;
      }
      return undefined;
    };
    expect(
      field(() =>
        driftTrack({
          launch: { latitudeDeg: 95, longitudeDeg: 0, altitudeM: 0 },
          ascent: path.ascent,
          wind,
        }),
      ),
    ).toBe('launch.latitudeDeg');
    expect(
      field(() =>
        driftTrack({
          launch: { latitudeDeg: 0, longitudeDeg: 0, altitudeM: 0 },
          ascent: [
            { timeS: 0, altitudeM: 0 },
            { timeS: 10, altitudeM: 50 },
            { timeS: 5, altitudeM: 60 },
          ],
          wind,
        }),
      ),
    ).toBe('ascent.2.timeS');
    expect(
      field(() =>
        driftTrack({
          launch: { latitudeDeg: 0, longitudeDeg: 0, altitudeM: 0 },
          ascent: [{ timeS: 0, altitudeM: Number.NaN }],
          wind,
        }),
      ),
    ).toBe('ascent.0.altitudeM');
  });

  it('says when the path never comes down', () => {
    const result = driftTrack({
      launch: { latitudeDeg: 10, longitudeDeg: 10, altitudeM: 0 },
      ascent: path.ascent,
      wind: uniform(90, 5),
    });
    expect(result.landed).toBe(false);
    expect(result.notes.map((note) => note.code)).toContain('drift-not-landed');
  });

  it('never lets NaN or Infinity out, whatever the profile and site (property)', () => {
    const levelArb = fc.record({
      directionDeg: fc.double({ min: 0, max: 360, noNaN: true }),
      speedMS: fc.double({ min: 0, max: 150, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(levelArb, { minLength: 2, maxLength: 8 }),
        fc.double({ min: -500, max: 20000, noNaN: true }),
        fc.double({ min: 100, max: 20000, noNaN: true }),
        fc.double({ min: -89, max: 89, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        fc.double({ min: 1000, max: 40000, noNaN: true }),
        (levels, bottomM, spacingM, latitudeDeg, longitudeDeg, burstM) => {
          const wind = windProfile({
            layers: levels.map((level, index) => ({
              ...level,
              heightM: Math.min(bottomM + index * spacingM, 50000 - (levels.length - index)),
            })),
          });
          const ascent = [0, 1, 2, 3].map((step) => ({
            timeS: step * 1000,
            altitudeM: (burstM * step) / 3,
          }));
          const descent = [{ timeS: 3600, altitudeM: 0 }];
          let result: DriftResult;
          try {
            result = driftTrack({
              launch: { latitudeDeg, longitudeDeg, altitudeM: 0 },
              ascent,
              descent,
              wind,
              maxStepS: 20,
            });
          } catch (error) {
            // Near a pole the model refuses rather than answering wrongly.
            if (error instanceof ComputationError) return;
            throw error;
          }
          const numbers = [
            result.groundDistanceM,
            result.initialBearingDeg,
            result.flightTimeS,
            ...result.track.flatMap((point) => [
              point.latitudeDeg,
              point.longitudeDeg,
              point.eastM,
              point.northM,
              point.altitudeM,
              point.timeS,
            ]),
          ];
          expect(numbers.every(Number.isFinite)).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });
});
