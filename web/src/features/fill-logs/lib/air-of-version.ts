import {
  InputError,
  standardAtmosphere,
  USSA1976_SEA_LEVEL_PRESSURE_PA,
  USSA1976_SEA_LEVEL_TEMPERATURE_K,
  vapourMoleFractionFromDewPoint,
  vapourMoleFractionFromRelativeHumidity,
} from '@loftwright/buoyancy';

/** Where the starting air of a fill log came from, for the line the dialog shows. */
export type AirOrigin =
  | { kind: 'measured' }
  | { kind: 'standard'; altitudeM: number; temperatureOffsetK: number }
  | { kind: 'none' };

/** The air a fill log starts from: the air its version was computed for. */
export interface VersionAir {
  temperatureK: number;
  pressurePa: number;
  /** 0 to 1; undefined when the version names no air or its humidity cannot be turned into one. */
  relativeHumidity: number | undefined;
  /** The version's dew point, when the relative humidity was worked out from it. */
  dewPointK?: number;
  origin: AirOrigin;
}

/** Sea level in the 1976 standard atmosphere: 15 °C, 1013.25 hPa. */
export const NO_AIR: VersionAir = {
  temperatureK: USSA1976_SEA_LEVEL_TEMPERATURE_K,
  pressurePa: USSA1976_SEA_LEVEL_PRESSURE_PA,
  relativeHumidity: undefined,
  origin: { kind: 'none' },
};

type Fields = Record<string, unknown>;

const isFields = (value: unknown): value is Fields =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

const finite = (value: unknown): value is number =>
  typeof value === 'number' && Number.isFinite(value);

/**
 * The ambient air a version's inputs name: `ambient` (most kinds), the launch site of a flight
 * profile (standard atmosphere, dry, as that kind computes it), or the air of a lift
 * measurement's prediction. Undefined for kinds without air (envelope geometry, gas supply, rules).
 */
function ambientOf(inputs: unknown): Fields | undefined {
  if (!isFields(inputs)) return undefined;
  if (isFields(inputs.ambient)) return inputs.ambient;
  if (isFields(inputs.launch)) {
    return {
      mode: 'standard',
      altitudeM: inputs.launch.altitudeM,
      temperatureOffsetK: inputs.launch.temperatureOffsetK,
      humidity: { kind: 'dry' },
    };
  }
  if (isFields(inputs.prediction) && isFields(inputs.prediction.ambient)) {
    return inputs.prediction.ambient;
  }
  return undefined;
}

/**
 * Relative humidity at the air's temperature and pressure: dry is 0, a dew point becomes the
 * relative humidity with the same water vapour (the engine's CIPM-2007 mole fractions, so the
 * server's reduction sees the same air). Undefined when it cannot be worked out.
 */
function relativeHumidityOf(
  humidity: unknown,
  temperatureK: number,
  pressurePa: number,
): Pick<VersionAir, 'relativeHumidity' | 'dewPointK'> {
  // The engine's schema default: no humidity given is dry air.
  if (humidity === undefined) return { relativeHumidity: 0 };
  if (!isFields(humidity)) return { relativeHumidity: undefined };
  if (humidity.kind === 'dry') return { relativeHumidity: 0 };
  if (humidity.kind === 'relative' && finite(humidity.relativeHumidity)) {
    return { relativeHumidity: humidity.relativeHumidity };
  }
  if (humidity.kind === 'dewPoint' && finite(humidity.dewPointK)) {
    try {
      const vapour = vapourMoleFractionFromDewPoint(humidity.dewPointK, temperatureK, pressurePa);
      const saturated = vapourMoleFractionFromRelativeHumidity(1, temperatureK, pressurePa);
      return { relativeHumidity: vapour / saturated, dewPointK: humidity.dewPointK };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
    }
  }
  return { relativeHumidity: undefined };
}

/**
 * The air a calculation version was computed for, as a fill log's starting values: measured air
 * as given; a standard atmosphere at its altitude, plus its temperature offset (ISA + ΔT, the
 * pressure stays the standard one). A version that names no air, or names it in a way this cannot
 * read, starts from sea level in the 1976 standard atmosphere (`origin.kind === 'none'`).
 */
export function airOfVersion(inputs: unknown): VersionAir {
  const ambient = ambientOf(inputs);
  if (!ambient) return NO_AIR;
  if (ambient.mode === 'measured') {
    if (!finite(ambient.temperatureK) || !finite(ambient.pressurePa)) return NO_AIR;
    return {
      temperatureK: ambient.temperatureK,
      pressurePa: ambient.pressurePa,
      ...relativeHumidityOf(ambient.humidity, ambient.temperatureK, ambient.pressurePa),
      origin: { kind: 'measured' },
    };
  }
  if (ambient.mode === 'standard' && finite(ambient.altitudeM)) {
    const temperatureOffsetK = ambient.temperatureOffsetK ?? 0;
    if (!finite(temperatureOffsetK)) return NO_AIR;
    try {
      const { temperatureK, pressurePa } = standardAtmosphere(ambient.altitudeM, {
        temperatureOffsetK,
      });
      return {
        temperatureK,
        pressurePa,
        ...relativeHumidityOf(ambient.humidity, temperatureK, pressurePa),
        origin: { kind: 'standard', altitudeM: ambient.altitudeM, temperatureOffsetK },
      };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
    }
  }
  return NO_AIR;
}
