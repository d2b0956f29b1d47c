import { InputError } from '../errors.js';
import type { NumberFormat } from '../units/number-format.js';
import { readNumber } from '../units/number-text.js';
import { prepareWindProfile, type WindProfile } from './wind-profile.js';
import {
  type HeightAnchor,
  nextLayerHeight,
  WIND_HEIGHT_RANGE_M,
  WIND_LAYER_COUNT_RANGE,
  windLayerSchema,
  type WindLayerValues,
} from './wind-profile-schema.js';
import {
  heightToM,
  type WindHeightUnit,
  pressureToPa,
  type WindPressureUnit,
  speedToMS,
  type WindSpeedUnit,
  temperatureToK,
  type WindTemperatureUnit,
} from './wind-units.js';

/** A column by its position (1 for the first) or by its name in the header line. */
export type WindColumn = number | string;

/** Which column holds what, in which unit, and how the text is laid out. */
export interface WindColumnMapping {
  /** Height above mean sea level; give this or `pressure`, or both (a line then needs one). */
  readonly height?: { readonly column: WindColumn; readonly unit: WindHeightUnit };
  readonly pressure?: { readonly column: WindColumn; readonly unit: WindPressureUnit };
  /** Direction the wind blows from, degrees clockwise from true north. */
  readonly direction: { readonly column: WindColumn };
  readonly speed: { readonly column: WindColumn; readonly unit: WindSpeedUnit };
  readonly temperature?: { readonly column: WindColumn; readonly unit: WindTemperatureUnit };
  readonly dewPoint?: { readonly column: WindColumn; readonly unit: WindTemperatureUnit };
  /** Lines skipped at the top before anything is read (titles, unit lines); default 0. */
  readonly skipLines?: number;
  /**
   * Whether the first line after the skipped ones names the columns. Default: yes when any
   * column is given by name, no otherwise.
   */
  readonly headerRow?: boolean;
  /** What separates the cells; `auto` (default) looks at the first line read. */
  readonly separator?: 'auto' | ',' | ';' | '\t' | 'whitespace';
  /** How the file writes numbers (decimal mark); default `point-comma` (1,234.5). */
  readonly numberFormat?: NumberFormat;
}

/** A line left out, with its line number in the text (the first line is 1) and why. */
export interface BadWindLine {
  readonly line: number;
  readonly reason: string;
}

export interface WindProfileReading {
  /** The levels read, in SI units, in order of increasing height. */
  readonly layers: readonly WindLayerValues[];
  /** Line number of each level in `layers`. */
  readonly lines: readonly number[];
  /** Every line that could not be used, by line number, with the reason. */
  readonly bad: readonly BadWindLine[];
  /** The column names of the header line, when there is one. */
  readonly columns: readonly string[];
  /** The profile, when at least two levels were read. */
  readonly profile?: WindProfile;
  /** Why there is no profile, when there is none. */
  readonly problem?: string;
}

type Quantity = 'height' | 'pressure' | 'direction' | 'speed' | 'temperature' | 'dewPoint';

const LABELS: Record<Quantity, string> = {
  height: 'height',
  pressure: 'pressure',
  direction: 'direction',
  speed: 'speed',
  temperature: 'temperature',
  dewPoint: 'dew point',
};

/** Names of the SI fields in messages, with the unit the value is shown in. */
const SCHEMA_FIELD_LABELS: Record<string, string> = {
  heightM: 'height in m',
  pressurePa: 'pressure in Pa',
  directionDeg: 'direction',
  speedMS: 'speed in m/s',
  temperatureK: 'temperature in K',
  dewPointK: 'dew point in K',
};

const QUANTITIES: readonly Quantity[] = [
  'height',
  'pressure',
  'direction',
  'speed',
  'temperature',
  'dewPoint',
];

/** Splits one line into trimmed cells; a quoted cell ("…", "" for a quote) may hold the separator. */
function splitLine(text: string, separator: ',' | ';' | '\t' | 'whitespace'): string[] {
  if (separator === 'whitespace') return text.trim().split(/[\s\u00a0]+/);
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let index = 0; index < text.length; index += 1) {
    const character = text[index];
    if (quoted) {
      if (character === '"' && text[index + 1] === '"') {
        cell += '"';
        index += 1;
      } else if (character === '"') quoted = false;
      else cell += character;
    } else if (character === '"' && cell.trim() === '') {
      quoted = true;
      cell = '';
    } else if (character === separator) {
      cells.push(cell.trim());
      cell = '';
    } else cell += character;
  }
  cells.push(cell.trim());
  return cells;
}

function detectSeparator(line: string): ',' | ';' | '\t' | 'whitespace' {
  // A semicolon file may use decimal commas, so the semicolon wins over the comma; a tab file
  // may too.
  if (line.includes(';')) return ';';
  if (line.includes('\t')) return '\t';
  if (line.includes(',')) return ',';
  return 'whitespace';
}

function isSkippable(line: string): boolean {
  const trimmed = line.trim();
  return trimmed === '' || trimmed.startsWith('#');
}

/**
 * Reads a wind profile from CSV or whitespace-separated text, as radiosonde listings and forecast
 * exports write them: the columns the mapping names, converted from their units to SI. Header and
 * skipped lines, blank lines and lines starting with `#` are passed over; a line that cannot be
 * used (an empty or unreadable cell, a value out of range, a height not above the line before it)
 * is listed in `bad` with its line number and the reason, and left out, so one bad line does not
 * lose the file. Lines may run upward or downward (read from the first and last readable line);
 * they are returned upward. Pressure levels become heights as `windProfile` converts them
 * (hypsometric equation with the temperature column, else the 1976 standard atmosphere).
 * @param text the file's text
 * @param mapping columns, units and layout
 * @throws InputError when the mapping itself cannot be used (field `mapping.…`)
 */
export function readWindProfile(text: string, mapping: WindColumnMapping): WindProfileReading {
  checkMapping(mapping);
  const numberFormat = mapping.numberFormat ?? 'point-comma';
  const allLines = text.split(/\r\n|\n|\r/);
  const skip = mapping.skipLines ?? 0;
  const named = QUANTITIES.some((quantity) => typeof mapping[quantity]?.column === 'string');
  const hasHeader = mapping.headerRow ?? named;
  let index = skip;
  while (index < allLines.length && isSkippable(allLines[index] ?? '')) index += 1;
  const firstLine = allLines[index] ?? '';
  const separator =
    !mapping.separator || mapping.separator === 'auto'
      ? detectSeparator(firstLine)
      : mapping.separator;
  let columns: string[] = [];
  if (hasHeader) {
    columns = splitLine(firstLine, separator);
    index += 1;
  }
  const positions = resolveColumns(mapping, columns);

  const bad: BadWindLine[] = [];
  const rows: { line: number; layer: WindLayerValues }[] = [];
  for (; index < allLines.length; index += 1) {
    const lineText = allLines[index] ?? '';
    if (isSkippable(lineText)) continue;
    const line = index + 1;
    const result = readLine(splitLine(lineText, separator), mapping, positions, numberFormat);
    if (typeof result === 'string') bad.push({ line, reason: result });
    else rows.push({ line, layer: result });
  }

  // Downward files (top level first) are turned round, judged by the first and last lines read.
  const first = rows[0]?.layer;
  const last = rows[rows.length - 1]?.layer;
  if (first && last && rows.length > 1 && runsDownward(first, last)) rows.reverse();

  const layers: WindLayerValues[] = [];
  const lines: number[] = [];
  let anchor: HeightAnchor | undefined;
  let previousM: number | undefined;
  for (const row of rows) {
    const next = nextLayerHeight(anchor, row.layer);
    const reason = orderProblem(row.layer, next.heightM, previousM);
    if (reason) {
      bad.push({ line: row.line, reason });
      continue;
    }
    layers.push(row.layer);
    lines.push(row.line);
    anchor = next.anchor;
    previousM = next.heightM;
  }
  bad.sort((a, b) => a.line - b.line);
  const reading = { layers, lines, bad, columns };
  if (layers.length < WIND_LAYER_COUNT_RANGE.min) {
    return {
      ...reading,
      problem: `Only ${layers.length} usable line${layers.length === 1 ? '' : 's'}: a profile needs at least ${WIND_LAYER_COUNT_RANGE.min}.`,
    };
  }
  if (layers.length > WIND_LAYER_COUNT_RANGE.max) {
    return {
      ...reading,
      problem: `${layers.length} usable lines: a profile takes at most ${WIND_LAYER_COUNT_RANGE.max}.`,
    };
  }
  return { ...reading, profile: prepareWindProfile({ layers }) };
}

function runsDownward(first: WindLayerValues, last: WindLayerValues): boolean {
  if (first.heightM !== undefined && last.heightM !== undefined)
    return first.heightM > last.heightM;
  if (first.pressurePa !== undefined && last.pressurePa !== undefined) {
    return first.pressurePa < last.pressurePa;
  }
  return false;
}

function orderProblem(
  layer: WindLayerValues,
  heightM: number,
  previousM: number | undefined,
): string | undefined {
  const round = (value: number) => Math.round(value * 10) / 10;
  if (heightM < WIND_HEIGHT_RANGE_M.min || heightM > WIND_HEIGHT_RANGE_M.max) {
    return `the pressure puts the level at ${round(heightM)} m, outside ${WIND_HEIGHT_RANGE_M.min} to ${WIND_HEIGHT_RANGE_M.max} m`;
  }
  if (previousM !== undefined && !(heightM > previousM)) {
    return layer.heightM !== undefined
      ? `height ${round(heightM)} m is not above the level before it (${round(previousM)} m)`
      : `the pressure puts the level at ${round(heightM)} m, not above the level before it (${round(previousM)} m)`;
  }
  return undefined;
}

function checkMapping(mapping: WindColumnMapping): void {
  if (!mapping.height && !mapping.pressure) {
    throw new InputError(
      'mapping.height',
      undefined,
      'give a height column, a pressure column or both',
    );
  }
  const skip = mapping.skipLines ?? 0;
  if (!Number.isInteger(skip) || skip < 0) {
    throw new InputError('mapping.skipLines', skip, 'must be a whole number, 0 or more', {
      min: 0,
      unit: '',
    });
  }
  for (const quantity of QUANTITIES) {
    const column = mapping[quantity]?.column;
    if (typeof column === 'number' && (!Number.isInteger(column) || column < 1)) {
      throw new InputError(
        `mapping.${quantity}.column`,
        column,
        'must be a column position, 1 for the first',
        { min: 1, unit: '' },
      );
    }
    if (typeof column === 'string' && column.trim() === '') {
      throw new InputError(`mapping.${quantity}.column`, column, 'must name a column');
    }
  }
}

function resolveColumns(
  mapping: WindColumnMapping,
  columns: readonly string[],
): Partial<Record<Quantity, number>> {
  const positions: Partial<Record<Quantity, number>> = {};
  const folded = columns.map((name) => name.trim().toLowerCase());
  for (const quantity of QUANTITIES) {
    const column = mapping[quantity]?.column;
    if (column === undefined) continue;
    if (typeof column === 'number') {
      positions[quantity] = column - 1;
      continue;
    }
    if (columns.length === 0) {
      throw new InputError(
        `mapping.${quantity}.column`,
        column,
        'names a column, but the text has no header line (set headerRow)',
      );
    }
    const found = folded.indexOf(column.trim().toLowerCase());
    if (found < 0) {
      throw new InputError(
        `mapping.${quantity}.column`,
        column,
        `is not a column of the header line (${columns.join(', ')})`,
      );
    }
    positions[quantity] = found;
  }
  return positions;
}

/** One line as a level in SI units, or the reason it cannot be one. */
function readLine(
  cells: readonly string[],
  mapping: WindColumnMapping,
  positions: Partial<Record<Quantity, number>>,
  numberFormat: NumberFormat,
): WindLayerValues | string {
  const problems: string[] = [];
  const read = (quantity: Quantity, optional: boolean): number | undefined => {
    const position = positions[quantity];
    if (position === undefined) return undefined;
    const cell = cells[position];
    const where = `${LABELS[quantity]} (column ${position + 1})`;
    if (cell === undefined || cell === '') {
      if (!optional) problems.push(`${where} is empty`);
      return undefined;
    }
    const reading = readNumber(cell, numberFormat);
    if (!reading.ok) {
      problems.push(`${where} “${cell}” ${reading.reason}`);
      return undefined;
    }
    return reading.value;
  };
  // With both vertical columns mapped a line needs one of them; with one, that one.
  const both = mapping.height !== undefined && mapping.pressure !== undefined;
  const height = read('height', both);
  const pressure = read('pressure', both);
  if (both && height === undefined && pressure === undefined && problems.length === 0) {
    problems.push('height and pressure are both empty');
  }
  const direction = read('direction', false);
  const speed = read('speed', false);
  const temperature = read('temperature', true);
  const dewPoint = read('dewPoint', true);
  if (problems.length > 0) return problems.join('; ');
  const layer = {
    ...(height !== undefined && mapping.height
      ? { heightM: heightToM(height, mapping.height.unit) }
      : {}),
    ...(pressure !== undefined && mapping.pressure
      ? { pressurePa: pressureToPa(pressure, mapping.pressure.unit) }
      : {}),
    directionDeg: direction as number,
    speedMS: speedToMS(speed as number, (mapping.speed as { unit: WindSpeedUnit }).unit),
    ...(temperature !== undefined && mapping.temperature
      ? { temperatureK: temperatureToK(temperature, mapping.temperature.unit) }
      : {}),
    ...(dewPoint !== undefined && mapping.dewPoint
      ? { dewPointK: temperatureToK(dewPoint, mapping.dewPoint.unit) }
      : {}),
  };
  const parsed = windLayerSchema.safeParse(layer);
  if (parsed.success) return parsed.data;
  return parsed.error.issues
    .map((issue) => {
      const key = String(issue.path[0] ?? '');
      const label = SCHEMA_FIELD_LABELS[key] ?? key;
      const value = (layer as Record<string, unknown>)[key];
      const shown = typeof value === 'number' ? ` ${Math.round(value * 1000) / 1000}` : '';
      return `${label}${shown} ${issue.message}`;
    })
    .join('; ');
}
