import { stepOnEllipsoid } from '../flight/geodesy.js';
import type { GroundPoint, LandingRegion, LandingRun } from './landing-area-types.js';

/** Points on a region's boundary before it is closed. */
const BOUNDARY_POINTS = 72;
/** Longest step when an east/north offset is carried to latitude and longitude [m]. */
const GEODESY_STEP_M = 1000;

/** Mean and sample covariance (n − 1) of the landing points, east and north [m, m²]. */
export interface Scatter {
  readonly meanEastM: number;
  readonly meanNorthM: number;
  readonly eastEastM2: number;
  readonly eastNorthM2: number;
  readonly northNorthM2: number;
}

export function scatterOf(runs: readonly LandingRun[]): Scatter {
  const n = runs.length;
  let meanEastM = 0;
  let meanNorthM = 0;
  for (const run of runs) {
    meanEastM += run.eastM / n;
    meanNorthM += run.northM / n;
  }
  let ee = 0;
  let en = 0;
  let nn = 0;
  for (const run of runs) {
    const de = run.eastM - meanEastM;
    const dn = run.northM - meanNorthM;
    ee += de * de;
    en += de * dn;
    nn += dn * dn;
  }
  const divisor = Math.max(1, n - 1);
  return {
    meanEastM,
    meanNorthM,
    eastEastM2: ee / divisor,
    eastNorthM2: en / divisor,
    northNorthM2: nn / divisor,
  };
}

/**
 * Smallest standard deviation a region is drawn with in any direction [m]. A product choice, not
 * physics: when the runs scatter along a line (only the wind speed varied, say) or not at all, the
 * sample covariance is singular and its ellipse has no width, which says nothing about the real
 * spread across; the region is then widened to this and a note says so.
 */
export const LANDING_REGION_MIN_SIGMA_M = 100;

/** Unit eigenvector of the covariance for λ: (b, λ − a) when b ≠ 0, else the matching axis. */
function unitEigenvector(
  scatter: Scatter,
  lambda: number,
  index: number,
  isotropic: boolean,
): [number, number] {
  const { eastEastM2: a, eastNorthM2: b, northNorthM2: c } = scatter;
  if (isotropic) return index === 0 ? [1, 0] : [0, 1];
  if (b === 0) return Math.abs(a - lambda) <= Math.abs(c - lambda) ? [1, 0] : [0, 1];
  const length = Math.hypot(b, lambda - a);
  return [b / length, (lambda - a) / length];
}

/**
 * The scatter with each principal variance raised to at least σ_min² (eigen-decomposition of the
 * 2×2 covariance: S' = S + Σ max(0, σ_min² − λᵢ)·vᵢ·vᵢᵀ), and whether it had to be.
 */
export function widenedScatter(scatter: Scatter): { scatter: Scatter; widened: boolean } {
  const minimumM2 = LANDING_REGION_MIN_SIGMA_M ** 2;
  const { eastEastM2: a, eastNorthM2: b, northNorthM2: c } = scatter;
  const half = Math.hypot((a - c) / 2, b);
  const eigen = [(a + c) / 2 - half, (a + c) / 2 + half];
  let [ee, en, nn] = [a, b, c];
  let widened = false;
  eigen.forEach((lambda, index) => {
    const raise = minimumM2 - lambda;
    if (!(raise > 0)) return;
    widened = true;
    const [x, y] = unitEigenvector(scatter, lambda, index, half === 0);
    ee += raise * x * x;
    en += raise * x * y;
    nn += raise * y * y;
  });
  return { scatter: { ...scatter, eastEastM2: ee, eastNorthM2: en, northNorthM2: nn }, widened };
}

/**
 * Squared Mahalanobis radius holding a share p of a two-dimensional normal distribution:
 * r² = −2·ln(1 − p), the chi-square quantile with two degrees of freedom (its distribution
 * function is 1 − e^(−x/2); NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.6.6).
 */
export function ellipseRadiusSquared(probability: number): number {
  return -2 * Math.log(1 - probability);
}

/**
 * The ellipse around the mean landing point that would hold a share p of the landings if they
 * were normally distributed in east and north: (x − μ)ᵀ·S⁻¹·(x − μ) = r², S the sample
 * covariance. Drawn through the Cholesky factor L of S (S = L·Lᵀ, positive diagonal, so the
 * boundary keeps the counter-clockwise turn of the unit circle); its area is π·r²·√det S.
 */
export function ellipseEastNorthM(
  scatter: Scatter,
  probability: number,
): { readonly boundary: [number, number][]; readonly areaM2: number } {
  const r = Math.sqrt(ellipseRadiusSquared(probability));
  const l11 = Math.sqrt(Math.max(0, scatter.eastEastM2));
  const l21 = l11 > 0 ? scatter.eastNorthM2 / l11 : 0;
  const l22 = Math.sqrt(Math.max(0, scatter.northNorthM2 - l21 * l21));
  const boundary: [number, number][] = [];
  for (let index = 0; index < BOUNDARY_POINTS; index += 1) {
    const angle = (2 * Math.PI * index) / BOUNDARY_POINTS;
    const c = r * Math.cos(angle);
    const s = r * Math.sin(angle);
    boundary.push([scatter.meanEastM + l11 * c, scatter.meanNorthM + l21 * c + l22 * s]);
  }
  boundary.push(boundary[0] as [number, number]);
  return { boundary, areaM2: Math.PI * r * r * l11 * l22 };
}

/** Whether an east/north point lies inside the p ellipse of a scatter. */
export function insideEllipse(
  scatter: Scatter,
  probability: number,
  eastM: number,
  northM: number,
): boolean {
  const de = eastM - scatter.meanEastM;
  const dn = northM - scatter.meanNorthM;
  const det = scatter.eastEastM2 * scatter.northNorthM2 - scatter.eastNorthM2 ** 2;
  if (!(det > 0)) return de === 0 && dn === 0;
  const distanceSquared =
    (scatter.northNorthM2 * de * de -
      2 * scatter.eastNorthM2 * de * dn +
      scatter.eastEastM2 * dn * dn) /
    det;
  return distanceSquared <= ellipseRadiusSquared(probability);
}

/**
 * Latitude and longitude of a point east and north of the launch site: the offset walked in a
 * straight line of the local east/north plane, in steps of at most 1 km along the WGS 84
 * ellipsoid (the drift's own step). A run's own latitude and longitude come from its curved
 * track, so the two differ slightly over long distances (landing-area.test.ts bounds it).
 */
export function groundPointOf(launch: GroundPoint, eastM: number, northM: number): GroundPoint {
  const steps = Math.max(1, Math.ceil(Math.hypot(eastM, northM) / GEODESY_STEP_M));
  const position = Float64Array.of(launch.latitudeDeg, launch.longitudeDeg);
  for (let step = 0; step < steps; step += 1) {
    stepOnEllipsoid(position, eastM / steps, northM / steps);
  }
  return { latitudeDeg: position[0] as number, longitudeDeg: position[1] as number };
}

/** The p region of a set of runs, east/north and on the map. */
export function landingRegion(
  scatter: Scatter,
  probability: number,
  launch: GroundPoint,
): LandingRegion {
  const ellipse = ellipseEastNorthM(scatter, probability);
  return {
    probability,
    boundary: ellipse.boundary.map(([eastM, northM]) => groundPointOf(launch, eastM, northM)),
    boundaryEastNorthM: ellipse.boundary,
    areaM2: ellipse.areaM2,
  };
}
