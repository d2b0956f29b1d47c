import { Form, Select, Space } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import type { ReadingRow } from '../hooks/use-fill-log-fields';
import { FILL_LOG_RANGES } from '../lib/fill-log-ranges';

/** One lift reading: its kind, its time since filling, and the ballast and scale or the net lift. */
export function ReadingRowFields({
  index,
  row,
  onChange,
  unitSystem,
}: {
  index: number;
  row: ReadingRow;
  onChange: (change: Partial<ReadingRow>) => void;
  unitSystem: UnitSystem;
}) {
  const reading = `Reading ${index + 1}`;
  return (
    <Space wrap align="start" aria-label={reading} role="group">
      <Form.Item label={reading}>
        <Select
          aria-label={`${reading} kind`}
          style={{ width: 170 }}
          value={row.kind}
          options={[
            { value: 'ballast', label: 'Ballast and scale' },
            { value: 'direct', label: 'Net lift read directly' },
          ]}
          onChange={(kind: ReadingRow['kind']) => onChange({ kind })}
        />
      </Form.Item>
      <Form.Item label="Time since filling">
        <QuantityInput
          label={`${reading} time since filling`}
          dimension="time"
          value={row.timeS}
          onChange={(timeS) => onChange({ timeS })}
          unitSystem={unitSystem}
          range={FILL_LOG_RANGES.timeS}
        />
      </Form.Item>
      {row.kind === 'ballast' ? (
        <>
          <Form.Item label="Ballast mass">
            <QuantityInput
              label={`${reading} ballast mass`}
              dimension="mass"
              value={row.ballastMassKg}
              onChange={(ballastMassKg) => onChange({ ballastMassKg })}
              unitSystem={unitSystem}
              range={FILL_LOG_RANGES.ballastMassKg}
            />
          </Form.Item>
          <Form.Item label="Scale reading">
            <QuantityInput
              label={`${reading} scale reading`}
              dimension="mass"
              value={row.scaleReadingKg}
              onChange={(scaleReadingKg) => onChange({ scaleReadingKg })}
              unitSystem={unitSystem}
              range={FILL_LOG_RANGES.scaleReadingKg}
            />
          </Form.Item>
        </>
      ) : (
        <Form.Item label="Net lift">
          <QuantityInput
            label={`${reading} net lift`}
            dimension="mass"
            value={row.netLiftKg}
            onChange={(netLiftKg) => onChange({ netLiftKg })}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.netLiftKg}
          />
        </Form.Item>
      )}
    </Space>
  );
}
