import { Space, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';
import { PlanQuantityField } from './plan-quantity-field';

/** The gas's temperature and pressure at filling. */
export function PlanFillSection({
  editor,
  unitSystem,
}: {
  editor: PlanDraftEditor;
  unitSystem: UnitSystem;
}) {
  const { draft, set } = editor;
  return (
    <>
      <Typography.Title level={5}>Gas at filling</Typography.Title>
      <Space wrap align="start">
        <PlanQuantityField
          editor={editor}
          field="temperatureK"
          caption="Gas temperature"
          label="Gas temperature at filling"
          dimension="temperature"
          value={draft.fill.temperatureK}
          apply={(temperatureK) => set({ fill: { ...draft.fill, temperatureK } })}
          unitSystem={unitSystem}
        />
        <PlanQuantityField
          editor={editor}
          field="pressurePa"
          caption="Gas pressure (absolute)"
          label="Gas pressure at filling"
          dimension="pressure"
          value={draft.fill.pressurePa}
          apply={(pressurePa) => set({ fill: { ...draft.fill, pressurePa } })}
          unitSystem={unitSystem}
        />
      </Space>
    </>
  );
}
