import type { DriftPoint } from '../flight/drift.js';

/**
 * Longitudes made continuous: each shifted by a whole number of turns to lie within 180° of the
 * one before (the first within 180° of `referenceDeg`, the launch's). The engine keeps every
 * longitude in −180 to 180, so a track or region across the antimeridian jumps by 360° between
 * neighbours; continuous, its turn (winding) and its crossings can be read off.
 */
export function continuousLongitudesDeg(
  longitudesDeg: readonly number[],
  referenceDeg: number,
): number[] {
  const result: number[] = [];
  let previous = referenceDeg;
  for (const longitudeDeg of longitudesDeg) {
    const continuous = longitudeDeg + 360 * Math.round((previous - longitudeDeg) / 360);
    result.push(continuous);
    previous = continuous;
  }
  return result;
}

/** Index k of the copy of the map a continuous longitude lies on: it is in [360k − 180, 360k + 180). */
const turnOf = (longitudeDeg: number): number => Math.floor((longitudeDeg + 180) / 360);

/** A track point moved to another copy of the map (longitude − 360·k). */
const shifted = (point: DriftPoint, longitudeDeg: number, turn: number): DriftPoint => ({
  ...point,
  longitudeDeg: longitudeDeg - 360 * turn,
});

/** The point a fraction f of the way from a to b, every number linear (time, height, position). */
function between(a: DriftPoint, b: DriftPoint, f: number): DriftPoint {
  const mix = (x: number, y: number) => x + f * (y - x);
  return {
    timeS: mix(a.timeS, b.timeS),
    latitudeDeg: mix(a.latitudeDeg, b.latitudeDeg),
    longitudeDeg: mix(a.longitudeDeg, b.longitudeDeg),
    altitudeM: mix(a.altitudeM, b.altitudeM),
    eastM: mix(a.eastM, b.eastM),
    northM: mix(a.northM, b.northM),
  };
}

/**
 * A track cut where it crosses the antimeridian, as RFC 7946 section 3.1.9 asks of GeoJSON
 * ("cutting it in two such that neither part's representation crosses the antimeridian"): one
 * piece per side, each ending (or starting) on ±180° at a point interpolated linearly between the
 * two track points either side (the track's own steps are at most about 1 km apart). Every piece
 * keeps longitudes in −180 to 180. A track that does not cross comes back as one piece.
 */
export function trackPieces(track: readonly DriftPoint[], referenceDeg: number): DriftPoint[][] {
  const longitudes = continuousLongitudesDeg(
    track.map((point) => point.longitudeDeg),
    referenceDeg,
  );
  const pieces: DriftPoint[][] = [];
  let piece: DriftPoint[] = [];
  track.forEach((point, index) => {
    const longitudeDeg = longitudes[index] as number;
    const turn = turnOf(longitudeDeg);
    const previousIndex = index - 1;
    if (previousIndex >= 0) {
      const previousDeg = longitudes[previousIndex] as number;
      const previousTurn = turnOf(previousDeg);
      if (previousTurn !== turn) {
        const meridianDeg = 360 * Math.max(previousTurn, turn) - 180;
        const previous = { ...(track[previousIndex] as DriftPoint), longitudeDeg: previousDeg };
        const f = (meridianDeg - previousDeg) / (longitudeDeg - previousDeg);
        const crossing = between(previous, { ...point, longitudeDeg }, f);
        piece.push(shifted(crossing, meridianDeg, previousTurn));
        pieces.push(piece);
        piece = [shifted(crossing, meridianDeg, turn)];
      }
    }
    piece.push(shifted(point, longitudeDeg, turn));
  });
  pieces.push(piece);
  return pieces.filter((candidate) => candidate.length > 0);
}

type Position = [number, number];

/** Sutherland–Hodgman clip of a closed ring to one side of the meridian x = m (keep x ≥ m or x ≤ m). */
function clipToSide(ring: readonly Position[], meridianDeg: number, keepEast: boolean): Position[] {
  const inside = ([x]: Position) => (keepEast ? x >= meridianDeg : x <= meridianDeg);
  const out: Position[] = [];
  for (let index = 1; index < ring.length; index += 1) {
    const a = ring[index - 1] as Position;
    const b = ring[index] as Position;
    if (inside(a) !== inside(b)) {
      const f = (meridianDeg - a[0]) / (b[0] - a[0]);
      out.push([meridianDeg, a[1] + f * (b[1] - a[1])]);
    }
    if (inside(b)) out.push(b);
  }
  const first = out[0];
  if (first) out.push([...first]);
  return out;
}

/**
 * A closed ring of continuous longitudes cut at the antimeridian (RFC 7946 section 3.1.9): one
 * ring per copy of the map it touches, clipped to it and moved into −180 to 180. Clipping a
 * counter-clockwise ring to a half-plane keeps it counter-clockwise (Sutherland & Hodgman,
 * "Reentrant polygon clipping", CACM 17(1), 1974); a landing region is an ellipse, convex, so
 * each side gives one ring. A ring that does not cross comes back whole.
 */
export function ringPieces(ring: readonly Position[]): Position[][] {
  const turns = ring.map(([x]) => turnOf(x));
  const low = Math.min(...turns);
  const high = Math.max(...turns);
  // Not crossing: the ring as it is (clipping would start it at its second point).
  if (low === high) return [ring.map(([x, y]): Position => [x - 360 * low, y])];
  const pieces: Position[][] = [];
  for (let turn = low; turn <= high; turn += 1) {
    const west = clipToSide(ring, 360 * turn - 180, true);
    const piece = clipToSide(west, 360 * turn + 180, false);
    // Fewer than four positions (a closed triangle) is no area: a ring touching the meridian.
    if (piece.length >= 4) pieces.push(piece.map(([x, y]) => [x - 360 * turn, y]));
  }
  return pieces;
}
