import { describe, expect, it } from 'vitest';
import { standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { InputError } from '../errors.js';
import { ascentState } from '../flight/ascent-model.js';
import { chooseFlightAir } from '../flight/flight-air.js';
import { deriveLaunch } from '../flight/launch-steps.js';
import { Derivation } from '../derivation.js';
import { flightProfileSchema } from '../kinds/flight-profile.kind.js';
import { evaluate } from '../kinds/registry.js';
import { parseInputs } from '../schema/parse-inputs.js';
import { checkLandingSurvivors, flightDrift, landingArea } from './landing-area.js';
import {
  groundPointOf,
  insideEllipse,
  LANDING_REGION_MIN_SIGMA_M,
  scatterOf,
} from './landing-regions.js';
import { flyRun, gasForRateMol, NOMINAL_FACTORS } from './landing-run.js';
import { windProfile } from '../wind/wind-profile.js';
import { DEFAULT_LANDING_SPREADS } from './landing-spreads.js';

const layers = Array.from({ length: 40 }, (_, index) => {
  const heightM = index * 1000;
  return {
    heightM,
    directionDeg: (250 + index * 2) % 360,
    speedMS: 5 + 20 * Math.sin((Math.PI * index) / 39),
    temperatureK: standardAtmosphere(heightM).temperatureK + 3,
  };
});
const input = {
  envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 120, latitudeDeg: 52, longitudeDeg: 5 },
  parachute: { areaM2: 0.8 },
  wind: { layers },
} as const;
const ZERO = { burstDiameter: 0, ascentRate: 0, descentDrag: 0, windSpeed: 0 };

const fieldsOf = (run: () => unknown): string[] => {
  try {
    run();
  } catch (error) {
    if (error instanceof InputError) return error.issues.map((issue) => issue.field);
    throw error;
  }
  return [];
};

describe('landingArea', () => {
  it('widens a scatter with no width to the stated minimum, and says so', () => {
    // Nothing spreads, so every run is the nominal one and the sample covariance is zero: the
    // regions become circles of σ = 100 m around it, of area π·r²·σ², r² = −2·ln(1 − p) (chi-square
    // with two degrees of freedom; NIST/SEMATECH e-Handbook, §1.3.6.6.6).
    const area = landingArea(input, { runs: 20, spreads: ZERO });
    expect(area.failedRuns).toBe(0);
    for (const run of area.runs) expect(run).toEqual(area.nominal);
    for (const region of area.regions) {
      const r2 = -2 * Math.log(1 - region.probability);
      expect(region.areaM2 / (Math.PI * r2 * LANDING_REGION_MIN_SIGMA_M ** 2)).toBeCloseTo(1, 9);
      for (const [east, north] of region.boundaryEastNorthM) {
        const distanceM = Math.hypot(east - area.nominal.eastM, north - area.nominal.northM);
        expect(distanceM / (Math.sqrt(r2) * LANDING_REGION_MIN_SIGMA_M)).toBeCloseTo(1, 9);
      }
    }
    expect(area.notes?.map((note) => note.code)).toEqual(['landing-area-widened']);
  });

  it('gives a line of landings (wind speed only) a width, not an area of 1e-8 m²', () => {
    // With only the wind speed varied the landings lie on a line: one principal variance is the
    // total variance var(east) + var(north), the other ~0 and raised to σ_min², so the area is
    // π·r²·√(λ_max·σ_min²) (ellipse area π·a·b; chi-square radius as above).
    const area = landingArea(input, { runs: 60, spreads: { ...ZERO, windSpeed: 0.1 } });
    const n = area.runs.length;
    const mean = (values: number[]) => values.reduce((sum, x) => sum + x, 0) / n;
    const variance = (values: number[]) => {
      const mu = mean(values);
      return values.reduce((sum, x) => sum + (x - mu) ** 2, 0) / (n - 1);
    };
    const lambdaMaxM2 =
      variance(area.runs.map((run) => run.eastM)) + variance(area.runs.map((run) => run.northM));
    const region95 = area.regions[1];
    const expectedM2 =
      Math.PI * -2 * Math.log(1 - 0.95) * Math.sqrt(lambdaMaxM2) * LANDING_REGION_MIN_SIGMA_M;
    expect(Math.abs((region95?.areaM2 ?? 0) / expectedM2 - 1)).toBeLessThan(1e-3);
    expect(area.notes?.map((note) => note.code)).toContain('landing-area-widened');
  });

  it('leaves a healthy scatter as it is, with no notes', () => {
    const area = landingArea(input, { runs: 40 });
    expect(area.notes).toBeUndefined();
  });

  it('lands the nominal run, at its coarser step, within 0.1 % of the distance of the kind’s flight', () => {
    const result = evaluate('flight-profile', input);
    const nominal = landingArea(input, { runs: 20, spreads: ZERO }).nominal;
    const distanceM = result.outputs.groundDistance?.value ?? Number.NaN;
    const missM = Math.hypot(
      nominal.eastM - (result.outputs.landingEast?.value ?? Number.NaN),
      nominal.northM - (result.outputs.landingNorth?.value ?? Number.NaN),
    );
    // Measured 2e-5 of the 136 km with 20 s steps (fourth-order Runge–Kutta, trapezoidal drift).
    expect(missM / distanceM).toBeLessThan(1e-3);
  });

  it('gives the same runs for the same seed and other runs for another', () => {
    const first = landingArea(input, { runs: 30, seed: 7 });
    const again = landingArea(input, { runs: 30, seed: 7 });
    const other = landingArea(input, { runs: 30, seed: 8 });
    expect(again.runs).toEqual(first.runs);
    expect(other.runs[0]?.eastM).not.toBe(first.runs[0]?.eastM);
    expect(first.spreads).toEqual(DEFAULT_LANDING_SPREADS);
    expect(first.seed).toBe(7);
  });

  it('draws regions that hold their share of fresh runs (coverage)', () => {
    // If the landings scatter like a two-dimensional normal distribution, the ellipse at squared
    // Mahalanobis radius −2·ln(1 − p) holds a share p of them (chi-square, two degrees of freedom:
    // NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.6.6). Built from 200 runs and
    // checked on 1 000 others; the bands allow the sampling error of the covariance and the
    // departure of the real scatter from a normal one.
    const built = landingArea(input, { runs: 200, seed: 1 });
    const fresh = landingArea(input, { runs: 1000, seed: 2 });
    const scatter = scatterOf(built.runs);
    const share = (p: number) =>
      fresh.runs.filter((run) => insideEllipse(scatter, p, run.eastM, run.northM)).length /
      fresh.runs.length;
    expect(share(0.95)).toBeGreaterThanOrEqual(0.9);
    expect(share(0.95)).toBeLessThanOrEqual(0.99);
    expect(share(0.5)).toBeGreaterThanOrEqual(0.4);
    expect(share(0.5)).toBeLessThanOrEqual(0.6);
  });

  it('draws each region counter-clockwise with the area of its ellipse', () => {
    const area = landingArea(input, { runs: 100 });
    for (const region of area.regions) {
      const points = region.boundaryEastNorthM;
      expect(points[0]).toEqual(points.at(-1));
      // Shoelace formula: positive for a counter-clockwise polygon. A regular 72-gon inscribed
      // in the ellipse has (72 / 2π)·sin(2π / 72) = 0.99873 of its area.
      let twice = 0;
      for (let i = 0; i + 1 < points.length; i += 1) {
        const [x1, y1] = points[i] as readonly [number, number];
        const [x2, y2] = points[i + 1] as readonly [number, number];
        twice += x1 * y2 - x2 * y1;
      }
      expect(
        twice / 2 / region.areaM2 / ((72 / (2 * Math.PI)) * Math.sin((2 * Math.PI) / 72)),
      ).toBeCloseTo(1, 9);
      expect(region.boundary).toHaveLength(points.length);
    }
    // The 95 % ellipse is larger than the 50 % one by r² ratio ln(20)/ln(2) (same covariance).
    const [half, most] = area.regions;
    expect((most?.areaM2 ?? 0) / (half?.areaM2 ?? 1)).toBeCloseTo(Math.log(20) / Math.log(2), 9);
  });

  it('puts the nominal east/north offset on the map close to the nominal run’s own point', () => {
    const area = landingArea(input, { runs: 20 });
    const { nominal } = area;
    const point = groundPointOf(
      { latitudeDeg: 52, longitudeDeg: 5 },
      nominal.eastM,
      nominal.northM,
    );
    // 1e-4 of the distance: 1° of latitude is about 111 km (WGS 84 meridian radius at 52°).
    const distanceM = Math.hypot(nominal.eastM, nominal.northM);
    expect(Math.abs(point.latitudeDeg - nominal.latitudeDeg) * 111e3).toBeLessThan(
      1e-4 * distanceM,
    );
    expect(
      Math.abs(point.longitudeDeg - nominal.longitudeDeg) * 111e3 * Math.cos((52 * Math.PI) / 180),
    ).toBeLessThan(1e-3 * distanceM);
  });

  it('refuses what it cannot draw from, naming the field', () => {
    const noSite = { ...input, launch: { altitudeM: 120 } };
    expect(fieldsOf(() => landingArea(noSite))).toEqual(['launch.latitudeDeg']);
    const noWind = { ...input, wind: undefined };
    expect(fieldsOf(() => landingArea(noWind))).toEqual(['wind']);
    expect(fieldsOf(() => landingArea(input, { runs: 5 }))).toEqual(['landingArea.runs']);
    expect(fieldsOf(() => landingArea(input, { spreads: { windSpeed: 0.9 } }))).toEqual([
      'landingArea.spreads.windSpeed',
    ]);
    const noChute = { ...input, parachute: undefined };
    expect(fieldsOf(() => landingArea(noChute))).toEqual(['parachute']);
  });

  it('counts runs that do not burst within the longest flight time as failed', () => {
    // The nominal ascent only just fits into maxTimeS, so the slower half of the draws cannot.
    const nominalAscentS = evaluate('flight-profile', input).outputs.ascentTime?.value ?? 0;
    const tight = { ...input, maxTimeS: Math.ceil(nominalAscentS * 1.05) };
    const area = landingArea(tight, { runs: 80, spreads: { ...ZERO, ascentRate: 0.1 } });
    expect(area.failedRuns + area.runs.length).toBe(80);
    expect(area.failedRuns).toBeGreaterThan(2);
    expect(area.failedRuns).toBeLessThan(40);
    expect(area.notes?.map((note) => note.code)).toContain('landing-area-failed-runs');
  });

  it('refuses when fewer than 20 runs, or fewer than half, land', () => {
    // The nominal ascent only just fits, so about half the draws (the slower ones) fail: of 20
    // runs asked, fewer than 20 land; before, regions were drawn from whatever was left (or from
    // the nominal flight alone when none was).
    const nominalAscentS = evaluate('flight-profile', input).outputs.ascentTime?.value ?? 0;
    const tight = { ...input, maxTimeS: Math.ceil(nominalAscentS) };
    const run = () => landingArea(tight, { runs: 20, spreads: { ...ZERO, ascentRate: 0.1 } });
    expect(fieldsOf(run)).toEqual(['landingArea.spreads']);
    // The half rule on its own: 49 of 100 is refused, 50 of 100 and 20 of 20 are drawn.
    expect(fieldsOf(() => checkLandingSurvivors(49, 100))).toEqual(['landingArea.spreads']);
    expect(fieldsOf(() => checkLandingSurvivors(50, 100))).toEqual([]);
    expect(fieldsOf(() => checkLandingSurvivors(20, 20))).toEqual([]);
    expect(fieldsOf(() => checkLandingSurvivors(0, 20))).toEqual(['landingArea.spreads']);
  });

  it('leaves out a run whose balloon does not rise', () => {
    const values = parseInputs(flightProfileSchema, input);
    const d = new Derivation();
    const air = chooseFlightAir(d, values);
    const setup = {
      inputs: values,
      launch: deriveLaunch(d, values, air),
      air,
      wind: air.wind ?? windProfile(input.wind),
      latitudeDeg: 52,
      longitudeDeg: 5,
      stepS: 10,
    };
    expect(flyRun(setup, { ...NOMINAL_FACTORS, ascentRate: -0.2 })).toBeUndefined();
    expect(flyRun(setup, { ...NOMINAL_FACTORS, burstDiameter: 0.2 })).toBeUndefined();
    expect(flyRun(setup, NOMINAL_FACTORS)?.burstAltitudeM).toBeGreaterThan(20000);
  });
});

describe('the ascent-rate spread', () => {
  it('finds the gas amount for a launch ascent rate 1.1 times the nominal one', () => {
    const values = parseInputs(flightProfileSchema, input);
    const d = new Derivation();
    const launch = deriveLaunch(d, values, chooseFlightAir(d, values));
    const gasMol = gasForRateMol(launch.model, 120, 1.1);
    const rate = ascentState({ ...launch.model, gasMol }, 120).ascentRateMS;
    expect(rate / launch.ascentRateMS).toBeCloseTo(1.1, 8);
  });
});

describe('flightDrift', () => {
  it('is null without a wind and the kind’s drift with one', () => {
    const noWind = { ...input, wind: undefined };
    expect(flightDrift(noWind)).toBeNull();
    const drift = flightDrift(input);
    const result = evaluate('flight-profile', input);
    expect(drift?.landing.eastM).toBe(result.outputs.landingEast?.value);
    expect(drift?.landing.latitudeDeg).toBe(result.outputs.landingLatitude?.value);
  });
});
