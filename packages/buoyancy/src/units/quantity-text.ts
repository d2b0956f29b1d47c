import { create, createUnitDependencies, unitDependencies } from 'mathjs';
import { InputError } from '../errors.js';
import { DIMENSIONS, DISPLAY_UNITS, type Dimension, type UnitSystem } from './dimensions.js';
import { formatNumber, type NumberFormat } from './number-format.js';
import { readLeadingNumber, readNumber } from './number-text.js';

if (!unitDependencies || !createUnitDependencies)
  throw new Error('mathjs lacks its unit factories');
// Only the unit machinery of mathjs, not its whole expression library (see DEVELOPERS.md).
const math = create({ unitDependencies, createUnitDependencies });
// Inch of mercury, conventional: 3 386.389 Pa (NIST SP 811, Appendix B.8). mathjs has no inHg.
math.createUnit('inHg', '3386.389 Pa');

/** Temperature-difference units and their size in kelvin (a degree, not a temperature). */
const TEMPERATURE_STEP_K: Record<string, number> = {
  K: 1,
  degC: 1,
  celsius: 1,
  degF: 5 / 9,
  fahrenheit: 5 / 9,
  degR: 5 / 9,
};

const SYMBOLS: Record<string, string> = {
  deg: '°',
  degC: '°C',
  degF: '°F',
  degR: '°F',
  'm^2': 'm²',
  'm^3': 'm³',
  'ft^2': 'ft²',
  'ft^3': 'ft³',
  'kg/m^3': 'kg/m³',
  'lb/ft^3': 'lb/ft³',
  'g/m^2': 'g/m²',
  'oz/yd^2': 'oz/yd²',
};

/** Unit symbols people type, as mathjs names them: "°C" -> "degC", "m³" -> "m^3", "µm" -> "um". */
function normaliseUnit(text: string): string {
  return (
    text
      .replace(/℃/g, 'degC')
      .replace(/℉/g, 'degF')
      .replace(/°\s*([CFR])\b/g, 'deg$1')
      // A degree sign on its own is a plane angle (47.5°).
      .replace(/°/g, 'deg')
      .replace(/²/g, '^2')
      .replace(/³/g, '^3')
      .replace(/[µμ]/g, 'u')
      .replace(/\s*\/\s*/g, '/')
      .replace(/\s+/g, ' ')
  );
}

export interface QuantityReadOptions {
  /**
   * Unit a bare number is read in (a mathjs name, or "%"): the unit the field shows. Without it
   * a bare number is SI, except a fraction, which is a percentage.
   */
  readonly defaultUnit?: string;
  /** Field path or label the error names. */
  readonly field?: string;
  /** How the person writes numbers (default 1,234.5). */
  readonly numberFormat?: NumberFormat;
}

/**
 * Reads a quantity typed by a person ("163 cm", "5 lb", "68 °F", "1013 hPa", "98 %", "1,58 m")
 * under the one reading rule of `readLeadingNumber`, and returns its value in the engine's SI unit
 * for that dimension.
 * @throws InputError (field `field`) for text that is not a number with a unit of that dimension,
 *   or a number that reads two ways
 */
export function parseQuantity(
  text: string,
  dimension: Dimension,
  options: QuantityReadOptions = {},
): number {
  return readQuantity(text, dimension, options).valueSI;
}

/** A quantity as read: its SI value, and the unit it was read in (typed, or the field's). */
export interface QuantityReading {
  readonly valueSI: number;
  /** Unit the number was read in, as mathjs names it ("cm", "degF"), or "%" for a share. */
  readonly unit: string;
  /** Whether the person typed that unit, rather than a bare number. */
  readonly unitTyped: boolean;
}

/**
 * `parseQuantity`, also telling which unit the text was read in, so a field can read the next
 * bare number in the unit the person last typed there.
 * @throws InputError as parseQuantity
 */
export function readQuantity(
  text: string,
  dimension: Dimension,
  options: QuantityReadOptions = {},
): QuantityReading {
  const field = options.field ?? 'value';
  const format = options.numberFormat ?? 'point-comma';
  const reading = readLeadingNumber(text, format);
  if (!reading.ok) throw new InputError(field, text, reading.reason);
  const unitText = normaliseUnit(reading.rest);
  const unit = unitText === '' ? (options.defaultUnit ?? bareUnit(dimension)) : unitText;
  const valueSI = toSI(reading.value, unit, dimension, text, field);
  if (!Number.isFinite(valueSI)) throw new InputError(field, text, 'is too large a number');
  // Below absolute zero in any unit is no temperature at all, whatever the field's range.
  if (dimension === 'temperature' && valueSI < 0) {
    throw new InputError(
      field,
      text,
      'is below absolute zero (0 K, −273.15 °C, −459.67 °F): no temperature can be',
    );
  }
  return { valueSI, unit, unitTyped: unitText !== '' };
}

/**
 * Reads a whole number of things (fills, cells, cylinders) a person typed, under the same rule.
 * @throws InputError (field `field`) for anything but a whole number
 */
export function parseCount(
  text: string,
  options: { field?: string; numberFormat?: NumberFormat } = {},
): number {
  const field = options.field ?? 'count';
  const reading = readNumber(text, options.numberFormat ?? 'point-comma');
  if (!reading.ok) throw new InputError(field, text, reading.reason);
  if (!Number.isInteger(reading.value)) throw new InputError(field, text, 'is not a whole number');
  return reading.value;
}

/** The unit a bare number means when the field names none. */
function bareUnit(dimension: Dimension): string {
  return dimension === 'fraction' ? '%' : DIMENSIONS[dimension].mathjs;
}

function toSI(value: number, unit: string, dimension: Dimension, text: string, field: string) {
  if (dimension === 'fraction') {
    if (unit === '%') return value / 100;
    if (unit === '') return value;
    throw new InputError(field, text, 'is a share: type a percentage such as 98 %');
  }
  if (dimension === 'coefficient') {
    if (unit === '') return value;
    throw new InputError(field, text, 'is a plain number without a unit, such as 0.35');
  }
  if (unit === '') return value;
  if (dimension === 'temperatureDifference') {
    const step = TEMPERATURE_STEP_K[unit];
    if (step === undefined)
      throw new InputError(
        field,
        text,
        'is not a temperature difference (for example "15 K" or "27 °F")',
      );
    return value * step;
  }
  let parsed;
  try {
    parsed = math.unit(value, unit);
  } catch {
    throw new InputError(
      field,
      text,
      `has “${unit}” where a unit should be (for example "${example(dimension)}")`,
    );
  }
  const target = DIMENSIONS[dimension].mathjs;
  if (!parsed.equalBase(math.unit(target))) {
    throw new InputError(
      field,
      text,
      `is not a ${describe(dimension)} (for example "${example(dimension)}")`,
    );
  }
  return parsed.toNumber(target);
}

function describe(dimension: Dimension): string {
  return dimension.replace(/([A-Z])/g, ' $1').toLowerCase();
}

function example(dimension: Dimension): string {
  const unit = DISPLAY_UNITS[dimension].si.at(-1)?.unit ?? DIMENSIONS[dimension].mathjs;
  return `1.5 ${SYMBOLS[unit] ?? unit}`;
}

export interface FormattedQuantity {
  readonly value: number;
  /** Unit as shown (°C, m³, g). */
  readonly unit: string;
  /** Unit as mathjs names it, to convert back. */
  readonly unitName: string;
  readonly text: string;
}

/**
 * Converts an SI value of a dimension into the unit that reads best in the chosen unit system,
 * rounded to `significantDigits` (default 4) for the text.
 */
export function formatQuantity(
  valueSI: number,
  dimension: Dimension,
  unitSystem: UnitSystem,
  options: {
    unit?: string;
    significantDigits?: number;
    numberFormat?: NumberFormat;
    /** Group thousands (default true); off for text a person will edit. */
    grouping?: boolean;
    /** Drop zeros that add nothing: "1.630 m" -> "1.63 m" (default false). */
    trimZeros?: boolean;
  } = {},
): FormattedQuantity {
  const digits = options.significantDigits ?? defaultDigits(valueSI, dimension);
  const unitName = options.unit ?? pickUnit(valueSI, dimension, unitSystem);
  const value = convertFromSI(valueSI, dimension, unitName);
  const unit = SYMBOLS[unitName] ?? unitName;
  const number = formatNumber(value, options.numberFormat ?? 'point-comma', {
    significantDigits: digits,
    grouping: options.grouping,
    trimZeros: options.trimZeros,
  });
  return {
    value,
    unit,
    unitName,
    // The degree of plane angle follows its number without a space (BIPM SI Brochure, 5.4.3).
    text:
      unit === ''
        ? number
        : unit === '%'
          ? `${number} %`
          : unit === '°'
            ? `${number}°`
            : `${number} ${unit}`,
  };
}

/**
 * Four significant digits, except for an angle: a latitude or longitude to five decimals of a
 * degree (about a metre on the ground), which four digits (47.49°, over a kilometre) would lose.
 */
function defaultDigits(valueSI: number, dimension: Dimension): number {
  if (dimension !== 'angle') return 4;
  const wholeDigits = Math.max(1, Math.floor(Math.log10(Math.abs(valueSI) || 1)) + 1);
  return wholeDigits + 5;
}

function pickUnit(valueSI: number, dimension: Dimension, unitSystem: UnitSystem): string {
  const choices = DISPLAY_UNITS[dimension][unitSystem];
  const choice = choices.find(
    (candidate) => candidate.below === undefined || Math.abs(valueSI) < candidate.below,
  );
  return (choice ?? choices[choices.length - 1])?.unit ?? DIMENSIONS[dimension].mathjs;
}

/** Converts an SI value into `unitName` (mathjs name, or "%"). */
export function convertFromSI(valueSI: number, dimension: Dimension, unitName: string): number {
  if (dimension === 'fraction') return unitName === '%' ? valueSI * 100 : valueSI;
  if (dimension === 'coefficient') return valueSI;
  if (dimension === 'temperatureDifference') {
    const step = TEMPERATURE_STEP_K[unitName];
    if (step === undefined)
      throw new InputError('unit', unitName, 'is not a temperature-difference unit');
    return valueSI / step;
  }
  return math.unit(valueSI, DIMENSIONS[dimension].mathjs).toNumber(unitName);
}
