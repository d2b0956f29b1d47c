import { Form, Select } from 'antd';
import { useEnvelopeChoices } from '../api/fill-logs-api';
import type { FillLogFields } from '../hooks/use-fill-log-fields';

/**
 * Which envelope of the team's library was filled, so the fill joins that envelope's history.
 * Everyone who logs fills is on the team and reads the library; should the library be refused
 * all the same, the field is left out rather than shown broken.
 */
export function FillLogEnvelopeSelect({ fields }: { fields: FillLogFields }) {
  const choices = useEnvelopeChoices();
  if (choices.isError) return null;
  return (
    <Form.Item label="Library envelope">
      <Select
        aria-label="Library envelope"
        allowClear
        placeholder="None"
        style={{ width: 240 }}
        loading={choices.isPending}
        value={fields.envelopeId}
        options={(choices.data ?? []).map((envelope) => ({
          value: envelope.id,
          label: envelope.name,
        }))}
        onChange={(value: string | undefined) => fields.setEnvelopeId(value ?? undefined)}
      />
    </Form.Item>
  );
}
