import { Button, Form, Modal } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { CsvFileInput } from '@/components/csv/csv-file-input';
import { CsvPreviewTable } from '@/components/csv/csv-preview-table';
import { useMeterMapping } from '../hooks/use-meter-mapping';
import { MeterCheck } from './meter-check';
import { MeterColumnsFields } from './meter-columns-fields';

/**
 * An energy meter's CSV export (power over time, or a cumulative register) turned into the
 * energy used; the user then puts it into the gas-supply inputs, and it is stored with the next
 * saved version.
 */
export function MeterImport({
  open,
  unitSystem,
  onClose,
  onUse,
}: {
  open: boolean;
  unitSystem: UnitSystem;
  onClose: () => void;
  onUse: (energyJ: number) => void;
}) {
  const mapping = useMeterMapping();
  const { parsed, mapped } = mapping;
  const energy = mapped?.energy;

  return (
    <Modal
      open={open}
      title="Energy used, from an energy-meter CSV"
      width={760}
      onCancel={onClose}
      destroyOnHidden
      footer={[
        <Button key="cancel" onClick={onClose}>
          Cancel
        </Button>,
        <Button
          key="use"
          type="primary"
          disabled={!energy || (mapped?.bad.length ?? 0) > 0}
          onClick={() => energy && onUse(energy.energyJ)}
        >
          Use this energy
        </Button>,
      ]}
    >
      <Form layout="vertical" component="div">
        <Form.Item label="CSV file with a header row">
          <CsvFileInput label="Meter CSV file" onParsed={mapping.choose} />
        </Form.Item>
        {parsed ? (
          <>
            <CsvPreviewTable parsed={parsed} label="First rows of the meter file" />
            <MeterColumnsFields mapping={mapping} />
            {mapped ? <MeterCheck mapped={mapped} unitSystem={unitSystem} /> : null}
          </>
        ) : null}
      </Form>
    </Modal>
  );
}
