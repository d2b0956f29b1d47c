import { Geodesic } from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { ComputationError, InputError } from '../errors.js';
import { wgs84Inverse, wgs84RadiiOfCurvature } from './geodesy.js';

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
