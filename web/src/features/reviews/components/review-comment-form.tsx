import { App, Button, Input, Select, Space } from 'antd';
import { describeInputs, KINDS, type UnitSystem } from '@loftwright/buoyancy';
import { useMemo, useState } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { useAddReviewComment } from '../api/reviews-api';

const WHOLE_VERSION = '';

/** A reviewer's comment on one input or result of the version in review, or on all of it. */
export function ReviewCommentForm({
  calculationId,
  number,
  kind,
  inputs,
  outputs,
  unitSystem,
}: {
  calculationId: string;
  number: number;
  kind: string;
  inputs: unknown;
  outputs: Record<string, { label: string }>;
  unitSystem: UnitSystem;
}) {
  const { message } = App.useApp();
  const { numberFormat } = useReadingPreferences();
  const add = useAddReviewComment(calculationId);
  const [target, setTarget] = useState(WHOLE_VERSION);
  const [body, setBody] = useState('');
  const options = useMemo(() => {
    const schema = KINDS.find((candidate) => candidate.id === kind)?.inputSchema;
    const lines = describeInputs(schema, inputs, { unitSystem, numberFormat }).flatMap(
      (section) => section.lines,
    );
    return [
      { value: WHOLE_VERSION, label: `The whole of version ${number}` },
      {
        label: 'Inputs',
        options: lines.map((line) => ({
          value: `input:${line.path}`,
          label: `${line.label} (${line.text})`,
        })),
      },
      {
        label: 'Results',
        options: Object.entries(outputs).map(([name, output]) => ({
          value: `result:${name}`,
          label: output.label,
        })),
      },
    ];
  }, [kind, inputs, outputs, unitSystem, numberFormat, number]);
  const send = () => {
    const [anchorKind, ...rest] = target.split(':');
    const anchor =
      target === WHOLE_VERSION
        ? undefined
        : { kind: anchorKind as 'input' | 'result', path: rest.join(':') };
    add.mutate(
      { number, body, ...(anchor ? { anchor } : {}) },
      {
        onSuccess: () => {
          setBody('');
          void message.success('Comment added.');
        },
        onError: (error) => void message.error(error.message),
      },
    );
  };
  return (
    <Space orientation="vertical" style={{ width: '100%' }}>
      <Select
        aria-label="Comment on"
        value={target}
        onChange={setTarget}
        options={options}
        showSearch={{ optionFilterProp: 'label' }}
        style={{ width: '100%' }}
      />
      <Input.TextArea
        aria-label="Comment text"
        placeholder="What should the designer look at?"
        value={body}
        onChange={(event) => setBody(event.target.value)}
        maxLength={4000}
        autoSize={{ minRows: 2 }}
      />
      <Button onClick={send} disabled={body.trim() === ''} loading={add.isPending}>
        Add comment
      </Button>
    </Space>
  );
}
