import {
  InputError,
  type NumberFormat,
  readWindProfile,
  type WindColumnMapping,
  type WindHeightUnit,
  type WindPressureUnit,
  type WindProfileReading,
  type WindSpeedUnit,
  type WindTemperatureUnit,
} from '@loftwright/buoyancy';

export type WindSeparator = NonNullable<WindColumnMapping['separator']>;

/**
 * How the person says a wind file is laid out: columns by position (1 for the first), `undefined`
 * for a column the file does not have, each with its unit.
 */
export interface WindImportSettings {
  readonly heightColumn: number | undefined;
  readonly heightUnit: WindHeightUnit;
  readonly pressureColumn: number | undefined;
  readonly pressureUnit: WindPressureUnit;
  readonly directionColumn: number;
  readonly speedColumn: number;
  readonly speedUnit: WindSpeedUnit;
  readonly temperatureColumn: number | undefined;
  readonly temperatureUnit: WindTemperatureUnit;
  readonly dewPointColumn: number | undefined;
  readonly dewPointUnit: WindTemperatureUnit;
  readonly skipLines: number;
  readonly headerRow: boolean;
  readonly separator: WindSeparator;
  readonly numberFormat: NumberFormat;
}

/** The layout most exported forecasts use: height, direction, speed, one header line. */
export function defaultWindSettings(numberFormat: NumberFormat): WindImportSettings {
  return {
    heightColumn: 1,
    heightUnit: 'm',
    pressureColumn: undefined,
    pressureUnit: 'hPa',
    directionColumn: 2,
    speedColumn: 3,
    speedUnit: 'm/s',
    temperatureColumn: undefined,
    temperatureUnit: '°C',
    dewPointColumn: undefined,
    dewPointUnit: '°C',
    skipLines: 0,
    headerRow: true,
    separator: 'auto',
    numberFormat,
  };
}

const column = <T extends object>(position: number | undefined, rest: T) =>
  position === undefined ? undefined : { column: position, ...rest };

/** The settings as the engine's reader takes them. */
export function toWindMapping(settings: WindImportSettings): WindColumnMapping {
  const entries = {
    height: column(settings.heightColumn, { unit: settings.heightUnit }),
    pressure: column(settings.pressureColumn, { unit: settings.pressureUnit }),
    direction: { column: settings.directionColumn },
    speed: { column: settings.speedColumn, unit: settings.speedUnit },
    temperature: column(settings.temperatureColumn, { unit: settings.temperatureUnit }),
    dewPoint: column(settings.dewPointColumn, { unit: settings.dewPointUnit }),
    skipLines: settings.skipLines,
    headerRow: settings.headerRow,
    separator: settings.separator,
    numberFormat: settings.numberFormat,
  };
  // Unmapped optional columns are left out rather than passed as undefined.
  return Object.fromEntries(
    Object.entries(entries).filter(([, value]) => value !== undefined),
  ) as unknown as WindColumnMapping;
}

/** What the import field names the reader's `mapping.…` fields by. */
const MAPPING_LABELS: Record<string, string> = {
  'mapping.height': 'Height column',
  'mapping.height.column': 'Height column',
  'mapping.pressure.column': 'Pressure column',
  'mapping.direction.column': 'Direction column',
  'mapping.speed.column': 'Speed column',
  'mapping.temperature.column': 'Temperature column',
  'mapping.dewPoint.column': 'Dew point column',
  'mapping.skipLines': 'Lines to skip',
};

export type WindFileRead =
  | { readonly ok: true; readonly reading: WindProfileReading }
  | { readonly ok: false; readonly problem: string };

/** The text read with the settings, or why the settings cannot be used (naming the field). */
export function readWindFile(text: string, settings: WindImportSettings): WindFileRead {
  try {
    return { ok: true, reading: readWindProfile(text, toWindMapping(settings)) };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    const problem = error.issues
      .map((issue) => `${MAPPING_LABELS[issue.field] ?? issue.field} ${issue.reason}`)
      .join('; ');
    return { ok: false, problem };
  }
}

/** How many cells the first line read has, to offer that many column positions. */
export function cellCount(text: string, settings: WindImportSettings): number {
  const lines = text.split(/\r\n|\n|\r/).slice(settings.skipLines);
  const first = lines.find((line) => line.trim() !== '' && !line.trim().startsWith('#')) ?? '';
  const separator =
    settings.separator === 'auto'
      ? first.includes(';')
        ? ';'
        : first.includes('\t')
          ? '\t'
          : first.includes(',')
            ? ','
            : 'whitespace'
      : settings.separator;
  if (first.trim() === '') return 0;
  return separator === 'whitespace'
    ? first.trim().split(/[\s\u00a0]+/).length
    : first.split(separator).length;
}
