import { create, createUnitDependencies, unitDependencies } from 'mathjs';
import { InputError } from '../errors.js';
import { DIMENSIONS, DISPLAY_UNITS, type Dimension, type UnitSystem } from './dimensions.js';

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
  R: 5 / 9,
};

const SYMBOLS: Record<string, string> = {
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

/** Turns typed symbols people use into mathjs names: "°C" -> "degC", "m³" -> "m^3". */
function normaliseText(text: string): string {
  return text
    .trim()
    .replace(/,/g, '.')
    .replace(/°\s*C\b/g, 'degC')
    .replace(/°\s*F\b/g, 'degF')
    .replace(/²/g, '^2')
    .replace(/³/g, '^3')
    .replace(/\s+/g, ' ');
}

/**
 * Reads a quantity typed by a user ("163 cm", "5 lb", "68 degF", "1013 hPa", "95 %") and returns
 * its value in the engine's SI unit for that dimension. A bare number is read in `defaultUnit`
 * (a mathjs unit name), or in SI if none is given.
 * @throws InputError (field `field`) for text that is not a number with a unit of that dimension
 */
export function parseQuantity(
  text: string,
  dimension: Dimension,
  options: { defaultUnit?: string; field?: string } = {},
): number {
  const field = options.field ?? 'value';
  const normalised = normaliseText(text);
  if (normalised === '')
    throw new InputError(field, text, 'is empty: enter a number, with its unit if you like');
  const bare = Number(normalised);
  if (dimension === 'fraction') return parseFraction(normalised, text, field);
  if (normalised !== '' && Number.isFinite(bare)) {
    return options.defaultUnit
      ? parseQuantity(`${normalised} ${options.defaultUnit}`, dimension, { field })
      : bare;
  }
  if (dimension === 'temperatureDifference') return parseTemperatureStep(normalised, text, field);
  let parsed;
  try {
    parsed = math.unit(normalised);
  } catch {
    throw new InputError(
      field,
      text,
      `is not a number with a unit (for example "${example(dimension)}")`,
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
  if (parsed.value === null) throw new InputError(field, text, 'has a unit but no number');
  const value = parsed.toNumber(target);
  if (!Number.isFinite(value)) throw new InputError(field, text, 'is not a finite number');
  return value;
}

function parseFraction(normalised: string, text: string, field: string): number {
  const percent = /^(-?[\d.]+(?:e-?\d+)?)\s*%$/i.exec(normalised);
  const value = percent ? Number(percent[1]) / 100 : Number(normalised);
  if (!Number.isFinite(value))
    throw new InputError(field, text, 'is not a fraction (for example "0.98" or "98 %")');
  return value;
}

function parseTemperatureStep(normalised: string, text: string, field: string): number {
  const match = /^(-?[\d.]+(?:e-?\d+)?)\s*([A-Za-z]+)$/.exec(normalised);
  const step = match ? TEMPERATURE_STEP_K[match[2] ?? ''] : undefined;
  if (!match || step === undefined) {
    throw new InputError(
      field,
      text,
      'is not a temperature difference (for example "15 K" or "27 degF")',
    );
  }
  return Number(match[1]) * step;
}

function describe(dimension: Dimension): string {
  return dimension.replace(/([A-Z])/g, ' $1').toLowerCase();
}

function example(dimension: Dimension): string {
  const unit = DISPLAY_UNITS[dimension].si.at(-1)?.unit ?? DIMENSIONS[dimension].mathjs;
  return `1.5 ${unit}`;
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
  options: { unit?: string; significantDigits?: number } = {},
): FormattedQuantity {
  const digits = options.significantDigits ?? 4;
  const unitName = options.unit ?? pickUnit(valueSI, dimension, unitSystem);
  const value = convertFromSI(valueSI, dimension, unitName);
  const unit = SYMBOLS[unitName] ?? unitName;
  const number = Number.isFinite(value) ? formatNumber(value, digits) : String(value);
  return {
    value,
    unit,
    unitName,
    text: unit === '' ? number : unit === '%' ? `${number} %` : `${number} ${unit}`,
  };
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
  if (dimension === 'temperatureDifference') {
    const step = TEMPERATURE_STEP_K[unitName];
    if (step === undefined)
      throw new InputError('unit', unitName, 'is not a temperature-difference unit');
    return valueSI / step;
  }
  return math.unit(valueSI, DIMENSIONS[dimension].mathjs).toNumber(unitName);
}

function formatNumber(value: number, significantDigits: number): string {
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, significantDigits - 1 - magnitude);
  return value.toFixed(Math.min(decimals, 12));
}
