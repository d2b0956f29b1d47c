import type { DriftPoint, DriftResult } from '../flight/drift.js';
import type { GroundPoint, LandingArea, LandingRegion } from '../landing/landing-area-types.js';
import { continuousLongitudesDeg, ringPieces, trackPieces } from './antimeridian.js';

/** What the track exports draw: a flight's drift, its launch time and its landing area. */
export interface FlightGeography {
  /** Named in the files (document and track names). */
  readonly title: string;
  /** The nominal flight's ground track, from launch to landing. */
  readonly drift: DriftResult;
  /**
   * Launch time, ISO 8601 with its offset (as the flight-profile input takes it): GPX and KML
   * times are launch time plus each point's time since launch. Left out, files carry no times.
   */
  readonly launchTime?: string;
  /** The 50 % and 95 % regions, drawn as polygons when given. */
  readonly landingArea?: LandingArea;
}

/** A named point of the flight, as every format writes it. */
export interface NamedFlightPoint {
  readonly name: string;
  /** Stable word for programs reading the file: launch, burst or landing. */
  readonly role: 'launch' | 'burst' | 'landing';
  readonly point: DriftPoint;
}

/**
 * Digits written after the point. Degrees to 6 places are about 0.1 m on the ground, as RFC 7946
 * section 11.2 advises; metres to 0.1 m; seconds to 0.01 s, finer than the shortest time step.
 */
export const EXPORT_DIGITS = { degrees: 6, metres: 1, seconds: 2, metresPerSecond: 2 } as const;

/** A number to `digits` places as text, never in exponent form and never "-0". */
export function fixedText(value: number, digits: number): string {
  const text = value.toFixed(digits);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** A number rounded to `digits` places (for JSON, where numbers stay numbers). */
export function rounded(value: number, digits: number): number {
  const result = Number(value.toFixed(digits));
  return result === 0 ? 0 : result;
}

/**
 * Longitude in −180 (inclusive) to 180 (exclusive), as GPX 1.1's longitudeType asks: the drift
 * can carry a track across the antimeridian, past ±180.
 */
export function wrappedLongitudeDeg(longitudeDeg: number): number {
  return ((((longitudeDeg + 180) % 360) + 360) % 360) - 180;
}

/** Launch, burst (or end of ascent) and landing (or end of track), in that order. */
export function namedFlightPoints(drift: DriftResult): NamedFlightPoint[] {
  const launch = drift.track[0] ?? drift.burst;
  return [
    { name: 'Launch', role: 'launch', point: launch },
    { name: drift.landed ? 'Burst' : 'End of ascent', role: 'burst', point: drift.burst },
    { name: drift.landed ? 'Landing' : 'End of track', role: 'landing', point: drift.landing },
  ];
}

/** "50 % landing area" from a region's probability of 0.5. */
export function regionName(region: LandingRegion): string {
  return `${Math.round(region.probability * 100)} % landing area`;
}

/** The track's name in every format. */
export const TRACK_NAME = 'Flight track';

/**
 * The boundary as [lon, lat] positions at export precision, closed and counter-clockwise seen
 * from above (RFC 7946 section 3.1.6 asks this of exterior rings; KML 2.2 section 10.8 too):
 * the landing area already draws it so, but a ring is checked again after rounding, which can
 * merge points. Longitudes are continuous (see `continuousLongitudesDeg`), near the launch's
 * `referenceDeg`: a region across the antimeridian then runs past ±180 instead of jumping round
 * the globe, so its turn is read right; `exteriorRingPieces` cuts it for the files.
 */
export function exteriorRing(
  boundary: readonly GroundPoint[],
  referenceDeg = boundary[0]?.longitudeDeg ?? 0,
): [number, number][] {
  const longitudes = continuousLongitudesDeg(
    boundary.map((point) => point.longitudeDeg),
    referenceDeg,
  );
  const ring: [number, number][] = [];
  boundary.forEach((point, index) => {
    const position: [number, number] = [
      rounded(longitudes[index] as number, EXPORT_DIGITS.degrees),
      rounded(point.latitudeDeg, EXPORT_DIGITS.degrees),
    ];
    const previous = ring[ring.length - 1];
    if (!previous || previous[0] !== position[0] || previous[1] !== position[1])
      ring.push(position);
  });
  const first = ring[0];
  const last = ring[ring.length - 1];
  if (first && last && (first[0] !== last[0] || first[1] !== last[1])) ring.push([...first]);
  return signedAreaDeg2(ring) < 0 ? ring.reverse() : ring;
}

/**
 * A region's exterior ring as every file writes it: counter-clockwise and closed, cut at the
 * antimeridian into one ring per side (RFC 7946 section 3.1.9), longitudes in −180 to 180 and at
 * export precision. One ring when the region does not cross.
 */
export function exteriorRingPieces(
  boundary: readonly GroundPoint[],
  referenceDeg: number,
): [number, number][][] {
  return ringPieces(exteriorRing(boundary, referenceDeg)).map((piece) =>
    piece.map(([lon, lat]): [number, number] => [
      rounded(lon, EXPORT_DIGITS.degrees),
      rounded(lat, EXPORT_DIGITS.degrees),
    ]),
  );
}

/** The launch's longitude, which continuous longitudes of a flight's files are taken near. */
export function launchLongitudeDeg(geography: FlightGeography): number {
  return (geography.drift.track[0] ?? geography.drift.burst).longitudeDeg;
}

/** The track cut at the antimeridian (see `trackPieces`): one piece when it does not cross. */
export function flightTrackPieces(geography: FlightGeography): DriftPoint[][] {
  return trackPieces(geography.drift.track, launchLongitudeDeg(geography));
}

/** Shoelace sum over a closed ring in degrees²: positive when counter-clockwise (east = x). */
export function signedAreaDeg2(ring: readonly (readonly [number, number])[]): number {
  let twiceArea = 0;
  for (let index = 1; index < ring.length; index += 1) {
    const [x0, y0] = ring[index - 1] as readonly [number, number];
    const [x1, y1] = ring[index] as readonly [number, number];
    twiceArea += x0 * y1 - x1 * y0;
  }
  return twiceArea / 2;
}

/**
 * The time of a point as ISO 8601 in UTC (GPX 1.1 asks for UTC), or undefined without a launch
 * time. Fractions of a second are kept to the millisecond.
 */
export function pointTimeText(launchTime: string | undefined, timeS: number): string | undefined {
  if (launchTime === undefined) return undefined;
  const launchMs = Date.parse(launchTime);
  if (!Number.isFinite(launchMs)) return undefined;
  return new Date(launchMs + Math.round(timeS * 1000)).toISOString();
}
