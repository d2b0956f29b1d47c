import { WGS84_INVERSE_FLATTENING, WGS84_SEMI_MAJOR_AXIS_M } from '../constants.js';
import { ComputationError, requireInRange } from '../errors.js';

const A_M = WGS84_SEMI_MAJOR_AXIS_M;
const F = 1 / WGS84_INVERSE_FLATTENING;
const B_M = A_M * (1 - F);
/** First eccentricity squared, e² = f·(2 − f). */
const E2 = F * (2 - F);
const DEG = Math.PI / 180;

/** Latitudes a track may reach [°]: near a pole the local east/north steps stop holding. */
export const TRACK_LATITUDE_LIMIT_DEG = 89.5;

/**
 * Radii of curvature of the WGS 84 ellipsoid at a geodetic latitude: in the meridian,
 * M = a·(1 − e²) / (1 − e²·sin²φ)^{3/2}, and in the prime vertical, N = a / (1 − e²·sin²φ)^{1/2}
 * (the standard ellipsoid formulas; WGS 84 parameters from NIMA TR8350.2, Table 3.1). One metre
 * north is 1/M radians of latitude; one metre east is 1/(N·cos φ) radians of longitude.
 * @param latitudeDeg geodetic latitude [°], −90 to 90
 * @returns radii [m]
 */
export function wgs84RadiiOfCurvature(latitudeDeg: number): {
  readonly meridionalM: number;
  readonly primeVerticalM: number;
} {
  requireInRange('latitudeDeg', latitudeDeg, -90, 90, '°');
  const sin = Math.sin(latitudeDeg * DEG);
  const w2 = 1 - E2 * sin * sin;
  const primeVerticalM = A_M / Math.sqrt(w2);
  return { meridionalM: (primeVerticalM * (1 - E2)) / w2, primeVerticalM };
}

/**
 * Moves a position, `position[0]` latitude and `position[1]` longitude [°], in place by `eastM`
 * and `northM` along the WGS 84 ellipsoid, with the radii of curvature taken at the step's mid
 * latitude (second order in the step). Steps must be small (tens of metres to a few kilometres);
 * a track is a chain of them. Longitude is kept in (−180, 180]. A typed array keeps the hot loop
 * free of allocations.
 * @throws ComputationError when the step ends beyond ±89.5° latitude
 * @internal
 */
export function stepOnEllipsoid(position: Float64Array, eastM: number, northM: number): void {
  const phi0 = (position[0] as number) * DEG;
  const s0 = Math.sin(phi0);
  const w0 = 1 - E2 * s0 * s0;
  const m0 = (A_M * (1 - E2)) / (w0 * Math.sqrt(w0));
  const phiMid = phi0 + (0.5 * northM) / m0;
  const sMid = Math.sin(phiMid);
  const wMid = 1 - E2 * sMid * sMid;
  const nMid = A_M / Math.sqrt(wMid);
  const mMid = (nMid * (1 - E2)) / wMid;
  const latitudeDeg = (phi0 + northM / mMid) / DEG;
  if (Math.abs(latitudeDeg) > TRACK_LATITUDE_LIMIT_DEG) {
    throw new ComputationError(
      `The track reaches latitude ${latitudeDeg.toFixed(3)}°, beyond ±${TRACK_LATITUDE_LIMIT_DEG}°, where east/north steps on the ellipsoid no longer hold.`,
    );
  }
  let longitudeDeg = (position[1] as number) + eastM / (nMid * Math.cos(phiMid)) / DEG;
  if (longitudeDeg > 180) longitudeDeg -= 360;
  else if (longitudeDeg <= -180) longitudeDeg += 360;
  position[0] = latitudeDeg;
  position[1] = longitudeDeg;
}

export interface GeodesicInverse {
  /** Length of the geodesic between the two points [m]. */
  readonly distanceM: number;
  /** Azimuth of the geodesic at the first point, clockwise from true north [°], 0 to < 360. */
  readonly initialBearingDeg: number;
  /** Azimuth of the geodesic at the second point [°], 0 to < 360. */
  readonly finalBearingDeg: number;
}

/**
 * Distance and bearings between two points on the WGS 84 ellipsoid: T. Vincenty, "Direct and
 * inverse solutions of geodesics on the ellipsoid with application of nested equations", Survey
 * Review 23 (176), 1975, 88–93 (the inverse, iterated on λ to 1e-12 rad; accurate to well under a
 * millimetre). Points closer than 1 mm give distance 0 and bearings 0.
 * @param latitude1Deg, longitude1Deg first point [°], latitude −90 to 90, longitude −540 to 540
 * @param latitude2Deg, longitude2Deg second point [°]
 * @throws InputError when a coordinate is out of range
 * @throws ComputationError for nearly antipodal points, where the iteration does not converge
 */
export function wgs84Inverse(
  latitude1Deg: number,
  longitude1Deg: number,
  latitude2Deg: number,
  longitude2Deg: number,
): GeodesicInverse {
  requireInRange('latitude1Deg', latitude1Deg, -90, 90, '°');
  requireInRange('longitude1Deg', longitude1Deg, -540, 540, '°');
  requireInRange('latitude2Deg', latitude2Deg, -90, 90, '°');
  requireInRange('longitude2Deg', longitude2Deg, -540, 540, '°');
  let lDeg = (longitude2Deg - longitude1Deg) % 360;
  if (lDeg > 180) lDeg -= 360;
  else if (lDeg < -180) lDeg += 360;
  const l = lDeg * DEG;
  const u1 = Math.atan((1 - F) * Math.tan(latitude1Deg * DEG));
  const u2 = Math.atan((1 - F) * Math.tan(latitude2Deg * DEG));
  const sinU1 = Math.sin(u1);
  const cosU1 = Math.cos(u1);
  const sinU2 = Math.sin(u2);
  const cosU2 = Math.cos(u2);
  let lambda = l;
  let sinSigma = 0;
  let cosSigma = 1;
  let sigma = 0;
  let cos2Alpha = 1;
  let cos2SigmaM = 0;
  let converged = false;
  for (let iteration = 0; iteration < 200; iteration += 1) {
    const sinLambda = Math.sin(lambda);
    const cosLambda = Math.cos(lambda);
    const a = cosU2 * sinLambda;
    const b = cosU1 * sinU2 - sinU1 * cosU2 * cosLambda;
    sinSigma = Math.sqrt(a * a + b * b);
    if (sinSigma * B_M < 1e-3) {
      // Coincident points (closer than a millimetre along the auxiliary sphere).
      return { distanceM: 0, initialBearingDeg: 0, finalBearingDeg: 0 };
    }
    cosSigma = sinU1 * sinU2 + cosU1 * cosU2 * cosLambda;
    sigma = Math.atan2(sinSigma, cosSigma);
    const sinAlpha = (cosU1 * cosU2 * sinLambda) / sinSigma;
    cos2Alpha = 1 - sinAlpha * sinAlpha;
    // On the equator (cos²α = 0) the term is 0 (Vincenty's note).
    cos2SigmaM = cos2Alpha !== 0 ? cosSigma - (2 * sinU1 * sinU2) / cos2Alpha : 0;
    const c = (F / 16) * cos2Alpha * (4 + F * (4 - 3 * cos2Alpha));
    const next =
      l +
      (1 - c) *
        F *
        sinAlpha *
        (sigma + c * sinSigma * (cos2SigmaM + c * cosSigma * (-1 + 2 * cos2SigmaM * cos2SigmaM)));
    const change = Math.abs(next - lambda);
    lambda = next;
    if (change < 1e-12) {
      converged = true;
      break;
    }
  }
  if (!converged || !Number.isFinite(lambda)) {
    throw new ComputationError(
      'The points are nearly antipodal: the ellipsoidal inverse (Vincenty) does not converge.',
    );
  }
  const sinLambda = Math.sin(lambda);
  const cosLambda = Math.cos(lambda);
  const uSquared = (cos2Alpha * (A_M * A_M - B_M * B_M)) / (B_M * B_M);
  const bigA =
    1 + (uSquared / 16384) * (4096 + uSquared * (-768 + uSquared * (320 - 175 * uSquared)));
  const bigB = (uSquared / 1024) * (256 + uSquared * (-128 + uSquared * (74 - 47 * uSquared)));
  const deltaSigma =
    bigB *
    sinSigma *
    (cos2SigmaM +
      (bigB / 4) *
        (cosSigma * (-1 + 2 * cos2SigmaM * cos2SigmaM) -
          (bigB / 6) *
            cos2SigmaM *
            (-3 + 4 * sinSigma * sinSigma) *
            (-3 + 4 * cos2SigmaM * cos2SigmaM)));
  const distanceM = B_M * bigA * (sigma - deltaSigma);
  const alpha1 = Math.atan2(cosU2 * sinLambda, cosU1 * sinU2 - sinU1 * cosU2 * cosLambda);
  const alpha2 = Math.atan2(cosU1 * sinLambda, -sinU1 * cosU2 + cosU1 * sinU2 * cosLambda);
  return {
    distanceM,
    initialBearingDeg: bearing(alpha1),
    finalBearingDeg: bearing(alpha2),
  };
}

function bearing(radians: number): number {
  const degrees = (radians / DEG + 360) % 360;
  return degrees >= 360 ? 0 : degrees;
}
