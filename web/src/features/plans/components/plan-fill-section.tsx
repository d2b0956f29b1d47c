import { Form, Space, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';

/** The gas's temperature and pressure at filling. */
export function PlanFillSection({
  editor,
  unitSystem,
}: {
  editor: PlanDraftEditor;
  unitSystem: UnitSystem;
}) {
  const { draft, set, readAs } = editor;
  return (
    <>
      <Typography.Title level={5}>Gas at filling</Typography.Title>
      <Space wrap align="start">
        <Form.Item label="Gas temperature">
          <QuantityInput
            label="Gas temperature at filling"
            dimension="temperature"
            value={draft.fill.temperatureK}
            onChange={(temperatureK) =>
              readAs('temperatureK', temperatureK, (temperatureK) =>
                set({ fill: { ...draft.fill, temperatureK } }),
              )
            }
            unitSystem={unitSystem}
          />
        </Form.Item>
        <Form.Item label="Gas pressure (absolute)">
          <QuantityInput
            label="Gas pressure at filling"
            dimension="pressure"
            value={draft.fill.pressurePa}
            onChange={(pressurePa) =>
              readAs('pressurePa', pressurePa, (pressurePa) =>
                set({ fill: { ...draft.fill, pressurePa } }),
              )
            }
            unitSystem={unitSystem}
          />
        </Form.Item>
      </Space>
    </>
  );
}
