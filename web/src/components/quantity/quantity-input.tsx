import { Input, Typography } from 'antd';
import {
  type Dimension,
  formatQuantity,
  InputError,
  parseQuantity,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useId, useState } from 'react';

export interface QuantityInputProps {
  /** Accessible name, also shown as the label by the form. */
  label: string;
  dimension: Dimension;
  /** The value in SI, or undefined while the text does not read as one. */
  value: number | undefined;
  onChange: (valueSI: number | undefined) => void;
  unitSystem: UnitSystem;
  id?: string;
  disabled?: boolean;
}

/** "1.630000 m" -> "1.63 m", "100.0 m" -> "100 m": zeros after the decimal point add nothing. */
const trimZeros = (text: string) =>
  text.replace(/(\.\d*?)0+(?=\s|$)/, '$1').replace(/\.(?=\s|$)/, '');

const display = (value: number | undefined, dimension: Dimension, unitSystem: UnitSystem) =>
  value === undefined
    ? ''
    : trimZeros(formatQuantity(value, dimension, unitSystem, { significantDigits: 6 }).text);

/**
 * A number with its unit, typed as people write it ("163 cm", "5 lb", "68 degF", "1013 hPa"). A bare
 * number is read in the unit shown. Below the field it says what it understood, in the chosen unit
 * system, or why it cannot read the text.
 */
export function QuantityInput({
  label,
  dimension,
  value,
  onChange,
  unitSystem,
  id,
  disabled,
}: QuantityInputProps) {
  const [text, setText] = useState(() => display(value, dimension, unitSystem));
  const [problem, setProblem] = useState<string | undefined>();
  const hintId = useId();
  // A bare number is read in the unit the field showed when it was last filled in (or would show
  // for a value of 1); it does not change while the user types.
  const unitShown = (system: UnitSystem) => formatQuantity(value ?? 1, dimension, system).unitName;
  const [defaultUnit, setDefaultUnit] = useState(() => unitShown(unitSystem));

  // Show the value in the other unit system when the user switches (adjusting state while
  // rendering, as React recommends, rather than in an effect).
  const [shownIn, setShownIn] = useState(unitSystem);
  if (shownIn !== unitSystem) {
    setShownIn(unitSystem);
    setText(display(value, dimension, unitSystem));
    setDefaultUnit(unitShown(unitSystem));
  }

  // The value this field last reported. A different value arriving from outside (another
  // version taken after a conflict, a reset) replaces the text; the user's own typing never does.
  const [reported, setReported] = useState(value);
  if (value !== reported) {
    setReported(value);
    setText(display(value, dimension, unitSystem));
    setProblem(undefined);
    setDefaultUnit(unitShown(unitSystem));
  }
  const report = (valueSI: number | undefined) => {
    setReported(valueSI);
    onChange(valueSI);
  };

  const read = (next: string) => {
    setText(next);
    try {
      const bareNumber =
        next.trim() !== '' && Number.isFinite(Number(next.trim().replace(',', '.')));
      const parsed =
        dimension === 'fraction'
          ? parseQuantity(bareNumber ? `${next} %` : next, dimension, { field: label })
          : parseQuantity(next, dimension, { field: label, defaultUnit });
      setProblem(undefined);
      report(parsed);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      setProblem(error.reason);
      report(undefined);
    }
  };

  const understood =
    value === undefined ? undefined : formatQuantity(value, dimension, unitSystem).text;
  return (
    <>
      <Input
        id={id}
        aria-label={label}
        aria-describedby={hintId}
        aria-invalid={problem ? true : undefined}
        status={problem ? 'error' : undefined}
        value={text}
        disabled={disabled}
        onChange={(event) => read(event.target.value)}
        className="lw-mono"
      />
      <Typography.Text id={hintId} type={problem ? 'danger' : 'secondary'} style={{ fontSize: 12 }}>
        {problem ? `${label} ${problem}` : understood ? `read as ${understood}` : ' '}
      </Typography.Text>
    </>
  );
}
