import type { DataSeries, LandingArea, UnitSystem } from '@loftwright/buoyancy';

/** International mile, 1609.344 m exactly (NIST Special Publication 811 (2008), appendix B.8). */
export const METRES_PER_MILE = 1609.344;

export type Point = readonly [east: number, north: number];

/** A drift track laid out for drawing from above: distances in km or mi, equal scales. */
export interface TrackPlot {
  readonly unit: 'km' | 'mi';
  readonly metresPerUnit: number;
  readonly track: readonly Point[];
  readonly launch: Point;
  readonly burst: Point;
  readonly landing: Point;
  /** The same span on both axes, so a circle stays a circle and distances read true. */
  readonly domainX: readonly [number, number];
  readonly domainY: readonly [number, number];
  /** Ticks on both axes, a ring's step apart. */
  readonly ticksX: readonly number[];
  readonly ticksY: readonly number[];
  /** Range rings round the launch, at round distances. */
  readonly rings: readonly number[];
  readonly regions: readonly { readonly probability: number; readonly points: readonly Point[] }[];
  readonly runs: readonly Point[];
}

/** The round step (1, 2 or 5 × 10ⁿ) nearest above `rough`. */
export function roundStep(rough: number): number {
  if (!(rough > 0)) return 1;
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = [1, 2, 5, 10].map((factor) => factor * power).find((value) => value >= rough);
  return step ?? 10 * power;
}

/** Column positions of the track series, by key. */
function trackColumns(series: DataSeries) {
  const find = (key: string) => series.columns.findIndex((column) => column.key === key);
  return { east: find('east'), north: find('north'), altitude: find('altitude') };
}

const ticksFrom = (step: number, [low, high]: readonly [number, number]) => {
  const ticks: number[] = [];
  for (let tick = Math.ceil(low / step) * step; tick <= high + 1e-9; tick += step) {
    ticks.push(Math.abs(tick) < 1e-12 ? 0 : tick);
  }
  return ticks;
};

/**
 * The track (east and north of launch [m] in `series`), with the landing area when there is one,
 * in the reader's unit: km, or mi in the US system. The view is a square round all of it.
 */
export function trackPlot(
  series: DataSeries,
  unitSystem: UnitSystem,
  area?: LandingArea,
): TrackPlot | undefined {
  const columns = trackColumns(series);
  if (columns.east < 0 || columns.north < 0 || series.rows.length === 0) return undefined;
  const metresPerUnit = unitSystem === 'us' ? METRES_PER_MILE : 1000;
  const toUnit = (eastM: number, northM: number): Point => [
    eastM / metresPerUnit,
    northM / metresPerUnit,
  ];
  const track = series.rows.map((row) => toUnit(row[columns.east] ?? 0, row[columns.north] ?? 0));
  // The burst is the highest point of the track; the landing its last.
  let top = 0;
  series.rows.forEach((row, index) => {
    if ((row[columns.altitude] ?? 0) > (series.rows[top]?.[columns.altitude] ?? 0)) top = index;
  });
  const regions = (area?.regions ?? []).map((region) => ({
    probability: region.probability,
    points: region.boundaryEastNorthM.map(([eastM, northM]) => toUnit(eastM, northM)),
  }));
  const runs = (area?.runs ?? []).map((run) => toUnit(run.eastM, run.northM));
  const all = [[0, 0] as Point, ...track, ...regions.flatMap((region) => region.points), ...runs];
  const view = squareView(all);
  const step = roundStep((view.half * 2) / 4);
  const domainX = [view.centre[0] - view.half, view.centre[0] + view.half] as const;
  const domainY = [view.centre[1] - view.half, view.centre[1] + view.half] as const;
  return {
    unit: unitSystem === 'us' ? 'mi' : 'km',
    metresPerUnit,
    track,
    launch: track[0] ?? [0, 0],
    burst: track[top] ?? [0, 0],
    landing: track[track.length - 1] ?? [0, 0],
    domainX,
    domainY,
    ticksX: ticksFrom(step, domainX),
    ticksY: ticksFrom(step, domainY),
    rings: ringRadii(nearestDistance(domainX, domainY), farthestCorner(domainX, domainY)),
    regions,
    runs,
  };
}

/** Centre and half-width of a square holding every point, with a margin. */
function squareView(points: readonly Point[]) {
  const xs = points.map((point) => point[0]);
  const ys = points.map((point) => point[1]);
  const [minX, maxX, minY, maxY] = [
    Math.min(...xs),
    Math.max(...xs),
    Math.min(...ys),
    Math.max(...ys),
  ];
  // A flight that barely moves still gets a view a little wider than the launch site.
  const half = Math.max(maxX - minX, maxY - minY, 0.5) * 0.55;
  return { centre: [(minX + maxX) / 2, (minY + maxY) / 2] as Point, half };
}

function farthestCorner(x: readonly [number, number], y: readonly [number, number]): number {
  return Math.max(...x.flatMap((cx) => y.map((cy) => Math.hypot(cx, cy))));
}

/** Distance from launch to the nearest point of the view (0 when the launch is in it). */
function nearestDistance(x: readonly [number, number], y: readonly [number, number]): number {
  const clamp = (value: number, [low, high]: readonly [number, number]) =>
    Math.min(Math.max(value, low), high);
  return Math.hypot(clamp(0, x), clamp(0, y));
}

/** Rings round the launch a round step apart, those that cross the view (four to six). */
function ringRadii(near: number, far: number): number[] {
  const step = roundStep((far - near) / 6);
  const rings: number[] = [];
  for (let radius = Math.floor(near / step + 1) * step; radius <= far; radius += step) {
    rings.push(radius);
  }
  return rings;
}

/**
 * The launch site [°] from the track's first row, when the flight was given one (the engine then
 * adds latitude and longitude columns); undefined otherwise.
 */
export function trackLaunchSite(
  series: DataSeries,
): { latitudeDeg: number; longitudeDeg: number } | undefined {
  const latitude = series.columns.findIndex((column) => column.key === 'latitude');
  const longitude = series.columns.findIndex((column) => column.key === 'longitude');
  const first = series.rows[0];
  if (latitude < 0 || longitude < 0 || !first) return undefined;
  const [latitudeDeg, longitudeDeg] = [first[latitude], first[longitude]];
  return Number.isFinite(latitudeDeg) && Number.isFinite(longitudeDeg)
    ? { latitudeDeg: latitudeDeg as number, longitudeDeg: longitudeDeg as number }
    : undefined;
}

/** Bearing from north, clockwise, of a point east and north of launch [°, 0 to 360). */
export function bearingDeg([east, north]: Point): number {
  const degrees = (Math.atan2(east, north) * 180) / Math.PI;
  return degrees < 0 ? degrees + 360 : degrees;
}
