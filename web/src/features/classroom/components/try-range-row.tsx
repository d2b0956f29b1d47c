import { Checkbox, Space } from 'antd';
import { formatQuantity, numberAtPath, type UnitSystem } from '@loftwright/buoyancy';
import type { Dispatch, SetStateAction } from 'react';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { ExampleDetail, TryRanges } from '../api/classroom-api';
import { inputFieldInfo } from '../lib/input-field';

/** A starting range around the example's value, for the teacher to narrow. */
const startingRange = (value: number) =>
  value > 0
    ? { min: value / 2, max: value * 2 }
    : value < 0
      ? { min: value * 2, max: value / 2 }
      : { min: 0, max: 1 };

/** One input of the example: whether students may change it, and between which values. */
export function TryRangeRow({
  example,
  path,
  ranges,
  setRanges,
  unitSystem,
}: {
  example: ExampleDetail;
  path: string;
  ranges: TryRanges;
  setRanges: Dispatch<SetStateAction<TryRanges>>;
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  const info = inputFieldInfo(example.kind, path);
  const dimension = info.dimension ?? 'coefficient';
  const value = numberAtPath(example.inputs, path) ?? 0;
  const range = ranges[path];
  return (
    <Space wrap style={{ display: 'flex', marginBottom: 8 }} data-range={path}>
      <Checkbox
        checked={range !== undefined}
        onChange={(event) =>
          setRanges((now) => {
            const others = Object.fromEntries(Object.entries(now).filter(([key]) => key !== path));
            if (!event.target.checked) return others;
            return { ...others, [path]: startingRange(value) };
          })
        }
      >
        {info.label}{' '}
        <span className="lw-mono">
          ({formatQuantity(value, dimension, unitSystem, { numberFormat, trimZeros: true }).text})
        </span>
      </Checkbox>
      {range ? (
        <>
          <QuantityInput
            label={`${info.label}: lowest value`}
            dimension={dimension}
            unitSystem={unitSystem}
            value={range.min}
            onChange={(min) =>
              setRanges((now) => ({ ...now, [path]: { ...range, min: min ?? Number.NaN } }))
            }
          />
          <QuantityInput
            label={`${info.label}: highest value`}
            dimension={dimension}
            unitSystem={unitSystem}
            value={range.max}
            onChange={(max) =>
              setRanges((now) => ({ ...now, [path]: { ...range, max: max ?? Number.NaN } }))
            }
          />
        </>
      ) : null}
    </Space>
  );
}
