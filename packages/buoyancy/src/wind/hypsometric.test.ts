import psychrolib from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { hypsometricHeightM, layerMeanTemperatureK, virtualTemperatureK } from './hypsometric.js';

psychrolib.SetUnitSystem(psychrolib.SI);

describe('virtual temperature', () => {
  it.each([
    [303.15, 298.15, 100000],
    [293.15, 283.15, 85000],
    [278.15, 274.15, 70000],
  ])(
    'at %s K, dew point %s K, %s Pa gives the density psychrolib (ASHRAE Handbook 2017) gives',
    (temperatureK, dewPointK, pressurePa) => {
      // psychrolib: humidity ratio from the dew point, then the moist-air density; the dry air of
      // that density at the same pressure has the virtual temperature, T_v = p/(R_da·ρ) with
      // psychrolib's R_da = 287.042 J/(kg·K). Their saturation formula (Hyland–Wexler) and ours
      // (CIPM-2007) differ by about 1e-4, and R_da by 4e-5: 0.01 K covers both.
      const humidityRatio = psychrolib.GetHumRatioFromTDewPoint(dewPointK - 273.15, pressurePa);
      const density = psychrolib.GetMoistAirDensity(
        temperatureK - 273.15,
        humidityRatio,
        pressurePa,
      );
      const reference = pressurePa / (287.042 * density);
      expect(
        Math.abs(virtualTemperatureK(temperatureK, pressurePa, dewPointK) - reference),
      ).toBeLessThan(0.01);
    },
  );

  it('is the air temperature for dry air (no dew point)', () => {
    expect(virtualTemperatureK(250, 50000, undefined)).toBe(250);
  });
});

describe('hypsometric height', () => {
  it('reproduces the 1976 standard atmosphere across a layer of constant lapse rate', () => {
    // U.S. Standard Atmosphere 1976: 0 to 11 km' at −6.5 K/km'. The log-mean temperature makes
    // the hypsometric equation exact for a linear profile, so the standard's own pressure at 9 km
    // must come back at 9 km (to the computer's precision, 1 mm).
    const bottom = standardAtmosphere(0);
    const top = standardAtmosphere(9000);
    const heightM = hypsometricHeightM(
      0,
      bottom.pressurePa,
      bottom.temperatureK,
      top.pressurePa,
      top.temperatureK,
    );
    expect(Math.abs(heightM - 9000)).toBeLessThan(1e-3);
  });

  it('uses the arithmetic mean when the two temperatures are equal', () => {
    expect(layerMeanTemperatureK(216.65, 216.65)).toBe(216.65);
    // Log mean of 288.15 and 216.65 K: (288.15 − 216.65)/ln(288.15/216.65) = 250.58 K, between
    // the two and below their average, as a log mean is.
    const mean = layerMeanTemperatureK(288.15, 216.65);
    expect(mean).toBeGreaterThan(216.65);
    expect(mean).toBeLessThan((288.15 + 216.65) / 2);
  });
});
