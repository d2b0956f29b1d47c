import { Geodesic } from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { ComputationError, InputError } from '../errors.js';
import { stepOnEllipsoid, wgs84Inverse, wgs84RadiiOfCurvature } from './geodesy.js';

// Reference library throughout: geographiclib-geodesic (C. F. F. Karney, "Algorithms for
// geodesics", J. Geodesy 87 (2013) 43–55), Geodesic.WGS84.
const WGS84 = Geodesic.WGS84;

describe('WGS 84 radii of curvature', () => {
  it.each([0, 30, 45, 60, 78.2, 89])(
    'give the metres per degree GeographicLib measures along a short geodesic at %s°',
    (latitudeDeg) => {
      const { meridionalM, primeVerticalM } = wgs84RadiiOfCurvature(latitudeDeg);
      // 10 m north and east with GeographicLib Direct: over 10 m the radii change by less than
      // 1e-8 of themselves, and the eastward geodesic leaves the parallel by less than that.
      const north = WGS84.Direct(latitudeDeg, 0, 0, 10);
      const east = WGS84.Direct(latitudeDeg, 0, 90, 10);
      const dPhi = ((north.lat2 ?? NaN) - latitudeDeg) * (Math.PI / 180);
      const dLambda = (east.lon2 ?? NaN) * (Math.PI / 180);
      expect(Math.abs(10 / dPhi / meridionalM - 1)).toBeLessThan(1e-7);
      expect(
        Math.abs(10 / (dLambda * Math.cos((latitudeDeg * Math.PI) / 180)) / primeVerticalM - 1),
      ).toBeLessThan(1e-7);
    },
  );
});

describe('a step from metres east and north to a new latitude and longitude', () => {
  // The direct problem on short legs: 10 km covered in 100 m steps, each step's east and north
  // parts taken from the reference geodesic's own azimuth at the step's middle (GeographicLib
  // Line.Position; the middle, as the step itself works at its mid latitude), must end within
  // 0.1 m of where GeographicLib Direct puts the 10 km point.
  it.each([
    [0, 45],
    [30, 90],
    [52.2, 200],
    [-45, 315],
    [70, 60],
    [85, 135],
  ])('follows GeographicLib Direct within 0.1 m over 10 km at %s° heading %s°', (lat, azi) => {
    const legM = 10_000;
    const stepM = 100;
    const line = WGS84.DirectLine(lat, 10, azi, legM);
    const position = new Float64Array([lat, 10]);
    for (let travelledM = 0; travelledM < legM; travelledM += stepM) {
      const azimuthDeg = line.Position(travelledM + stepM / 2).azi2 ?? NaN;
      const azimuth = (azimuthDeg * Math.PI) / 180;
      stepOnEllipsoid(position, stepM * Math.sin(azimuth), stepM * Math.cos(azimuth));
    }
    const reference = WGS84.Direct(lat, 10, azi, legM);
    const missM =
      WGS84.Inverse(
        position[0] as number,
        position[1] as number,
        reference.lat2 ?? NaN,
        reference.lon2 ?? NaN,
      ).s12 ?? NaN;
    expect(missM).toBeLessThan(0.1);
  });
});

describe('ellipsoidal inverse (Vincenty 1975)', () => {
  const pairs: [number, number, number, number][] = [
    [52.2, 0.12, 52.6, 1.4],
    [-33.9, 18.4, -34.5, 20.1],
    [78.22, 15.65, 79.1, 25.0],
    [0, 0, 0, 1],
    [0, 0, 1, 0],
    [45, 179.8, 45.3, -179.6],
    [-60, -70, -61.5, -68],
    [10, 10, 10.0001, 10.0001],
    [40, -105, 30, -90],
    [35.7, 139.7, 51.5, -0.1],
  ];
  it.each(pairs)(
    'agrees with GeographicLib Inverse from (%s, %s) to (%s, %s) within 1 mm and 1e-6°',
    (lat1, lon1, lat2, lon2) => {
      const ours = wgs84Inverse(lat1, lon1, lat2, lon2);
      const reference = WGS84.Inverse(lat1, lon1, lat2, lon2);
      expect(Math.abs(ours.distanceM - (reference.s12 ?? NaN))).toBeLessThan(1e-3);
      const bearingDifference =
        ((ours.initialBearingDeg - (reference.azi1 ?? NaN) + 540) % 360) - 180;
      expect(Math.abs(bearingDifference)).toBeLessThan(1e-6);
    },
  );

  it('gives distance 0 between a point and itself', () => {
    expect(wgs84Inverse(51, 7, 51, 7)).toEqual({
      distanceM: 0,
      initialBearingDeg: 0,
      finalBearingDeg: 0,
    });
  });

  it('refuses out-of-range coordinates by name, and says when points are nearly antipodal', () => {
    expect(() => wgs84Inverse(91, 0, 0, 0)).toThrow(InputError);
    expect(() => wgs84Inverse(0, 0, Number.NaN, 0)).toThrow(/latitude2Deg/);
    expect(() => wgs84Inverse(0, 0, 0.5, 179.7)).toThrow(ComputationError);
  });
});
