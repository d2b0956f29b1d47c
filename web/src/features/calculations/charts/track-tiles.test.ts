import { wgs84Inverse } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import {
  baseMapTiles,
  eastNorthOf,
  latLonAt,
  MAX_TILE_ZOOM,
  tileCorner,
  tileUrl,
  tileXY,
  tileZoomFor,
} from './track-tiles';

/**
 * Tile 486/332 at zoom 10 and its bounds, from the README of mercantile (github.com/sgillies/
 * mercantile, the reference implementation of the slippy-map formulas in Python):
 * `ul(486, 332, 10)` = (−9.140625°, 53.33087298301705°); `bounds(486, 332, 10)` has west
 * −9.140625°, south 53.12040528310657°, east −8.7890625°, north 53.33087298301705°.
 */
const MERCANTILE_UL = { latitudeDeg: 53.33087298301705, longitudeDeg: -9.140625 };
const MERCANTILE_SE = { latitudeDeg: 53.12040528310657, longitudeDeg: -8.7890625 };

describe('slippy-map tile numbers (OpenStreetMap wiki, "Slippy map tilenames")', () => {
  it('puts the upper-left corner of mercantile’s tile 486/332 at zoom 10 exactly on its numbers', () => {
    const { x, y } = tileXY(MERCANTILE_UL, 10);
    // mercantile README: tile(*ul(486, 332, 10), 10) is Tile(x=486, y=332, z=10).
    expect(x).toBeCloseTo(486, 9);
    expect(y).toBeCloseTo(332, 9);
    const se = tileXY(MERCANTILE_SE, 10);
    expect(se.x).toBeCloseTo(487, 9);
    expect(se.y).toBeCloseTo(333, 9);
  });

  it('gives mercantile’s corners of tile 486/332 back from the tile numbers', () => {
    const ul = tileCorner(486, 332, 10);
    const se = tileCorner(487, 333, 10);
    // mercantile README, ul() and bounds(): to 1e-9° (about 0.1 mm).
    expect(ul.longitudeDeg).toBeCloseTo(-9.140625, 9);
    expect(ul.latitudeDeg).toBeCloseTo(53.33087298301705, 9);
    expect(se.longitudeDeg).toBeCloseTo(-8.7890625, 9);
    expect(se.latitudeDeg).toBeCloseTo(53.12040528310657, 9);
  });

  it('spans the wiki’s zoom-level table: 360° × 170.1022° at zoom 0, 180° × 85.0511° at zoom 1', () => {
    const top = tileCorner(0, 0, 0);
    const bottom = tileCorner(1, 1, 0);
    // OpenStreetMap wiki, "Slippy map tilenames", zoom levels table, which gives four decimals
    // (cut, not rounded: within 1e-4°).
    expect(bottom.longitudeDeg - top.longitudeDeg).toBe(360);
    expect(Math.abs(top.latitudeDeg - bottom.latitudeDeg - 170.1022)).toBeLessThan(1e-4);
    const zoomOneRowDeg = tileCorner(0, 0, 1).latitudeDeg - tileCorner(0, 1, 1).latitudeDeg;
    expect(Math.abs(zoomOneRowDeg - 85.0511)).toBeLessThan(1e-4);
  });

  it('fills {z}, {x} and {y} wherever the template puts them', () => {
    expect(tileUrl('https://t.example/{z}/{x}/{y}.png?v={z}', 10, 486, 332)).toBe(
      'https://t.example/10/486/332.png?v=10',
    );
  });
});

describe('the local east/north approximation round the launch', () => {
  const site = { latitudeDeg: 52, longitudeDeg: 0 };

  it('is within 0.2 % of the WGS 84 geodesic 50 km out', () => {
    const point = latLonAt(site, 30_000, 40_000);
    // Vincenty's inverse (Survey Review 1975), the engine's wgs84Inverse: 50 km for a 3-4-5 offset.
    const geodesic = wgs84Inverse(
      site.latitudeDeg,
      site.longitudeDeg,
      point.latitudeDeg,
      point.longitudeDeg,
    );
    expect(Math.abs(geodesic.distanceM - 50_000) / 50_000).toBeLessThan(0.002);
  });

  it('goes there and back', () => {
    const back = eastNorthOf(site, latLonAt(site, -12_345, 6_789));
    expect(back.eastM).toBeCloseTo(-12_345, 6);
    expect(back.northM).toBeCloseTo(6_789, 6);
  });
});

describe('baseMapTiles', () => {
  const site = { latitudeDeg: 53.2, longitudeDeg: -9 };
  const square = { domainX: [-20, 20], domainY: [-20, 20], metresPerUnit: 1000 } as const;

  it('covers the whole square with adjoining tiles of one zoom, the launch’s among them', () => {
    const tiles = baseMapTiles({
      site,
      urlTemplate: 'https://t.example/{z}/{x}/{y}.png',
      ...square,
    });
    expect(tiles.length).toBeGreaterThanOrEqual(4);
    expect(tiles.length).toBeLessThanOrEqual(16);
    expect(new Set(tiles.map((tile) => tile.zoom)).size).toBe(1);
    expect(Math.min(...tiles.map((tile) => tile.west))).toBeLessThanOrEqual(-20);
    expect(Math.max(...tiles.map((tile) => tile.east))).toBeGreaterThanOrEqual(20);
    expect(Math.min(...tiles.map((tile) => tile.south))).toBeLessThanOrEqual(-20);
    expect(Math.max(...tiles.map((tile) => tile.north))).toBeGreaterThanOrEqual(20);
    // The launch (−9°, 53.2°) lies in mercantile's tile 486/332 at zoom 10 (bounds above).
    const zoom = tiles[0]?.zoom ?? -1;
    expect(zoom).toBeGreaterThanOrEqual(10);
    const launchTile = tiles.find(
      (tile) => tile.west <= 0 && tile.east > 0 && tile.south <= 0 && tile.north > 0,
    );
    expect(launchTile && [launchTile.x >> (zoom - 10), launchTile.y >> (zoom - 10)]).toEqual([
      486, 332,
    ]);
    // Neighbouring columns share an edge, to a millimetre.
    const row = tiles.filter((tile) => tile.y === launchTile?.y).sort((a, b) => a.x - b.x);
    for (let index = 1; index < row.length; index += 1) {
      expect(row[index]?.west).toBeCloseTo(row[index - 1]?.east ?? Number.NaN, 6);
    }
  });

  it('wraps tile columns across the antimeridian', () => {
    const tiles = baseMapTiles({
      site: { latitudeDeg: -40, longitudeDeg: 179.95 },
      urlTemplate: '{z}/{x}/{y}',
      ...square,
    });
    const zoom = tiles[0]?.zoom ?? 0;
    const columns = new Set(tiles.map((tile) => tile.x));
    expect(columns).toContain(0);
    expect(columns).toContain(2 ** zoom - 1);
  });

  it('zooms in for a small square and out for a big one, within the servers’ range', () => {
    expect(tileZoomFor(1_000, 52)).toBeGreaterThan(tileZoomFor(400_000, 52));
    expect(tileZoomFor(1, 0)).toBe(MAX_TILE_ZOOM);
    expect(tileZoomFor(1e9, 0)).toBe(0);
  });
});
