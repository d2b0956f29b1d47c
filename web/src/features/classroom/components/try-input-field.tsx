import { Slider, Typography } from 'antd';
import { formatRange, numberAtPath, type UnitSystem } from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { inputFieldInfo } from '../lib/input-field';

/** One input a student may change: typed with its unit or slid, within the teacher's range. */
export function TryInputField({
  kind,
  inputs,
  path,
  range,
  changed,
  value: changedValue,
  onChange,
  outside,
  generation,
  unitSystem,
}: {
  kind: string;
  inputs: Record<string, unknown>;
  path: string;
  range: { min: number; max: number };
  /** Whether the student has changed it (`value` is theirs, undefined while it does not read). */
  changed: boolean;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  outside: boolean;
  /** Bumped on reset, so the typed text goes back to the example's value. */
  generation: number;
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  const info = inputFieldInfo(kind, path);
  const dimension = info.dimension ?? 'coefficient';
  const original = numberAtPath(inputs, path) ?? range.min;
  const value = changed ? changedValue : original;
  const allowed = formatRange(range.min, range.max, dimension, {
    unitSystem,
    numberFormat,
  }).replace(/^between (.*) and /, '$1 to ');
  return (
    <div style={{ marginBottom: 16, maxWidth: 480 }} data-try={path}>
      <label htmlFor={`try-${path}`} style={{ display: 'block', fontWeight: 600 }}>
        {info.label.replace(/^./, (first) => first.toUpperCase())}
      </label>
      <QuantityInput
        key={generation}
        id={`try-${path}`}
        label={info.label}
        dimension={dimension}
        value={value}
        unitSystem={unitSystem}
        onChange={onChange}
      />
      <Slider
        min={range.min}
        max={range.max}
        step={(range.max - range.min) / 200}
        value={value !== undefined ? Math.min(range.max, Math.max(range.min, value)) : range.min}
        tooltip={{ open: false }}
        aria-label={`${info.label}, slider`}
        onChange={(next: number) => onChange(next)}
      />
      <Typography.Text type={outside ? 'danger' : 'secondary'} role={outside ? 'alert' : undefined}>
        {outside ? `Outside what your teacher allowed: ${allowed}.` : `Allowed: ${allowed}.`}
      </Typography.Text>
    </div>
  );
}
