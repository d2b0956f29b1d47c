import { Alert, Button, Form, Modal, Radio, Select, Space, Typography } from 'antd';
import type { NumberFormat, UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { useMemo, useState } from 'react';
import { BadRowsList } from '@/components/csv/bad-rows-list';
import { CsvFileInput } from '@/components/csv/csv-file-input';
import { CsvNumberFormatSelect } from '@/components/csv/csv-number-format-select';
import { CsvPreviewTable } from '@/components/csv/csv-preview-table';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { ParsedCsv } from '@/lib/parse-csv';
import {
  ENERGY_UNITS,
  METER_TIME_UNITS,
  type MeterColumns,
  meterFromCsv,
  POWER_UNITS,
} from '../lib/meter-from-csv';

const options = (values: readonly string[]) => values.map((value) => ({ value, label: value }));

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
  const [parsed, setParsed] = useState<ParsedCsv>();
  const [time, setTime] = useState<MeterColumns['time']>({ column: '', unit: 's' });
  const [kind, setKind] = useState<'power' | 'cumulative'>('power');
  const [valueColumn, setValueColumn] = useState('');
  const [valueUnit, setValueUnit] = useState<string>('W');
  const preferences = useReadingPreferences();
  const display = useNumberDisplay(unitSystem);
  const [fileFormat, setFileFormat] = useState<NumberFormat>(preferences.numberFormat);

  const mapped = useMemo(() => {
    if (!parsed || !time.column || !valueColumn) return undefined;
    const value =
      kind === 'power'
        ? { kind, column: valueColumn, unit: valueUnit as (typeof POWER_UNITS)[number] }
        : { kind, column: valueColumn, unit: valueUnit as (typeof ENERGY_UNITS)[number] };
    return meterFromCsv(parsed, { time, value }, fileFormat);
  }, [parsed, time, kind, valueColumn, valueUnit, fileFormat]);
  const columnOptions = options(parsed?.columns ?? []);
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
          <CsvFileInput
            label="Meter CSV file"
            onParsed={(next) => {
              setParsed(next);
              setTime({ column: next.columns[0] ?? '', unit: 's' });
              setValueColumn(next.columns[1] ?? '');
            }}
          />
        </Form.Item>
        {parsed ? (
          <>
            <CsvPreviewTable parsed={parsed} label="First rows of the meter file" />
            <Space wrap align="start" style={{ marginTop: 12 }}>
              <CsvNumberFormatSelect value={fileFormat} onChange={setFileFormat} />
              <Form.Item label="Time column">
                <Select
                  aria-label="Meter time column"
                  style={{ width: 150 }}
                  value={time.column}
                  options={columnOptions}
                  onChange={(column: string) => setTime({ ...time, column })}
                />
              </Form.Item>
              <Form.Item label="Time unit">
                <Select
                  aria-label="Meter time unit"
                  style={{ width: 90 }}
                  value={time.unit}
                  options={options(METER_TIME_UNITS)}
                  onChange={(unit: MeterColumns['time']['unit']) => setTime({ ...time, unit })}
                />
              </Form.Item>
              <Form.Item label="The meter logs">
                <Radio.Group
                  value={kind}
                  onChange={(event) => {
                    const next = event.target.value as 'power' | 'cumulative';
                    setKind(next);
                    setValueUnit(next === 'power' ? 'W' : 'Wh');
                  }}
                >
                  <Radio value="power">power</Radio>
                  <Radio value="cumulative">energy so far</Radio>
                </Radio.Group>
              </Form.Item>
              <Form.Item label={kind === 'power' ? 'Power column' : 'Energy column'}>
                <Select
                  aria-label="Meter value column"
                  style={{ width: 150 }}
                  value={valueColumn}
                  options={columnOptions}
                  onChange={setValueColumn}
                />
              </Form.Item>
              <Form.Item label="Unit">
                <Select
                  aria-label="Meter value unit"
                  style={{ width: 90 }}
                  value={valueUnit}
                  options={options(kind === 'power' ? POWER_UNITS : ENERGY_UNITS)}
                  onChange={setValueUnit}
                />
              </Form.Item>
            </Space>
            {mapped ? (
              <div role="status" aria-label="Meter check">
                {energy ? (
                  <Alert
                    type={mapped.bad.length > 0 ? 'warning' : 'success'}
                    showIcon
                    title={`Energy used: ${display.quantity(energy.energyJ, 'energy').text} over ${display.quantity(energy.durationS, 'time').text}, mean power ${display.quantity(energy.meanPowerW, 'power').text} (${display.number(energy.samples)} samples).`}
                  />
                ) : null}
                {mapped.bad.length > 0 ? (
                  <>
                    <Typography.Paragraph type="danger" style={{ marginTop: 8 }}>
                      Fix these rows in the file first: a meter log with gaps would give the wrong
                      energy.
                    </Typography.Paragraph>
                    <BadRowsList rows={mapped.bad} label="Meter rows that cannot be read" />
                  </>
                ) : null}
              </div>
            ) : null}
          </>
        ) : null}
      </Form>
    </Modal>
  );
}
