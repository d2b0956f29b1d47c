import {
  gravityAtAltitudeMS2,
  standardAtmosphereUnchecked,
} from '../atmosphere/standard-atmosphere.js';
import { type WindProfile, windProfileAirSampler } from '../wind/wind-profile.js';

/** The air a flight meets at one height. */
export interface AirAt {
  readonly temperatureK: number;
  readonly pressurePa: number;
  /** Dry-air density [kg/m³]. */
  readonly densityKgM3: number;
  /** Acceleration of gravity [m/s²]. */
  readonly gravityMS2: number;
}

/** The air along a flight, by geometric altitude above mean sea level [m]. */
export type AirModel = (altitudeM: number) => AirAt;

/**
 * The 1976 standard atmosphere with the day's temperature offset (pressure standard, density by
 * the ideal-gas law at the shifted temperature), as the flight has always used.
 */
export function standardAirModel(temperatureOffsetK: number): AirModel {
  return (altitudeM) => standardAtmosphereUnchecked(altitudeM, temperatureOffsetK);
}

/**
 * The air of a wind profile whose levels give temperatures (as `windProfileAirAt`: temperature
 * linear in geopotential height between levels, hypsometric pressure; the 1976 standard shifted to
 * meet the end levels outside it), with gravity by the inverse-square law of the 1976 standard.
 */
export function profileAirModel(profile: WindProfile): AirModel {
  const airAt = windProfileAirSampler(profile);
  return (altitudeM) => {
    const air = airAt(altitudeM);
    return {
      temperatureK: air.temperatureK,
      pressurePa: air.pressurePa,
      densityKgM3: air.densityKgM3,
      gravityMS2: gravityAtAltitudeMS2(altitudeM),
    };
  };
}
