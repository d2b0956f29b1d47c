import { Card, Form, Input } from 'antd';
import type { ExampleStep } from '../api/classroom-api';

/** A note for each step of the derivation, shown beside it in the walk-through. */
export function StepNotesCard({
  steps,
  notes,
  onNoteChange,
}: {
  steps: readonly ExampleStep[];
  notes: Record<string, string>;
  onNoteChange: (stepId: string, note: string) => void;
}) {
  return (
    <Card size="small" title="Notes on the steps" style={{ marginBottom: 16 }}>
      {steps.map((step, index) => (
        <Form.Item key={step.id} label={`${index + 1}. ${step.label}`} htmlFor={`note-${step.id}`}>
          <Input.TextArea
            id={`note-${step.id}`}
            rows={1}
            autoSize={{ minRows: 1, maxRows: 4 }}
            value={notes[step.id] ?? ''}
            maxLength={2000}
            onChange={(event) => onNoteChange(step.id, event.target.value)}
          />
        </Form.Item>
      ))}
    </Card>
  );
}
