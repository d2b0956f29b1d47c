import { Alert, Button, Form, Input, Modal, Space } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useId } from 'react';
import { FieldFormError } from '@/components/errors/field-form-error';
import {
  describeUnreadable,
  UnreadableFieldsContext,
} from '@/components/reading/unreadable-fields';
import { useCreateFillLog } from '../api/fill-logs-api';
import {
  fillLogDraftOf,
  type FillLogVersion,
  isComplete,
  useFillLogFields,
} from '../hooks/use-fill-log-fields';
import { useFillLogHeldBack } from '../hooks/use-fill-log-held-back';
import { FillLogAirFields } from './fill-log-air-fields';
import { fillLogLabel } from './fill-log-field-labels';
import { FillLogInstrumentFields } from './fill-log-instrument-fields';
import { FillLogWhereFields } from './fill-log-where-fields';
import { ReadingRowFields } from './reading-row-fields';

export type { FillLogVersion } from '../hooks/use-fill-log-fields';

/** Logs a real fill of one version: when, where, the air, and the lift read on the scale. */
export function FillLogForm({
  calculationId,
  versionNumber,
  version,
  unitSystem,
  open,
  onClose,
  onCreated,
}: {
  calculationId: string;
  versionNumber: number;
  /** The version's inputs: the fill's air starts from the air it was computed for. */
  version: FillLogVersion;
  unitSystem: UnitSystem;
  open: boolean;
  onClose: () => void;
  onCreated: (id: string) => void;
}) {
  const create = useCreateFillLog(calculationId);
  const idPrefix = useId();
  const fields = useFillLogFields(version);
  const { heldBack, unreadableRegistry } = useFillLogHeldBack(fields, unitSystem);
  const pending = version.status === 'pending';
  const ready = isComplete(fields) && heldBack.length === 0 && !pending;

  const submit = () => {
    const draft = ready ? fillLogDraftOf(fields) : undefined;
    if (!draft) return;
    create.mutate(
      { versionNumber, draft },
      {
        onSuccess: (log) => {
          onCreated(log.id);
          onClose();
        },
      },
    );
  };

  return (
    <Modal
      open={open}
      title={`Log a fill of version ${versionNumber}`}
      onCancel={onClose}
      width={720}
      okText="Save fill log"
      okButtonProps={{ disabled: !ready, loading: create.isPending }}
      onOk={submit}
      loading={pending}
      destroyOnHidden
    >
      <UnreadableFieldsContext.Provider value={unreadableRegistry}>
        <Form layout="vertical" component="div" requiredMark={false}>
          <FillLogWhereFields fields={fields} idPrefix={idPrefix} />
          <FillLogAirFields
            fields={fields}
            version={version}
            versionNumber={versionNumber}
            unitSystem={unitSystem}
            idPrefix={idPrefix}
          />
          <FillLogInstrumentFields fields={fields} unitSystem={unitSystem} idPrefix={idPrefix} />
          {fields.rows.map((row, index) => (
            <ReadingRowFields
              key={index}
              index={index}
              row={row}
              onChange={(change) => fields.setRow(index, change)}
              unitSystem={unitSystem}
            />
          ))}
          <Space>
            <Button onClick={fields.addRow}>Add a reading</Button>
            {fields.rows.length > 1 ? (
              <Button onClick={fields.removeLastRow}>Remove the last reading</Button>
            ) : null}
          </Space>
          <Form.Item label="Note" htmlFor={`${idPrefix}-note`} style={{ marginTop: 16 }}>
            <Input.TextArea
              id={`${idPrefix}-note`}
              value={fields.note}
              onChange={(event) => fields.setNote(event.target.value)}
              maxLength={2000}
              rows={2}
            />
          </Form.Item>
          {heldBack.length > 0 ? (
            <Alert
              type="error"
              showIcon
              title={`Not saved until these are put right: ${describeUnreadable(heldBack)}`}
            />
          ) : null}
          <FieldFormError error={create.error} unitSystem={unitSystem} labels={fillLogLabel} />
        </Form>
      </UnreadableFieldsContext.Provider>
    </Modal>
  );
}
