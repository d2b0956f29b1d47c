import {
  geometricAltitudeM,
  geopotentialAltitudeM,
  standardAltitudeForPressureM,
} from '../atmosphere/standard-atmosphere.js';
import { SATURATION_TEMPERATURE_RANGE_K } from '../atmosphere/saturation-vapour-pressure.js';
import { saturationVapourPressurePa } from '../atmosphere/saturation-vapour-pressure.js';
import { WATER_MOLAR_MASS_KG_PER_MOL } from '../atmosphere/moist-air-density.js';
import {
  STANDARD_GRAVITY_M_PER_S2,
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
} from '../constants.js';

/**
 * R/g0 for dry air with the 1976 standard's constants, R = R* / M0 [m'/K]: the geopotential
 * thickness of a layer per kelvin of its mean temperature and per unit of ln(p1/p2).
 */
export const DRY_AIR_SCALE_M_PER_K =
  USSA1976_GAS_CONSTANT_J_PER_MOL_K /
  (USSA1976_AIR_MOLAR_MASS_KG_PER_MOL * STANDARD_GRAVITY_M_PER_S2);

const EPSILON = WATER_MOLAR_MASS_KG_PER_MOL / USSA1976_AIR_MOLAR_MASS_KG_PER_MOL;

/**
 * Virtual temperature, T_v = T / (1 − (e/p)·(1 − ε)), ε = M_w/M_d: the temperature dry air would
 * need to have the moist air's density at the same pressure (Wallace & Hobbs, Atmospheric Science,
 * 2nd ed., 2006, §3.1.1). The vapour pressure e is the saturation pressure at the dew point
 * (engine's CIPM-2007 formula, over water). Below a −40 °C dew point that formula does not apply
 * and the vapour is left out: there e/p is below 2e-4 at pressures above 100 hPa, so T_v − T is
 * below 0.02 K. Without a dew point, T_v = T (dry air).
 * @param temperatureK air temperature [K]
 * @param pressurePa air pressure [Pa], > 0
 * @param dewPointK dew point [K], not above the air temperature, or undefined
 * @internal callers have validated the values
 */
export function virtualTemperatureK(
  temperatureK: number,
  pressurePa: number,
  dewPointK: number | undefined,
): number {
  if (
    dewPointK === undefined ||
    dewPointK < SATURATION_TEMPERATURE_RANGE_K.min ||
    dewPointK > SATURATION_TEMPERATURE_RANGE_K.max
  ) {
    return temperatureK;
  }
  const vapourFraction = Math.min(saturationVapourPressurePa(dewPointK) / pressurePa, 1);
  return temperatureK / (1 - vapourFraction * (1 - EPSILON));
}

/**
 * Mean temperature of a layer whose temperature is linear in height between T1 and T2, as the
 * hypsometric equation weighs it: T̄ = (T1 − T2) / ln(T1/T2) (the log mean; T̄ = T1 when they are
 * equal). With it the hypsometric thickness is exact for a constant lapse rate, as in every layer
 * of the 1976 standard atmosphere.
 */
export function layerMeanTemperatureK(t1K: number, t2K: number): number {
  const ratio = t1K / t2K;
  if (Math.abs(ratio - 1) < 1e-6) return 0.5 * (t1K + t2K);
  return (t1K - t2K) / Math.log(ratio);
}

/**
 * Geometric height of a pressure level above a level of known height and pressure, from the
 * hypsometric equation Z2 − Z1 = (R/g0)·T̄_v·ln(p1/p2) (Wallace & Hobbs, Atmospheric Science, 2nd
 * ed., 2006, §3.2.2; AMS Glossary of Meteorology, "hypsometric equation"), in geopotential metres
 * and converted to geometric height with the 1976 standard's Earth radius.
 * @param baseHeightM geometric height of the lower level [m]
 * @param basePressurePa pressure there [Pa]
 * @param baseVirtualTemperatureK virtual temperature there [K]
 * @param pressurePa pressure of the level sought [Pa]
 * @param virtualTemperatureK its virtual temperature [K]
 * @returns geometric height [m]
 */
export function hypsometricHeightM(
  baseHeightM: number,
  basePressurePa: number,
  baseVirtualTemperatureK: number,
  pressurePa: number,
  virtualTemperatureK: number,
): number {
  const thicknessM =
    DRY_AIR_SCALE_M_PER_K *
    layerMeanTemperatureK(baseVirtualTemperatureK, virtualTemperatureK) *
    Math.log(basePressurePa / pressurePa);
  return geometricAltitudeM(geopotentialAltitudeM(baseHeightM) + thicknessM);
}

/**
 * Geometric height of a pressure level above a level of known height and pressure when the
 * temperatures are not known: the thickness of the same pressure interval in the 1976 standard
 * atmosphere, added to the lower level's geopotential height.
 */
export function standardThicknessHeightM(
  baseHeightM: number,
  basePressurePa: number,
  pressurePa: number,
): number {
  const thicknessM =
    geopotentialAltitudeM(standardAltitudeForPressureM(pressurePa)) -
    geopotentialAltitudeM(standardAltitudeForPressureM(basePressurePa));
  return geometricAltitudeM(geopotentialAltitudeM(baseHeightM) + thicknessM);
}

/**
 * Pressure at a height above a level of known pressure, the hypsometric equation solved for p2:
 * p2 = p1·exp(−ΔH / ((R/g0)·T̄)), ΔH the geopotential thickness.
 */
export function hypsometricPressurePa(
  baseHeightM: number,
  basePressurePa: number,
  baseTemperatureK: number,
  heightM: number,
  temperatureK: number,
): number {
  const thicknessM = geopotentialAltitudeM(heightM) - geopotentialAltitudeM(baseHeightM);
  return (
    basePressurePa *
    Math.exp(
      -thicknessM / (DRY_AIR_SCALE_M_PER_K * layerMeanTemperatureK(baseTemperatureK, temperatureK)),
    )
  );
}
