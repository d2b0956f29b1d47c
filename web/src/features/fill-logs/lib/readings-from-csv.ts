import {
  type FillAmbient,
  type FillReading,
  InputError,
  type InputFieldInfo,
  type NumberFormat,
  parseQuantity,
  readableIssue,
  type ReadableOptions,
  reduceFillLog,
} from '@loftwright/buoyancy';
import type { ParsedCsv } from '@/lib/parse-csv';

export const TIME_UNITS = ['s', 'min', 'h', 'day'] as const;
export const MASS_UNITS = ['kg', 'g', 'lb', 'oz'] as const;
export const TEMPERATURE_UNITS = ['degC', 'degF', 'K'] as const;
export const PRESSURE_UNITS = ['hPa', 'kPa', 'Pa', 'inHg'] as const;

/** Which column holds what, and in which unit the file writes it. */
export interface ReadingColumns {
  time: { column: string; unit: (typeof TIME_UNITS)[number] };
  lift:
    | { kind: 'ballast'; column: string; unit: (typeof MASS_UNITS)[number]; ballastMassKg: number }
    | { kind: 'direct'; column: string; unit: (typeof MASS_UNITS)[number] };
  temperature?: { column: string; unit: (typeof TEMPERATURE_UNITS)[number] };
  pressure?: { column: string; unit: (typeof PRESSURE_UNITS)[number] };
}

/** The reading fields a row fills, named as the mapping names them, for messages. */
const READING_FIELDS: Record<string, InputFieldInfo> = {
  timeS: { label: 'Time', dimension: 'time' },
  scaleReadingKg: { label: 'Scale reading', dimension: 'mass' },
  netLiftKg: { label: 'Net lift', dimension: 'mass' },
  ballastMassKg: { label: 'Ballast mass', dimension: 'mass' },
  airTemperatureK: { label: 'Air temperature', dimension: 'temperature' },
  pressurePa: { label: 'Pressure', dimension: 'pressure' },
};

const cell = (row: Record<string, string>, column: string, what: string) => {
  const value = (row[column] ?? '').trim();
  if (value === '') throw new Error(`${what} (column "${column}") is empty`);
  return value;
};

/**
 * Readings from the mapped columns, each checked by the engine exactly as the server will check
 * it (cells in the file's number format); a row that fails is listed with its line and the reason, and left out.
 */
export function readingsFromCsv(
  parsed: ParsedCsv,
  columns: ReadingColumns,
  ambient: FillAmbient,
  numberFormat: NumberFormat,
  /** How messages show ranges: the person's units and number format, not the file's. */
  display: ReadableOptions = { unitSystem: 'si', numberFormat },
): { readings: FillReading[]; bad: { line: number; reason: string }[] } {
  const readings: FillReading[] = [];
  const bad: { line: number; reason: string }[] = [...parsed.problems];
  for (const { line, cells } of parsed.rows) {
    try {
      const timeS = parseQuantity(
        `${cell(cells, columns.time.column, 'time')} ${columns.time.unit}`,
        'time',
        { field: 'time', numberFormat },
      );
      const mass = parseQuantity(
        `${cell(cells, columns.lift.column, 'lift')} ${columns.lift.unit}`,
        'mass',
        { field: columns.lift.kind === 'ballast' ? 'scale reading' : 'net lift', numberFormat },
      );
      const air = {
        ...(columns.temperature
          ? {
              airTemperatureK: parseQuantity(
                `${cell(cells, columns.temperature.column, 'temperature')} ${columns.temperature.unit}`,
                'temperature',
                { field: 'air temperature', numberFormat },
              ),
            }
          : {}),
        ...(columns.pressure
          ? {
              pressurePa: parseQuantity(
                `${cell(cells, columns.pressure.column, 'pressure')} ${columns.pressure.unit}`,
                'pressure',
                { field: 'pressure', numberFormat },
              ),
            }
          : {}),
      };
      const reading: FillReading =
        columns.lift.kind === 'ballast'
          ? {
              kind: 'ballast',
              timeS,
              ballastMassKg: columns.lift.ballastMassKg,
              scaleReadingKg: mass,
              ...air,
            }
          : { kind: 'direct', timeS, netLiftKg: mass, ...air };
      reduceFillLog({ ambient, readings: [reading] });
      readings.push(reading);
    } catch (error) {
      const reason =
        error instanceof InputError
          ? error.issues
              .map((issue) =>
                readableIssue(
                  issue,
                  READING_FIELDS[issue.field.split('.').at(-1) ?? ''] ?? {
                    // A cell that did not read is named by the field given to the reader.
                    label: issue.field.replace(/^./, (first) => first.toUpperCase()),
                  },
                  display,
                ),
              )
              .join('; ')
          : error instanceof Error
            ? error.message
            : String(error);
      bad.push({ line, reason });
    }
  }
  bad.sort((a, b) => a.line - b.line);
  return { readings, bad };
}
