import { Form, Input, Space } from 'antd';
import { useId } from 'react';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';

/** The plan's name and the date of its event. */
export function PlanTitleFields({ editor }: { editor: PlanDraftEditor }) {
  const id = useId();
  const { draft, set } = editor;
  return (
    <Space wrap>
      <Form.Item label="Plan" htmlFor={`${id}-title`}>
        <Input
          id={`${id}-title`}
          value={draft.title}
          maxLength={200}
          style={{ width: 280 }}
          onChange={(event) => set({ title: event.target.value })}
        />
      </Form.Item>
      <Form.Item label="Event date" htmlFor={`${id}-date`}>
        <Input
          id={`${id}-date`}
          type="date"
          value={draft.eventDate ?? ''}
          onChange={(event) => set({ eventDate: event.target.value || undefined })}
        />
      </Form.Item>
    </Space>
  );
}
