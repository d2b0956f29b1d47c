import fc from 'fast-check';
import * as z from 'zod';
import { describe, expect, it } from 'vitest';
import { geometricAltitudeM, standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { InputError } from '../errors.js';
import { parseInputs } from '../schema/parse-inputs.js';
import {
  windAt,
  windComponentsMS,
  windDirectionAndSpeed,
  windProfile,
  windProfileAirAt,
} from './wind-profile.js';
import { readWindProfile } from './read-wind-profile.js';
import { windProfileSchema } from './wind-profile-schema.js';

function refusal(action: () => unknown): InputError {
  try {
    action();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('wind components', () => {
  it('turn a wind from the west into an eastward u, from the north into a southward v', () => {
    // WMO-No. 8 (CIMO Guide), Part I, ch. 5: the direction is the one the wind blows from,
    // clockwise from true north; a west wind (270°) carries air towards the east.
    const west = windComponentsMS(270, 10);
    expect(west.uMS).toBeCloseTo(10, 12);
    expect(west.vMS).toBeCloseTo(0, 12);
    const north = windComponentsMS(0, 10);
    expect(north.uMS).toBeCloseTo(0, 12);
    expect(north.vMS).toBeCloseTo(-10, 12);
    const back = windDirectionAndSpeed(west.uMS, west.vMS);
    expect(back.directionDeg).toBeCloseTo(270, 9);
    expect(back.speedMS).toBeCloseTo(10, 12);
    expect(windDirectionAndSpeed(0, 0)).toEqual({ directionDeg: 0, speedMS: 0 });
  });
});

describe('interpolation', () => {
  const profile = windProfile({
    layers: [
      { heightM: 1000, directionDeg: 350, speedMS: 10, temperatureK: 280 },
      { heightM: 2000, directionDeg: 10, speedMS: 10, temperatureK: 274 },
      { heightM: 3000, directionDeg: 90, speedMS: 20, temperatureK: 268 },
    ],
  });

  it('interpolates the wind as components, so 350° and 10° average to north, not south', () => {
    // Vector mean of two 10 m/s winds 20° apart: from 0°, at 10·cos 10° (plane geometry).
    const sample = windAt(profile, 1500);
    expect(sample.directionDeg === 0 || sample.directionDeg > 359.999999).toBe(true);
    expect(sample.speedMS).toBeCloseTo(10 * Math.cos((10 * Math.PI) / 180), 9);
    expect(sample.temperatureK).toBeCloseTo(277, 2);
    expect(sample.position).toBe('within');
    expect(sample.note).toBeUndefined();
  });

  it('gives the level’s own wind at a level', () => {
    const sample = windAt(profile, 3000);
    expect(sample.directionDeg).toBeCloseTo(90, 9);
    expect(sample.speedMS).toBeCloseTo(20, 9);
    expect(sample.temperatureK).toBe(268);
  });

  it('above the top holds the wind and follows the standard atmosphere, with a note', () => {
    const sample = windAt(profile, 8000);
    expect(sample.position).toBe('above');
    expect(sample.note?.code).toBe('wind-above-profile');
    expect(sample.speedMS).toBeCloseTo(20, 9);
    // U.S. Standard Atmosphere 1976: −6.5 K per geopotential km below 11 km', so the standard
    // temperature falls by the same amount between 3 and 8 km as the shifted one does.
    const drop = standardAtmosphere(3000).temperatureK - standardAtmosphere(8000).temperatureK;
    expect(sample.temperatureK).toBeCloseTo(268 - drop, 9);
  });

  it('below the lowest level holds the wind, with a note', () => {
    const sample = windAt(profile, 200);
    expect(sample.position).toBe('below');
    expect(sample.note?.code).toBe('wind-below-profile');
    expect(sample.directionDeg).toBeCloseTo(350, 9);
  });

  it('gives the air for a flight integration: the standard atmosphere when the profile is standard', () => {
    // Levels carrying the 1976 standard's own temperatures and the sea-level pressure: between
    // them the hypsometric pressure must be the standard's (U.S. Standard Atmosphere 1976).
    // Levels at the standard's layer bases (0, 11, 20 km') and one between.
    const heights = [0, 4000, geometricAltitudeM(11000), geometricAltitudeM(20000)];
    const standard = windProfile({
      layers: heights.map((heightM, index) => ({
        heightM,
        directionDeg: 0,
        speedMS: 1,
        temperatureK: standardAtmosphere(heightM).temperatureK,
        ...(index === 0 ? { pressurePa: 101325 } : {}),
      })),
    });
    for (const altitudeM of [1500, 7000, 15000, 30000]) {
      const air = windProfileAirAt(standard, altitudeM);
      const reference = standardAtmosphere(altitudeM);
      // Exact up to rounding: temperature linear in geopotential height, log-mean hypsometric.
      expect(Math.abs(air.pressurePa / reference.pressurePa - 1)).toBeLessThan(1e-9);
      expect(Math.abs(air.densityKgM3 / reference.densityKgM3 - 1)).toBeLessThan(1e-9);
    }
  });

  it('refuses a height outside the atmosphere model by name', () => {
    expect(refusal(() => windAt(profile, 90000)).field).toBe('altitudeM');
  });
});

describe('profile inputs', () => {
  const layer = { directionDeg: 270, speedMS: 10 };

  it('names wind.layers.N.field for each refusal', () => {
    const error = refusal(() =>
      windProfile({
        layers: [
          { ...layer, heightM: 100 },
          { ...layer, heightM: 100 },
          { ...layer, heightM: 900, speedMS: 200 },
        ],
      }),
    );
    expect(error.issues.map((issue) => issue.field)).toContain('wind.layers.2.speedMS');
    expect(error.issues.find((issue) => issue.field === 'wind.layers.2.speedMS')?.range).toEqual({
      min: 0,
      max: 150,
      unit: 'm/s',
    });
  });

  it('refuses heights that do not increase, naming the level', () => {
    const error = refusal(() =>
      windProfile({
        layers: [
          { ...layer, heightM: 500 },
          { ...layer, heightM: 400 },
        ],
      }),
    );
    expect(error.field).toBe('wind.layers.1.heightM');
    expect(error.reason).toMatch(/above the level before it \(500 m\)/);
  });

  it('refuses a pressure level that would sit below the one before it', () => {
    const error = refusal(() =>
      windProfile({
        layers: [
          { ...layer, pressurePa: 85000 },
          { ...layer, pressurePa: 90000 },
        ],
      }),
    );
    expect(error.field).toBe('wind.layers.1.pressurePa');
  });

  it('needs two levels, a height or pressure on each, and a dew point not above the air', () => {
    expect(refusal(() => windProfile({ layers: [{ ...layer, heightM: 0 }] })).field).toBe(
      'wind.layers',
    );
    expect(refusal(() => windProfile({ layers: [layer, { ...layer, heightM: 10 }] })).field).toBe(
      'wind.layers.0.heightM',
    );
    expect(
      refusal(() =>
        windProfile({
          layers: [
            { ...layer, heightM: 0, temperatureK: 280, dewPointK: 281 },
            { ...layer, heightM: 10 },
          ],
        }),
      ).field,
    ).toBe('wind.layers.0.dewPointK');
    expect(
      refusal(() =>
        windProfile({
          layers: [
            { ...layer, heightM: 0, directionDeg: 361 },
            { ...layer, heightM: 9 },
          ],
        }),
      ).range,
    ).toEqual({ min: 0, max: 360, unit: '°' });
  });

  it('works inside a kind’s inputs, where the paths start with the kind’s key', () => {
    const schema = z.object({ wind: windProfileSchema }).strict();
    const error = refusal(() =>
      parseInputs(schema, {
        wind: {
          layers: [
            { ...layer, heightM: 0 },
            { ...layer, heightM: 60000 },
          ],
        },
      }),
    );
    expect(error.field).toBe('wind.layers.1.heightM');
  });

  it('says what it took from the standard atmosphere', () => {
    const profile = windProfile({
      layers: [
        { ...layer, pressurePa: 100000 },
        { ...layer, pressurePa: 50000 },
      ],
    });
    expect(profile.notes.map((note) => note.code).sort()).toEqual([
      'wind-pressure-altitude',
      'wind-standard-temperature',
      'wind-standard-thickness',
    ]);
  });
});

describe('no NaN leaves the wind functions (property)', () => {
  it('samples, air and text reading stay finite for any valid profile and height', () => {
    const levelArb = fc.record({
      directionDeg: fc.double({ min: 0, max: 360, noNaN: true }),
      speedMS: fc.double({ min: 0, max: 150, noNaN: true }),
      temperatureK: fc.double({ min: 173.15, max: 343.15, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(levelArb, { minLength: 2, maxLength: 8 }),
        fc.double({ min: 200, max: 5000, noNaN: true }),
        fc.double({ min: -5000, max: 86000, noNaN: true }),
        (levels, spacingM, altitudeM) => {
          const profile = windProfile({
            layers: levels.map((level, index) => ({
              ...level,
              heightM: index * spacingM,
              ...(index === 0 ? { pressurePa: 101325 } : {}),
            })),
          });
          const sample = windAt(profile, altitudeM);
          const air = windProfileAirAt(profile, altitudeM);
          const values = [
            sample.uMS,
            sample.vMS,
            sample.directionDeg,
            sample.speedMS,
            sample.temperatureK,
            air.temperatureK,
            air.pressurePa,
            air.densityKgM3,
          ];
          expect(values.every(Number.isFinite)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), (text) => {
        const reading = readWindProfile(text, {
          pressure: { column: 1, unit: 'hPa' },
          direction: { column: 2 },
          speed: { column: 3, unit: 'kn' },
          temperature: { column: 4, unit: '°C' },
        });
        const numbers = reading.layers.flatMap((layer) => Object.values(layer));
        expect(numbers.every(Number.isFinite)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
