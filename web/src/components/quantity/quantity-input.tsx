import {
  type Dimension,
  formatQuantity,
  formatRange,
  quantityEditText,
  readQuantity,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useState } from 'react';
import { ReadingInput } from '@/components/reading/reading-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';

export interface QuantityInputProps {
  /** Accessible name, also shown as the label by the form. */
  label: string;
  dimension: Dimension;
  /** The value in SI, or undefined while the text does not read as one. */
  value: number | undefined;
  onChange: (valueSI: number | undefined) => void;
  unitSystem: UnitSystem;
  /** Allowed range in SI, checked as the person types (the same range the server checks). */
  range?: { min: number; max: number };
  /** A problem found by the form's check or the server, shown when the text itself reads. */
  externalProblem?: string;
  /** A \"check this\" note for a value that is allowed but seldom met. */
  note?: string;
  id?: string;
  disabled?: boolean;
}

/**
 * A number with its unit, typed as people write it ("163 cm", "5 lb", "68 °F", "1013 hPa", "98 %")
 * in their number format. A bare number is read in the unit the field shows now: the unit last
 * typed there, or the field's display unit in the person's unit system. Below the field it says
 * what it understood, or why it cannot read the text.
 */
export function QuantityInput({
  label,
  dimension,
  value,
  onChange,
  unitSystem,
  range,
  externalProblem,
  note,
  id,
  disabled,
}: QuantityInputProps) {
  const { numberFormat } = useReadingPreferences();
  const displayUnit = (valueSI: number | undefined) =>
    formatQuantity(valueSI ?? 1, dimension, unitSystem).unitName;
  // The unit a bare number means: the one last typed here, else the one the value was last shown
  // in. Clearing the field keeps it; a value from outside or another unit system resets it.
  const [typedUnit, setTypedUnit] = useState<string | undefined>();
  const [shownUnit, setShownUnit] = useState(() => displayUnit(value));
  const displayKey = `${unitSystem}/${numberFormat}`;
  const [unitFor, setUnitFor] = useState(displayKey);
  const [lastValue, setLastValue] = useState(value);
  if (unitFor !== displayKey || value !== lastValue) {
    setUnitFor(displayKey);
    setLastValue(value);
    setTypedUnit(undefined);
    if (value !== undefined) setShownUnit(displayUnit(value));
  }
  const bareUnit = typedUnit ?? shownUnit;
  const shown = (valueSI: number, unit?: string) =>
    quantityEditText(valueSI, dimension, unitSystem, numberFormat, unit);
  const unitSymbol = (unit: string) => formatQuantity(0, dimension, unitSystem, { unit }).unit;

  return (
    <ReadingInput
      id={id}
      label={label}
      value={value}
      disabled={disabled}
      displayKey={displayKey}
      externalProblem={externalProblem}
      note={note}
      onChange={(next) => {
        // The field's own value coming back is no value from outside.
        setLastValue(next);
        onChange(next);
      }}
      display={(valueSI) => shown(valueSI, typedUnit)}
      read={(text) => {
        const reading = readQuantity(text, dimension, {
          defaultUnit: bareUnit,
          numberFormat,
          field: label,
        });
        if (reading.unitTyped) setTypedUnit(reading.unit);
        const inDisplayUnit = shown(reading.valueSI);
        const inTypedUnit = shown(reading.valueSI, reading.unit);
        const readAs =
          dimension === 'coefficient'
            ? inTypedUnit
            : reading.unitTyped
              ? inTypedUnit === inDisplayUnit
                ? inDisplayUnit
                : `${inTypedUnit} (${inDisplayUnit})`
              : dimension === 'fraction'
                ? `${inTypedUnit} (a number alone is a percentage)`
                : `${inTypedUnit} (a number alone is in ${unitSymbol(reading.unit)})`;
        return { value: reading.valueSI, readAs };
      }}
      check={
        range
          ? (valueSI) =>
              valueSI < range.min || valueSI > range.max
                ? `must be ${formatRange(range.min, range.max, dimension, { unitSystem, numberFormat })}`
                : undefined
          : undefined
      }
    />
  );
}
