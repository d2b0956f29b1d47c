import { Constants, Geodesic } from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import {
  capsuleGeometry,
  cushionGeometry,
  cushionThicknessM,
  envelopeGeometry,
  sphereGeometry,
  spheroidGeometry,
} from './envelope-geometry.js';

describe('envelope geometry', () => {
  it('gives the sphere’s volume and area (CRC Standard Mathematical Tables)', () => {
    const sphere = sphereGeometry(2);
    expect(sphere.volumeM3).toBeCloseTo((4 / 3) * Math.PI, 12);
    expect(sphere.surfaceAreaM2).toBeCloseTo(4 * Math.PI, 12);
    expect(sphere.frontalAreaM2).toBeCloseTo(Math.PI, 12);
    expect(sphere.referenceDiameterM).toBeCloseTo(2, 12);
  });

  it('gives the surface of the WGS 84 ellipsoid as GeographicLib does, as an oblate spheroid', () => {
    // Reference library: geographiclib-geodesic (C. F. F. Karney), its WGS 84 constants and the
    // area of the geodesic polygon along the equator (one hemisphere), doubled.
    const { a, f } = Constants.WGS84;
    const hemisphere = Geodesic.WGS84.Polygon(false);
    for (const longitude of [0, 90, 180, 270]) hemisphere.AddPoint(0, longitude);
    const referenceAreaM2 = 2 * Math.abs(hemisphere.Compute(false, true).area ?? NaN);
    const earth = spheroidGeometry(2 * a, 2 * a * (1 - f));
    expect(Math.abs(earth.surfaceAreaM2 / referenceAreaM2 - 1)).toBeLessThan(1e-12);
  });

  it('tends to the sphere from both sides (oblate and prolate formulas agree at a = c)', () => {
    const sphere = sphereGeometry(1);
    for (const polar of [1 - 1e-6, 1 + 1e-6]) {
      expect(spheroidGeometry(1, polar).surfaceAreaM2 / sphere.surfaceAreaM2).toBeCloseTo(1, 5);
    }
  });

  it('makes a capsule of length equal to its diameter a sphere', () => {
    const capsule = capsuleGeometry(0.8, 0.8);
    const sphere = sphereGeometry(0.8);
    expect(capsule.volumeM3).toBeCloseTo(sphere.volumeM3, 12);
    expect(capsule.surfaceAreaM2).toBeCloseTo(sphere.surfaceAreaM2, 12);
  });

  it('gives the inflated two-disc cushion of 0.90 m flat diameter 0.111 03 m³ and 0.411 m thick', () => {
    // Paulsen (1994), Mladenov & Oprea (2003): r = a/1.3110287771, τ = 2·0.5990701173·r,
    // V = (2/3)·π·a·r². Worked check in the reference check values: 0.11103 m³, τ 0.41125 m.
    expect(Math.abs(cushionGeometry(0.9).volumeM3 / 0.11103 - 1)).toBeLessThan(1e-4);
    expect(cushionThicknessM(0.9)).toBeCloseTo(0.41125, 5);
    // The inflated cushion holds less than the sphere of the same flat diameter, more than a lens.
    expect(cushionGeometry(0.9).surfaceAreaM2).toBeLessThan(2 * Math.PI * 0.45 ** 2);
  });

  it('cuts a cushion from two flat discs, 2·π·a², about 9 % more film than its inflated surface', () => {
    // Film: two discs of radius a = 0.45 m (disc area π·a², CRC Standard Mathematical Tables).
    const cushion = cushionGeometry(0.9);
    expect(cushion.filmAreaM2).toBeCloseTo(2 * Math.PI * 0.45 ** 2, 12);
    // Inflated surface π²·r² with r = a/A (Paulsen 1994): film over surface is 2·A²/π.
    const A = 1.3110287771;
    expect(cushion.filmAreaM2 / cushion.surfaceAreaM2).toBeCloseTo((2 * A * A) / Math.PI, 9);
    expect(cushion.filmAreaM2 / cushion.surfaceAreaM2).toBeGreaterThan(1.09);
    // Every other shape is sewn to its inflated form: the film is the surface.
    expect(sphereGeometry(2).filmAreaM2).toBe(sphereGeometry(2).surfaceAreaM2);
  });

  it('gives a capsule moving side first the outline of its side as frontal area', () => {
    // d = 2 m, L = 6 m: end on, the disc π·1² = 3.1416 m²; side on, the rectangle 2·4 = 8 m² and
    // the two half-discs of the ends, π·1² (areas of a rectangle and a disc, CRC tables).
    expect(capsuleGeometry(2, 6).frontalAreaM2).toBeCloseTo(Math.PI, 12);
    expect(capsuleGeometry(2, 6, 'horizontal').frontalAreaM2).toBeCloseTo(8 + Math.PI, 12);
    // Volume and surface do not depend on the way it lies.
    expect(capsuleGeometry(2, 6, 'horizontal').volumeM3).toBe(capsuleGeometry(2, 6).volumeM3);
  });

  it('refuses a capsule shorter than its diameter and a custom surface smaller than a sphere’s', () => {
    expect(() => envelopeGeometry({ shape: 'capsule', diameterM: 1, lengthM: 0.5 })).toThrow(
      InputError,
    );
    expect(() => envelopeGeometry({ shape: 'custom', volumeM3: 1, surfaceAreaM2: 4 })).toThrow(
      /surfaceAreaM2/,
    );
  });
});
