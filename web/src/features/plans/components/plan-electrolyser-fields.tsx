import { Form, Space, Switch, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { CountInput } from '@/components/quantity/count-input';
import type { SavePlanBody } from '../api/plans-api';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';
import { PlanQuantityField } from './plan-quantity-field';

const DEFAULT_ELECTROLYSER: NonNullable<SavePlanBody['electrolyser']> = {
  currentA: 30,
  cellsInSeries: 6,
  faradaicEfficiency: 0.95,
  voltage: { kind: 'cell', cellVoltageV: 2.1 },
  supplyEfficiency: 0.88,
};

/** The voltage per cell, where the voltage is given per cell (the form only sets it so). */
const cellVoltageOf = (voltage: NonNullable<SavePlanBody['electrolyser']>['voltage']) =>
  'cellVoltageV' in voltage ? voltage.cellVoltageV : undefined;

/** An own electrolyser as a source of hydrogen: switched on, then its current, cells, voltage. */
export function PlanElectrolyserFields({
  editor,
  unitSystem,
}: {
  editor: PlanDraftEditor;
  unitSystem: UnitSystem;
}) {
  const { draft, set } = editor;
  return (
    <>
      <Space align="center" style={{ marginBottom: 8 }}>
        <Switch
          aria-label="Own electrolyser"
          checked={draft.electrolyser !== undefined}
          onChange={(on) => {
            editor.forget('currentA', 'cellVoltageV');
            set({ electrolyser: on ? DEFAULT_ELECTROLYSER : undefined });
          }}
        />
        <Typography.Text>Own electrolyser (hydrogen)</Typography.Text>
      </Space>
      {draft.electrolyser ? (
        <Space wrap align="start">
          <PlanQuantityField
            editor={editor}
            field="currentA"
            caption="Current"
            label="Electrolyser current"
            dimension="current"
            value={draft.electrolyser.currentA}
            apply={(currentA) =>
              draft.electrolyser && set({ electrolyser: { ...draft.electrolyser, currentA } })
            }
            unitSystem={unitSystem}
          />
          <Form.Item label="Cells in series">
            <CountInput
              label="Cells in series"
              min={1}
              max={1000}
              value={draft.electrolyser.cellsInSeries}
              onChange={(cellsInSeries) =>
                draft.electrolyser &&
                cellsInSeries !== undefined &&
                set({ electrolyser: { ...draft.electrolyser, cellsInSeries } })
              }
            />
          </Form.Item>
          <PlanQuantityField
            editor={editor}
            field="cellVoltageV"
            caption="Voltage per cell"
            label="Voltage per cell"
            dimension="voltage"
            value={cellVoltageOf(draft.electrolyser.voltage)}
            apply={(cellVoltageV) =>
              draft.electrolyser &&
              set({
                electrolyser: {
                  ...draft.electrolyser,
                  voltage: { kind: 'cell', cellVoltageV },
                },
              })
            }
            unitSystem={unitSystem}
          />
        </Space>
      ) : null}
    </>
  );
}
