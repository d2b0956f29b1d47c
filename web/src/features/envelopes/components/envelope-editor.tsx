import { Alert, Button, Modal } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { ApiError } from '@/lib/api-client';
import { type Envelope, type EnvelopeDetail, useSaveEnvelope } from '../api/envelopes-api';
import { EnvelopeForm } from './envelope-form';

/** The envelope another person saved first, when a save lost the race (409). */
const conflictOf = (error: Error | null): EnvelopeDetail | undefined =>
  error instanceof ApiError && error.status === 409
    ? (error.body.latest as EnvelopeDetail | undefined)
    : undefined;

/**
 * Adds or changes an envelope in a dialog. A change names the version it started from; when
 * someone saved meanwhile, the dialog says so and offers to start again from their figures,
 * keeping what was typed until the person chooses.
 */
export function EnvelopeEditor({
  envelope,
  unitSystem,
  open,
  onClose,
}: {
  envelope?: Envelope;
  unitSystem: UnitSystem;
  open: boolean;
  onClose: () => void;
}) {
  const save = useSaveEnvelope(envelope?.id);
  const [base, setBase] = useState<Envelope | undefined>(envelope);
  const conflict = conflictOf(save.error);
  return (
    <Modal
      open={open}
      title={envelope ? `Change ${envelope.name}` : 'Add an envelope'}
      onCancel={onClose}
      footer={null}
      width={640}
      destroyOnHidden
    >
      {conflict ? (
        <Alert
          type="warning"
          showIcon
          style={{ marginBottom: 12 }}
          title={save.error?.message}
          action={
            <Button
              size="small"
              onClick={() => {
                setBase(conflict);
                save.reset();
              }}
            >
              Start again from their version
            </Button>
          }
        />
      ) : null}
      <EnvelopeForm
        key={base?.version ?? 'new'}
        envelope={base}
        unitSystem={unitSystem}
        saving={save.isPending}
        error={conflict ? null : save.error}
        onCancel={onClose}
        onSubmit={(body) =>
          save.mutate(base ? { ...body, version: base.version } : body, { onSuccess: onClose })
        }
      />
    </Modal>
  );
}
