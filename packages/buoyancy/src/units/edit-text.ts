import type { Dimension, UnitSystem } from './dimensions.js';
import { formatNumber, type NumberFormat } from './number-format.js';
import { formatQuantity } from './quantity-text.js';

/**
 * Digits a quantity field shows for editing: enough that any envelope a person types in SI reads
 * back unchanged, and a converted value (1.2 m in ft) is not a wall of digits.
 */
export const EDIT_SIGNIFICANT_DIGITS = 6;

/**
 * The text a quantity field shows for a value, as the person will edit it: in `unit` (default
 * the display unit of the person's unit system), their number format, no thousands grouping
 * (so it reads back one way) and no trailing zeros. Read back by `readQuantity` it gives the
 * value again to the digits shown.
 */
export function quantityEditText(
  valueSI: number,
  dimension: Dimension,
  unitSystem: UnitSystem,
  numberFormat: NumberFormat,
  unit?: string,
): string {
  return formatQuantity(valueSI, dimension, unitSystem, {
    unit,
    numberFormat,
    significantDigits: EDIT_SIGNIFICANT_DIGITS,
    trimZeros: true,
    grouping: false,
  }).text;
}

/**
 * The text an amount of money or a count shows for editing: every digit the person typed
 * (amounts are never rounded to a few digits: 123456.78 stays that), no grouping.
 */
export function plainEditText(value: number, numberFormat: NumberFormat): string {
  return formatNumber(value, numberFormat, {
    significantDigits: 15,
    trimZeros: true,
    grouping: false,
  });
}
