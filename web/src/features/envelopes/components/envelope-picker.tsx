import { Alert, Button, Card, Select, Space, Typography } from 'antd';
import {
  applyLibraryEnvelope,
  inputFieldInfo,
  KINDS,
  libraryEnvelopeMapping,
} from '@loftwright/buoyancy';
import { useState } from 'react';
import { type Envelope, useEnvelopes } from '../api/envelopes-api';

/** The form labels of the inputs a kind takes from a library envelope, for the note after. */
function filledLabels(kindId: string): string[] {
  const schema = KINDS.find((kind) => kind.id === kindId)?.inputSchema;
  return (libraryEnvelopeMapping(kindId)?.fields ?? []).map(
    (path) => inputFieldInfo(schema, path)?.label ?? path,
  );
}

/**
 * "Choose from the envelope library": puts a library envelope's figures into the calculation's
 * inputs, where the person sees them and may change them before saving. Which inputs it fills
 * is the engine's to say (`applyLibraryEnvelope`); envelopes the kind cannot describe are left out.
 */
export function EnvelopePickerPanel({
  kindId,
  envelopes,
  value,
  onChange,
}: {
  kindId: string;
  envelopes: readonly Envelope[];
  value: unknown;
  onChange: (value: unknown) => void;
}) {
  const [open, setOpen] = useState(false);
  const [chosenId, setChosenId] = useState<string | undefined>();
  const [outcome, setOutcome] = useState<{ type: 'success' | 'error'; text: string }>();
  const accepts = libraryEnvelopeMapping(kindId)?.accepts ?? [];
  const offered = envelopes.filter((envelope) => accepts.includes(envelope.kind));
  if (!open) {
    return (
      <Button style={{ marginBottom: 12 }} onClick={() => setOpen(true)}>
        Choose from the envelope library
      </Button>
    );
  }
  const apply = () => {
    const envelope = offered.find((candidate) => candidate.id === chosenId);
    if (!envelope) return;
    try {
      onChange(applyLibraryEnvelope(kindId, value, envelope));
      setOutcome({
        type: 'success',
        text: `Figures of ${envelope.name} put into: ${filledLabels(kindId).join(', ')}. Check them below before saving.`,
      });
    } catch (error) {
      setOutcome({ type: 'error', text: (error as Error).message });
    }
  };
  return (
    <Card size="small" title="Envelope library" style={{ marginBottom: 12 }}>
      <Space orientation="vertical" style={{ width: '100%' }}>
        {offered.length === 0 ? (
          <Typography.Text type="secondary">
            The library holds no {accepts.join(' or ')} envelope.
          </Typography.Text>
        ) : (
          <Space wrap>
            <Select
              aria-label="Library envelope"
              placeholder="Choose an envelope"
              style={{ width: 260 }}
              value={chosenId}
              onChange={setChosenId}
              options={offered.map((envelope) => ({ value: envelope.id, label: envelope.name }))}
            />
            <Button type="primary" disabled={!chosenId} onClick={apply}>
              Use its figures
            </Button>
          </Space>
        )}
        {outcome ? <Alert type={outcome.type} showIcon title={outcome.text} /> : null}
      </Space>
    </Card>
  );
}

/** The picker with the library read from the server, for the route to compose into the editor. */
export function EnvelopePicker(props: {
  kindId: string;
  value: unknown;
  onChange: (value: unknown) => void;
}) {
  const envelopes = useEnvelopes();
  if (envelopes.error) return null;
  return <EnvelopePickerPanel {...props} envelopes={envelopes.data ?? []} />;
}
