import {
  type Dimension,
  formatNumber,
  formatQuantity,
  type NumberDisplayOptions,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useMemo } from 'react';
import { formatOutput, formatOutputText } from '@/components/quantity/format-output';
import { useReadingPreferences } from './reading-preferences';

/** Plain numbers (chart ticks, counts, percentages) in the signed-in person's number format. */
export function usePlainNumbers() {
  const { numberFormat } = useReadingPreferences();
  return useMemo(
    () => ({
      numberFormat,
      /** Significant digits by default, or `decimals`. */
      number: (value: number, options?: NumberDisplayOptions) =>
        formatNumber(value, numberFormat, options),
      /** A fixed count of decimals, never grouped (ticks, percentages). */
      fixed: (value: number, decimals: number) =>
        formatNumber(value, numberFormat, { decimals, grouping: false }),
    }),
    [numberFormat],
  );
}

/**
 * Every number shown to the signed-in person, in their unit system and number format: results,
 * quantities, plain numbers and chart ticks. Exports do not use it; they stay machine-readable.
 */
export function useNumberDisplay(unitSystem: UnitSystem) {
  const plain = usePlainNumbers();
  return useMemo(() => {
    const { numberFormat } = plain;
    const shownAs = { unitSystem, numberFormat };
    return {
      ...plain,
      shownAs,
      /** A quantity given in SI, in the unit the reader's system shows it in (or `unit`). */
      quantity: (
        valueSI: number,
        dimension: Dimension,
        options: { unit?: string; significantDigits?: number; trimZeros?: boolean } = {},
      ) => formatQuantity(valueSI, dimension, unitSystem, { ...options, numberFormat }),
      /** An engine result with its unit, split for display. */
      output: (value: number, unit: string) => formatOutput(value, unit, shownAs),
      outputText: (value: number, unit: string) => formatOutputText(value, unit, shownAs),
    };
  }, [unitSystem, plain]);
}

export type NumberDisplay = ReturnType<typeof useNumberDisplay>;
