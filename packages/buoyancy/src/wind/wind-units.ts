import { ZERO_CELSIUS_K } from '../constants.js';

/**
 * Units a wind profile's columns may be written in, with their factors to SI. Sources: NIST
 * Special Publication 811 (2008), Appendix B.8/B.9: foot 0.3048 m, knot 1852/3600 m/s, mile per
 * hour 0.44704 m/s, inch of mercury (conventional) 3386.389 Pa; millibar = hectopascal = 100 Pa;
 * °F to K as (t + 459.67)·5/9.
 */
export const WIND_HEIGHT_UNITS = ['m', 'ft', 'km'] as const;
export const WIND_PRESSURE_UNITS = ['Pa', 'hPa', 'mb', 'kPa', 'inHg'] as const;
export const WIND_SPEED_UNITS = ['m/s', 'kn', 'km/h', 'mph'] as const;
export const WIND_TEMPERATURE_UNITS = ['K', '°C', '°F'] as const;

export type WindHeightUnit = (typeof WIND_HEIGHT_UNITS)[number];
export type WindPressureUnit = (typeof WIND_PRESSURE_UNITS)[number];
export type WindSpeedUnit = (typeof WIND_SPEED_UNITS)[number];
export type WindTemperatureUnit = (typeof WIND_TEMPERATURE_UNITS)[number];

const HEIGHT_TO_M: Record<WindHeightUnit, number> = { m: 1, ft: 0.3048, km: 1000 };
const PRESSURE_TO_PA: Record<WindPressureUnit, number> = {
  Pa: 1,
  hPa: 100,
  mb: 100,
  kPa: 1000,
  inHg: 3386.389,
};
const SPEED_TO_MS: Record<WindSpeedUnit, number> = {
  'm/s': 1,
  kn: 1852 / 3600,
  'km/h': 1 / 3.6,
  mph: 0.44704,
};

/** A height in the given unit, in metres. */
export function heightToM(value: number, unit: WindHeightUnit): number {
  return value * HEIGHT_TO_M[unit];
}

/** A pressure in the given unit, in pascals. */
export function pressureToPa(value: number, unit: WindPressureUnit): number {
  return value * PRESSURE_TO_PA[unit];
}

/** A speed in the given unit, in metres per second. */
export function speedToMS(value: number, unit: WindSpeedUnit): number {
  return value * SPEED_TO_MS[unit];
}

/** A temperature on the given scale, in kelvin. */
export function temperatureToK(value: number, unit: WindTemperatureUnit): number {
  if (unit === 'K') return value;
  if (unit === '°C') return value + ZERO_CELSIUS_K;
  return ((value + 459.67) * 5) / 9;
}
