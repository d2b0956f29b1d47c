import { formatNumber, parseCount, plainEditText } from '@loftwright/buoyancy';
import { ReadingInput } from '@/components/reading/reading-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';

export interface CountInputProps {
  label: string;
  value: number | undefined;
  onChange: (count: number | undefined) => void;
  /** Allowed whole numbers, the same the server checks. */
  min: number;
  max: number;
  externalProblem?: string;
  /** A \"check this\" note for a value that is allowed but seldom met. */
  note?: string;
  id?: string;
  disabled?: boolean;
}

/** A whole number of things (fills, cells, envelopes), read by the one reading rule. */
export function CountInput({
  label,
  value,
  onChange,
  min,
  max,
  externalProblem,
  note,
  id,
  disabled,
}: CountInputProps) {
  const { numberFormat } = useReadingPreferences();
  const whole = (next: number, grouping: boolean) =>
    grouping
      ? formatNumber(next, numberFormat, { significantDigits: 15, trimZeros: true })
      : plainEditText(next, numberFormat);
  return (
    <ReadingInput
      id={id}
      label={label}
      value={value}
      onChange={onChange}
      disabled={disabled}
      displayKey={numberFormat}
      externalProblem={externalProblem}
      note={note}
      display={(next) => whole(next, false)}
      read={(text) => {
        const next = parseCount(text, { numberFormat, field: label });
        return { value: next, readAs: whole(next, true) };
      }}
      check={(next) =>
        next < min || next > max
          ? `must be a whole number between ${whole(min, true)} and ${whole(max, true)}`
          : undefined
      }
    />
  );
}
