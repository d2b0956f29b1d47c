import { Alert, Button, Form, Modal, Radio } from 'antd';
import { formatRange, type UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { FormError } from '@/components/errors/form-error';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import {
  describeUnreadable,
  type UnreadableField,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import { CsvFileInput } from '@/components/csv/csv-file-input';
import { CsvPreviewTable } from '@/components/csv/csv-preview-table';
import { type FillLog, useAddReadings } from '../api/fill-logs-api';
import { useReadingsMapping } from '../hooks/use-readings-mapping';
import { FILL_LOG_RANGES, outsideRange } from '../lib/fill-log-ranges';
import { ReadingsColumnsFields } from './readings-columns-fields';
import { ReadingsImportCheck } from './readings-import-check';

/**
 * A series of lift readings from a logger's CSV file: preview, column mapping and units, the bad
 * rows listed by line, and only then, on confirmation, one all-or-nothing import.
 */
export function ReadingsImport({
  log,
  unitSystem,
  open,
  onClose,
}: {
  log: FillLog;
  unitSystem: UnitSystem;
  open: boolean;
  onClose: () => void;
}) {
  const addReadings = useAddReadings(log.calculationId);
  const { numberFormat } = useReadingPreferences();
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const mapping = useReadingsMapping(log);
  const { parsed, mapped } = mapping;
  const [mode, setMode] = useState<'append' | 'replace'>('append');
  const count = mapped?.readings.length ?? 0;
  const badCount = mapped?.bad.length ?? 0;
  // The ballast mass is checked against the server's range as it is typed; importing waits.
  const { ballastMassKg: range } = FILL_LOG_RANGES;
  const ballastShown = parsed !== undefined && mapping.liftKind === 'ballast';
  const heldBack: UnreadableField[] = [
    ...unreadable,
    ...(ballastShown && outsideRange(mapping.ballastMassKg, range)
      ? [
          {
            label: 'Ballast mass',
            reason: `must be ${formatRange(range.min, range.max, 'mass', { unitSystem, numberFormat })}`,
          },
        ]
      : []),
  ];

  return (
    <Modal
      open={open}
      title="Import lift readings from a CSV file"
      width={820}
      onCancel={onClose}
      destroyOnHidden
      footer={[
        <Button key="cancel" onClick={onClose}>
          Cancel
        </Button>,
        <Button
          key="import"
          type="primary"
          disabled={count === 0 || heldBack.length > 0}
          loading={addReadings.isPending}
          onClick={() =>
            mapped &&
            heldBack.length === 0 &&
            addReadings.mutate(
              { id: log.id, mode, readings: mapped.readings },
              { onSuccess: onClose },
            )
          }
        >
          {badCount > 0
            ? `Import ${count} readings, leave out ${badCount} bad ${badCount === 1 ? 'row' : 'rows'}`
            : `Import ${count} readings`}
        </Button>,
      ]}
    >
      <UnreadableFieldsContext.Provider value={unreadableRegistry}>
        <Form layout="vertical" component="div">
          <Form.Item label="CSV file with a header row">
            <CsvFileInput label="CSV file" onParsed={mapping.choose} />
          </Form.Item>
          {parsed ? (
            <>
              <CsvPreviewTable parsed={parsed} label="First rows of the file" />
              <ReadingsColumnsFields mapping={mapping} unitSystem={unitSystem} />
              <Form.Item label="The readings already logged">
                <Radio.Group
                  value={mode}
                  onChange={(event) => setMode(event.target.value as 'append' | 'replace')}
                >
                  <Radio value="append">keep them, add these</Radio>
                  <Radio value="replace">replace them with these</Radio>
                </Radio.Group>
              </Form.Item>
              {mapped ? <ReadingsImportCheck count={count} bad={mapped.bad} /> : null}
            </>
          ) : null}
          {heldBack.length > 0 ? (
            <Alert
              type="error"
              showIcon
              title={`Not imported until these are put right: ${describeUnreadable(heldBack)}`}
            />
          ) : null}
          <FormError error={addReadings.error} />
        </Form>
      </UnreadableFieldsContext.Provider>
    </Modal>
  );
}
