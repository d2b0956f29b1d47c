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
};

/** How a reader wants numbers shown: their unit system and number format. */
export interface ShownAs {
  unitSystem: UnitSystem;
  numberFormat: NumberFormat;
}

/** "1.056 kg/m³": a result as one piece of text, in the reader's units and number format. */
export function formatOutputText(value: number, unit: string, shownAs: ShownAs): string {
  const shown = formatOutput(value, unit, shownAs);
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
): { value: string; unit: string } {
  const dimension = DIMENSION_OF_UNIT[unit];
  if (dimension) {
    const formatted = formatQuantity(value, dimension, unitSystem, { numberFormat });
    return {
      value: formatted.text.slice(0, formatted.text.length - formatted.unit.length).trim(),
      unit: formatted.unit,
    };
  }
  // Counts (cylinders, cells) read as whole numbers; the rest to four significant digits.
  return { value: formatNumber(value, numberFormat, { significantDigits: 4 }), unit };
}
