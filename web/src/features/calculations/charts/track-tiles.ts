import { WGS84_SEMI_MAJOR_AXIS_M, wgs84RadiiOfCurvature } from '@loftwright/buoyancy';

/** A point on the ground [°], latitude north and longitude east. */
export interface LatLon {
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
}

/** One base-map tile placed on the chart: its address and its box east and north of launch. */
export interface PlacedTile {
  readonly url: string;
  readonly zoom: number;
  readonly x: number;
  readonly y: number;
  /** West and east edges, east of launch, in the chart's unit (km or mi). */
  readonly west: number;
  readonly east: number;
  /** South and north edges, north of launch, in the chart's unit. */
  readonly south: number;
  readonly north: number;
}

/**
 * Deepest zoom asked for: tile servers commonly stop at 18 or 19 (OpenStreetMap wiki, "Slippy
 * map tilenames", zoom levels); a launch-field view needs no more.
 */
export const MAX_TILE_ZOOM = 18;
/** Tiles across the chart's square we aim for: enough detail, few requests. */
const TILES_ACROSS = 2;
/** Never more tiles than this for one chart, whatever the view (a 4 × 4 block at worst). */
const MAX_TILES = 16;
const DEG = Math.PI / 180;

/**
 * Fractional Web Mercator tile coordinates of a point at a zoom, by the OpenStreetMap wiki's
 * "Slippy map tilenames" formulas: n = 2^z, x = n·(λ + 180°)/360°,
 * y = n·(1 − ln(tan φ + sec φ)/π)/2. The integer parts name the tile holding the point.
 */
export function tileXY(point: LatLon, zoom: number): { x: number; y: number } {
  const n = 2 ** zoom;
  const phi = point.latitudeDeg * DEG;
  return {
    x: (n * (point.longitudeDeg + 180)) / 360,
    y: (n * (1 - Math.log(Math.tan(phi) + 1 / Math.cos(phi)) / Math.PI)) / 2,
  };
}

/**
 * The north-west corner of tile (x, y) at a zoom, the same wiki page's inverse:
 * λ = 360°·x/n − 180°, φ = arctan(sinh(π·(1 − 2·y/n))). Tile x + 1, y + 1 gives the south-east
 * corner.
 */
export function tileCorner(x: number, y: number, zoom: number): LatLon {
  const n = 2 ** zoom;
  return {
    latitudeDeg: Math.atan(Math.sinh(Math.PI * (1 - (2 * y) / n))) / DEG,
    longitudeDeg: (360 * x) / n - 180,
  };
}

/**
 * A local equirectangular approximation round the launch site: metres east and north of it per
 * degree of longitude and latitude, from the WGS 84 radii of curvature at the launch latitude
 * (east = Δλ·N(φ₀)·cos φ₀, north = Δφ·M(φ₀); the radii from NIMA TR8350.2 through the engine).
 * The error grows with the square of the distance: over a few hundred km it is a few km at mid
 * latitudes, within what a base map under a drift track is for; the track itself stays the
 * engine's.
 */
export function localMetresPerDegree(site: LatLon): { eastM: number; northM: number } {
  const { meridionalM, primeVerticalM } = wgs84RadiiOfCurvature(site.latitudeDeg);
  return {
    eastM: primeVerticalM * Math.cos(site.latitudeDeg * DEG) * DEG,
    northM: meridionalM * DEG,
  };
}

/** Metres east and north of the launch site of a point, by the local approximation above. */
export function eastNorthOf(site: LatLon, point: LatLon): { eastM: number; northM: number } {
  const perDegree = localMetresPerDegree(site);
  return {
    eastM: (point.longitudeDeg - site.longitudeDeg) * perDegree.eastM,
    northM: (point.latitudeDeg - site.latitudeDeg) * perDegree.northM,
  };
}

/** The point a given distance east and north of the launch site [m], by the same approximation. */
export function latLonAt(site: LatLon, eastM: number, northM: number): LatLon {
  const perDegree = localMetresPerDegree(site);
  return {
    latitudeDeg: site.latitudeDeg + northM / perDegree.northM,
    longitudeDeg: site.longitudeDeg + eastM / perDegree.eastM,
  };
}

/**
 * The zoom at which about two tiles span `sideM` at a latitude. A Web Mercator tile is
 * 2π·a·cos φ / 2^z wide on the ground (a = 6 378 137 m, the sphere of EPSG:3857), so
 * z = log₂(2π·a·cos φ · tiles / side), rounded down and kept within 0 to MAX_TILE_ZOOM.
 */
export function tileZoomFor(sideM: number, latitudeDeg: number): number {
  const equatorM = 2 * Math.PI * WGS84_SEMI_MAJOR_AXIS_M * Math.cos(latitudeDeg * DEG);
  const zoom = Math.floor(Math.log2((equatorM * TILES_ACROSS) / sideM));
  return Number.isFinite(zoom) ? Math.min(Math.max(zoom, 0), MAX_TILE_ZOOM) : 0;
}

/** A tile's address: the template with {z}, {x} and {y} filled in. */
export function tileUrl(template: string, zoom: number, x: number, y: number): string {
  return template
    .replaceAll('{z}', String(zoom))
    .replaceAll('{x}', String(x))
    .replaceAll('{y}', String(y));
}

/**
 * The tiles that cover the chart's square (`domainX` east and `domainY` north of launch, in units
 * of `metresPerUnit` metres), each placed at its box east and north of launch. Longitudes past
 * ±180° wrap to the tile that holds them; rows beyond Web Mercator's latitude limit have no tile.
 */
export function baseMapTiles({
  site,
  urlTemplate,
  domainX,
  domainY,
  metresPerUnit,
}: {
  site: LatLon;
  urlTemplate: string;
  domainX: readonly [number, number];
  domainY: readonly [number, number];
  metresPerUnit: number;
}): PlacedTile[] {
  const southWest = latLonAt(site, domainX[0] * metresPerUnit, domainY[0] * metresPerUnit);
  const northEast = latLonAt(site, domainX[1] * metresPerUnit, domainY[1] * metresPerUnit);
  const sideM = Math.max(domainX[1] - domainX[0], domainY[1] - domainY[0]) * metresPerUnit;
  let zoom = tileZoomFor(sideM, site.latitudeDeg);
  let range = tileRange(southWest, northEast, zoom);
  // A square far from the launch latitude can need more rows than planned: zoom out.
  while (zoom > 0 && range.columns.length * range.rows.length > MAX_TILES) {
    zoom -= 1;
    range = tileRange(southWest, northEast, zoom);
  }
  const n = 2 ** zoom;
  const toUnit = (corner: LatLon) => {
    const { eastM, northM } = eastNorthOf(site, corner);
    return { east: eastM / metresPerUnit, north: northM / metresPerUnit };
  };
  return range.columns.flatMap((x) =>
    range.rows.map((y) => {
      const northWest = toUnit(tileCorner(x, y, zoom));
      const southEast = toUnit(tileCorner(x + 1, y + 1, zoom));
      const wrappedX = ((x % n) + n) % n;
      return {
        url: tileUrl(urlTemplate, zoom, wrappedX, y),
        zoom,
        x: wrappedX,
        y,
        west: northWest.east,
        east: southEast.east,
        south: southEast.north,
        north: northWest.north,
      };
    }),
  );
}

/** Tile columns (unwrapped) and rows (only those that exist) over a south-west/north-east box. */
function tileRange(southWest: LatLon, northEast: LatLon, zoom: number) {
  const n = 2 ** zoom;
  // Tile x grows eastwards and y southwards, so the north-east corner has the largest x and the
  // smallest y. Beyond the poles (a square drawn round a track near one) y is not a number.
  const westSouth = tileXY(southWest, zoom);
  const eastNorth = tileXY(northEast, zoom);
  const span = (from: number, to: number) =>
    Array.from({ length: Math.max(to - from + 1, 0) }, (_, index) => from + index);
  const firstRow = Number.isFinite(eastNorth.y) ? Math.max(Math.floor(eastNorth.y), 0) : 0;
  const lastRow = Number.isFinite(westSouth.y) ? Math.min(Math.floor(westSouth.y), n - 1) : n - 1;
  return {
    columns: span(Math.floor(westSouth.x), Math.floor(eastNorth.x)),
    rows: span(firstRow, lastRow),
  };
}
