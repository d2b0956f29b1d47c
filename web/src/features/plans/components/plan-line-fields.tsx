import { Form, Input, Select, Space } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { CountInput } from '@/components/quantity/count-input';
import type { CalculationListItem, SavePlanBody } from '../api/plans-api';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';
import { PlanQuantityField } from './plan-quantity-field';

const ENTERED = 'entered';
const SPHERE = 'sphere';

type Line = SavePlanBody['lines'][number];

/** Where a line's gas comes from, chosen anew: an entered volume, a sphere, or a calculation. */
function lineFrom(value: string, line: Line): Partial<Line> {
  if (value === ENTERED)
    return { calculationId: undefined, diameterM: undefined, volumeM3: line.volumeM3 ?? 1 };
  if (value === SPHERE)
    return { calculationId: undefined, volumeM3: undefined, diameterM: line.diameterM ?? 1 };
  return { calculationId: value, volumeM3: undefined, diameterM: undefined };
}

/** One envelope of the plan: where its gas comes from, how much, how many, and its name. */
export function PlanLineFields({
  index,
  line,
  editor,
  options,
  optionsLoading,
  unitSystem,
}: {
  index: number;
  line: Line;
  editor: PlanDraftEditor;
  options: CalculationListItem[] | undefined;
  optionsLoading: boolean;
  unitSystem: UnitSystem;
}) {
  const { setLine } = editor;
  const envelope = `Envelope ${index + 1}`;
  return (
    <Space wrap align="start" role="group" aria-label={envelope}>
      <Form.Item label="From">
        <Select
          aria-label={`${envelope} from`}
          style={{ width: 260 }}
          loading={optionsLoading}
          value={line.calculationId ?? (line.diameterM === undefined ? ENTERED : SPHERE)}
          options={[
            { value: ENTERED, label: 'A volume I enter' },
            { value: SPHERE, label: 'A sphere of a diameter I enter' },
            ...(options ?? []).map((option) => ({
              value: option.id,
              label: `${option.title} (v${option.latestVersion})`,
            })),
          ]}
          onChange={(value: string) => {
            editor.forget(`lines.${index}.`);
            setLine(index, lineFrom(value, line));
          }}
        />
      </Form.Item>
      {line.diameterM !== undefined ? (
        <PlanQuantityField
          editor={editor}
          field={`lines.${index}.diameterM`}
          caption="Diameter"
          label={`${envelope} diameter`}
          dimension="length"
          value={line.diameterM}
          apply={(value) => setLine(index, { diameterM: value })}
          unitSystem={unitSystem}
        />
      ) : null}
      {line.calculationId || line.diameterM !== undefined ? null : (
        <PlanQuantityField
          editor={editor}
          field={`lines.${index}.volumeM3`}
          caption="Gas per envelope"
          label={`${envelope} gas per envelope`}
          dimension="volume"
          value={line.volumeM3}
          apply={(value) => setLine(index, { volumeM3: value })}
          unitSystem={unitSystem}
        />
      )}
      <Form.Item label="How many">
        <CountInput
          label={`${envelope} count`}
          min={1}
          max={100000}
          value={line.count}
          onChange={(count) => count !== undefined && setLine(index, { count })}
        />
      </Form.Item>
      <Form.Item label="Name (optional)">
        <Input
          aria-label={`${envelope} name`}
          value={line.label ?? ''}
          maxLength={200}
          onChange={(event) => setLine(index, { label: event.target.value || undefined })}
        />
      </Form.Item>
    </Space>
  );
}
