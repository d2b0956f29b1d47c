import { type Dimension, formatQuantity, type UnitSystem } from '@loftwright/buoyancy';

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

/** "1.056 kg/m³": a result as one piece of text, in the user's unit system. */
export function formatOutputText(value: number, unit: string, unitSystem: UnitSystem): string {
  const shown = formatOutput(value, unit, unitSystem);
  return `${shown.value} ${shown.unit}`.trim();
}

/** A result value in the user's unit system where its unit has a dimension, else as the engine gives it. */
export function formatOutput(
  value: number,
  unit: string,
  unitSystem: UnitSystem,
): { value: string; unit: string } {
  const dimension = DIMENSION_OF_UNIT[unit];
  if (dimension) {
    const formatted = formatQuantity(value, dimension, unitSystem);
    return {
      value: formatted.text.slice(0, formatted.text.length - formatted.unit.length).trim(),
      unit: formatted.unit,
    };
  }
  // Counts (cylinders, cells) read as whole numbers.
  if (Number.isInteger(value) && unit === '') return { value: String(value), unit };
  const magnitude = value === 0 ? 0 : Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.min(10, Math.max(0, 3 - magnitude));
  return { value: value.toFixed(decimals), unit };
}
