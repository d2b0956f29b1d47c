import psychrolib from 'psychrolib';
import { describe, expect, it } from 'vitest';
import {
  moistAirDensity,
  moistAirDensityKgM3,
  vapourMoleFractionFromDewPoint,
  vapourMoleFractionFromRelativeHumidity,
} from './moist-air-density.js';
import { saturationVapourPressurePa } from './saturation-vapour-pressure.js';

const MMHG_PA = 101325 / 760;

describe('moistAirDensityKgM3 (CIPM-2007)', () => {
  it('matches the CIPM-2007 value quoted in S. V. Gupta, Mass Metrology, appendix p. 205', () => {
    // 730 mmHg, 10 °C, 40 % -> 1.195 69e-3 g/cm3 (as quoted by the test suite of CRAN `masscor`).
    expect(moistAirDensityKgM3(283.15, 730 * MMHG_PA, 0.4)).toBeCloseTo(1.19569, 5);
  });

  it.each([
    // Computed from the CIPM-2007 equation and constants (reference check values §2.1).
    { t: 20, p: 101325, h: 0.5, rho: 1.19931 },
    { t: 20, p: 101325, h: 0, rho: 1.20456 },
    { t: 15, p: 101325, h: 0, rho: 1.22552 },
    { t: 0, p: 101325, h: 0, rho: 1.29305 },
    { t: 25, p: 101325, h: 0.5, rho: 1.17732 },
    { t: 20, p: 100000, h: 0.5, rho: 1.18356 },
  ])('gives $rho kg/m3 at $t °C, $p Pa, RH $h', ({ t, p, h, rho }) => {
    expect(Math.abs(moistAirDensityKgM3(t + 273.15, p, h) / rho - 1)).toBeLessThan(1e-5);
  });

  it.each([
    // NIST / F. E. Jones (1978) worked examples, as quoted beside CIPM-2007 values in the test
    // suite of CRAN `masscor`; the two formulations agree to about 5e-5.
    { t: 22.3, mmHg: 748.1, h: 0.37, rho: 1.17194 },
    { t: 23.4, mmHg: 612.3, h: 0.23, rho: 0.95632 },
  ])(
    'agrees with the Jones (1978) value at $t °C, $mmHg mmHg, RH $h within 1e-4',
    ({ t, mmHg, h, rho }) => {
      expect(Math.abs(moistAirDensityKgM3(t + 273.15, mmHg * MMHG_PA, h) / rho - 1)).toBeLessThan(
        1e-4,
      );
    },
  );

  it('agrees with psychrolib (ASHRAE Handbook, ideal-gas moist air) within 1e-3', () => {
    // psychrolib has no real-gas correction and uses R_da = 287.042, hence the looser tolerance.
    psychrolib.SetUnitSystem(psychrolib.SI);
    for (const [t, h] of [
      [20, 0.5],
      [5, 0.8],
      [30, 0.3],
    ] as const) {
      const humidityRatio = psychrolib.GetHumRatioFromRelHum(t, h, 101325);
      const expected = psychrolib.GetMoistAirDensity(t, humidityRatio, 101325);
      expect(Math.abs(moistAirDensityKgM3(t + 273.15, 101325, h) / expected - 1)).toBeLessThan(
        1e-3,
      );
    }
  });

  it('is lighter when humid: water (18 g/mol) displaces air (29 g/mol)', () => {
    expect(moistAirDensityKgM3(298.15, 101325, 0.9)).toBeLessThan(
      moistAirDensityKgM3(298.15, 101325, 0),
    );
  });

  it('reads a dew point equal to the air temperature as saturation', () => {
    const fromDewPoint = vapourMoleFractionFromDewPoint(293.15, 293.15, 101325);
    const fromHumidity = vapourMoleFractionFromRelativeHumidity(1, 293.15, 101325);
    expect(fromDewPoint).toBeCloseTo(fromHumidity, 12);
  });

  it('reports a compressibility of 0.99964 for dry air at 20 °C (CIPM-2007, computed)', () => {
    const state = moistAirDensity({
      temperatureK: 293.15,
      pressurePa: 101325,
      vapourMoleFraction: 0,
    });
    expect(state.compressibility).toBeCloseTo(0.999643, 5);
  });
});

describe('saturationVapourPressurePa', () => {
  it.each([
    // IAPWS (Wagner & Pruß 2002, eq. 2.5) values, reference check values §2.2; the CIPM formula
    // agrees with them to about 1e-4 over 0–40 °C.
    [0.01, 611.66],
    [10, 1228.11],
    [20, 2339.19],
    [25, 3169.82],
    [30, 4246.92],
    [40, 7385.11],
  ])('at %s °C is %s Pa within 1e-4', (t, expected) => {
    expect(Math.abs(saturationVapourPressurePa(t + 273.15) / expected - 1)).toBeLessThan(1e-4);
  });

  it('agrees with psychrolib (ASHRAE Handbook Fundamentals) within 5e-4 from 0.01 to 60 °C', () => {
    psychrolib.SetUnitSystem(psychrolib.SI);
    for (let t = 0.01; t <= 60; t += 5) {
      const expected = psychrolib.GetSatVapPres(t);
      expect(Math.abs(saturationVapourPressurePa(t + 273.15) / expected - 1)).toBeLessThan(5e-4);
    }
  });
});
