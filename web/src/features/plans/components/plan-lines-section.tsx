import { Button, Space, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useCalculationOptions } from '../api/plans-api';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';
import { PlanLineFields } from './plan-line-fields';

/** The envelopes of the plan, one line each, with adding and removing the last. */
export function PlanLinesSection({
  editor,
  unitSystem,
}: {
  editor: PlanDraftEditor;
  unitSystem: UnitSystem;
}) {
  const options = useCalculationOptions();
  const { draft, set } = editor;
  return (
    <>
      <Typography.Title level={5}>Envelopes</Typography.Title>
      {draft.lines.map((line, index) => (
        <PlanLineFields
          key={index}
          index={index}
          line={line}
          editor={editor}
          options={options.data}
          optionsLoading={options.isPending}
          unitSystem={unitSystem}
        />
      ))}
      <Space style={{ marginBottom: 16 }}>
        <Button onClick={() => set({ lines: [...draft.lines, { volumeM3: 1, count: 1 }] })}>
          Add an envelope
        </Button>
        {draft.lines.length > 1 ? (
          <Button
            onClick={() => {
              editor.forget(`lines.${draft.lines.length - 1}.`);
              set({ lines: draft.lines.slice(0, -1) });
            }}
          >
            Remove the last envelope
          </Button>
        ) : null}
      </Space>
    </>
  );
}
