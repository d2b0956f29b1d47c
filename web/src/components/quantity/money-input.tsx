import { formatNumber, parseMoney, plainEditText } from '@loftwright/buoyancy';
import { ReadingInput } from '@/components/reading/reading-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';

export interface MoneyInputProps {
  label: string;
  /** The amount in `currency`, or undefined while the text does not read as one. */
  value: number | undefined;
  onChange: (amount: number | undefined) => void;
  /** ISO 4217 code the amount is in; shown beside it and checked against a typed one. */
  currency: string;
  /** What the price is per, if anything ("kWh", "m³"). */
  per?: 'kWh' | 'm³';
  /** Largest amount accepted (the same limit the server checks). */
  max?: number;
  externalProblem?: string;
  /** A \"check this\" note for a value that is allowed but seldom met. */
  note?: string;
  id?: string;
  disabled?: boolean;
}

/**
 * An amount of money, read by the one reading rule: "0.25", "0,25", "0.25 EUR/kWh", "€0.50".
 * A typed currency must be the one the prices are in; nothing is converted.
 */
export function MoneyInput({
  label,
  value,
  onChange,
  currency,
  per,
  max,
  externalProblem,
  note,
  id,
  disabled,
}: MoneyInputProps) {
  const { numberFormat } = useReadingPreferences();
  // Every digit typed is kept in the text to edit; "read as" groups thousands for reading.
  const amount = (value: number, grouping: boolean) =>
    grouping
      ? formatNumber(value, numberFormat, { significantDigits: 15, trimZeros: true })
      : plainEditText(value, numberFormat);
  const unit = `${currency}${per ? `/${per}` : ''}`;
  return (
    <ReadingInput
      id={id}
      label={label}
      value={value}
      onChange={onChange}
      disabled={disabled}
      displayKey={`${numberFormat}/${unit}`}
      externalProblem={externalProblem}
      note={note}
      placeholder={`${amount(0.25, false)} ${unit}`}
      display={(next) => amount(next, false)}
      read={(text) => {
        const next = parseMoney(text, { currency, per, numberFormat, field: label });
        return { value: next, readAs: `${amount(next, true)} ${unit}` };
      }}
      check={
        max === undefined
          ? undefined
          : (next) => (next > max ? `must be at most ${amount(max, true)} ${unit}` : undefined)
      }
    />
  );
}
