import {
  type Dimension,
  formatNumber,
  formatQuantity,
  type NumberFormat,
  type UnitSystem,
} from '@loftwright/buoyancy';

const DIMENSION_OF_UNIT: Record<string, Dimension> = {
  kg: 'mass',
  m: 'length',
  'm²': 'area',
  'm³': 'volume',
  N: 'force',
  Pa: 'pressure',
  K: 'temperature',
  'kg/m³': 'density',
  'm/s': 'velocity',
  s: 'time',
  W: 'power',
  '°': 'angle',
};

/** How a reader wants numbers shown: their unit system and number format. */
export interface ShownAs {
  unitSystem: UnitSystem;
  numberFormat: NumberFormat;
}

/** "1.056 kg/m³": a result as one piece of text, in the reader's units and number format. */
export function formatOutputText(
  value: number,
  unit: string,
  shownAs: ShownAs,
  shownUnit?: string,
): string {
  const shown = formatOutput(value, unit, shownAs, shownUnit);
  return `${shown.value} ${shown.unit}`.trim();
}

/**
 * A result value in the reader's unit system where its unit has a dimension, else in the unit
 * the engine gives (a currency, kWh/m³, a count), always in the reader's number format.
 */
export function formatOutput(
  value: number,
  unit: string,
  { unitSystem, numberFormat }: ShownAs,
  /** The unit to show it in (a mathjs name, from sharedOutputUnit), instead of the one it picks. */
  shownUnit?: string,
): { value: string; unit: string } {
  const dimension = DIMENSION_OF_UNIT[unit];
  if (dimension) {
    const formatted = formatQuantity(value, dimension, unitSystem, {
      numberFormat,
      ...(shownUnit ? { unit: shownUnit } : {}),
    });
    return {
      value: formatted.text.slice(0, formatted.text.length - formatted.unit.length).trim(),
      unit: formatted.unit,
    };
  }
  // Counts (cylinders, cells) read as whole numbers; the rest to four significant digits.
  return { value: formatNumber(value, numberFormat, { significantDigits: 4 }), unit };
}

/**
 * One unit for several values of a result (the one the largest would pick), so two versions in
 * one row never read "2.130 h" against "108.7 min". Undefined where the unit has no dimension.
 */
export function sharedOutputUnit(
  values: readonly (number | null)[],
  unit: string,
  { unitSystem }: Pick<ShownAs, 'unitSystem'>,
): string | undefined {
  const dimension = DIMENSION_OF_UNIT[unit];
  const numbers = values.filter((value): value is number => typeof value === 'number');
  if (!dimension || numbers.length === 0) return undefined;
  const largest = numbers.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a));
  return formatQuantity(largest, dimension, unitSystem).unitName;
}
