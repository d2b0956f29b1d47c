import { Form, Select, Space, Switch, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import type { SavePlanBody } from '../api/plans-api';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';
import { PlanQuantityField } from './plan-quantity-field';

const DEFAULT_CYLINDER: NonNullable<SavePlanBody['cylinder']> = {
  gasId: 'helium',
  waterVolumeM3: 0.05,
  fillPressurePa: 2e7,
  temperatureK: 288.15,
};

/** Gas cylinders as a source: switched on, then the gas, a cylinder's water volume and pressure. */
export function PlanCylinderFields({
  editor,
  unitSystem,
}: {
  editor: PlanDraftEditor;
  unitSystem: UnitSystem;
}) {
  const { draft, set } = editor;
  return (
    <>
      <Space align="center" style={{ margin: '8px 0' }}>
        <Switch
          aria-label="Gas cylinders"
          checked={draft.cylinder !== undefined}
          onChange={(on) => {
            editor.forget('waterVolumeM3', 'fillPressurePa');
            set({ cylinder: on ? DEFAULT_CYLINDER : undefined });
          }}
        />
        <Typography.Text>Gas cylinders</Typography.Text>
      </Space>
      {draft.cylinder ? (
        <Space wrap align="start">
          <Form.Item label="Gas">
            <Select
              aria-label="Cylinder gas"
              style={{ width: 140 }}
              value={draft.cylinder.gasId}
              options={[
                { value: 'helium', label: 'Helium' },
                { value: 'hydrogen', label: 'Hydrogen' },
              ]}
              onChange={(gasId: NonNullable<SavePlanBody['cylinder']>['gasId']) =>
                draft.cylinder && set({ cylinder: { ...draft.cylinder, gasId } })
              }
            />
          </Form.Item>
          <PlanQuantityField
            editor={editor}
            field="waterVolumeM3"
            caption="Water volume of one cylinder"
            label="Cylinder water volume"
            dimension="volume"
            value={draft.cylinder.waterVolumeM3}
            apply={(waterVolumeM3) =>
              draft.cylinder && set({ cylinder: { ...draft.cylinder, waterVolumeM3 } })
            }
            unitSystem={unitSystem}
          />
          <PlanQuantityField
            editor={editor}
            field="fillPressurePa"
            caption="Fill pressure (gauge)"
            label="Cylinder fill pressure"
            dimension="pressureDifference"
            value={draft.cylinder.fillPressurePa}
            apply={(fillPressurePa) =>
              draft.cylinder && set({ cylinder: { ...draft.cylinder, fillPressurePa } })
            }
            unitSystem={unitSystem}
          />
        </Space>
      ) : null}
    </>
  );
}
