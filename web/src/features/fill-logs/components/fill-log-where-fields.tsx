import { Form, Input, Select, Space } from 'antd';
import { GAS_SOURCES } from '../api/fill-logs-api';
import { FillLogEnvelopeSelect } from './fill-log-envelope-select';
import type { FillLogFields } from '../hooks/use-fill-log-fields';

/** When and where the fill was, which envelope, and where its gas came from. */
export function FillLogWhereFields({
  fields,
  idPrefix,
}: {
  fields: FillLogFields;
  idPrefix: string;
}) {
  return (
    <Space wrap style={{ width: '100%' }}>
      <Form.Item label="Filled at" htmlFor={`${idPrefix}-at`}>
        <Input
          id={`${idPrefix}-at`}
          type="datetime-local"
          value={fields.filledAt}
          onChange={(event) => fields.setFilledAt(event.target.value)}
        />
      </Form.Item>
      <Form.Item label="Place" htmlFor={`${idPrefix}-place`}>
        <Input
          id={`${idPrefix}-place`}
          value={fields.place}
          onChange={(event) => fields.setPlace(event.target.value)}
          maxLength={200}
        />
      </Form.Item>
      <Form.Item label="Envelope" htmlFor={`${idPrefix}-envelope`}>
        <Input
          id={`${idPrefix}-envelope`}
          placeholder="Which one: serial, colour"
          value={fields.envelopeLabel}
          onChange={(event) => fields.setEnvelopeLabel(event.target.value)}
          maxLength={200}
        />
      </Form.Item>
      <FillLogEnvelopeSelect fields={fields} />
      <Form.Item label="Gas source">
        <Select
          aria-label="Gas source"
          style={{ width: 220 }}
          value={fields.gasSource}
          options={GAS_SOURCES.map((source) => ({ ...source }))}
          onChange={fields.setGasSource}
        />
      </Form.Item>
    </Space>
  );
}
