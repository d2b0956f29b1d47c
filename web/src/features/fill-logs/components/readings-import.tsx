import { Alert, Button, Form, Modal, Radio, Select, Space } from 'antd';
import { formatRange, type NumberFormat, type UnitSystem } from '@loftwright/buoyancy';
import { useMemo, useState } from 'react';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { FormError } from '@/components/errors/form-error';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import {
  describeUnreadable,
  type UnreadableField,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import { BadRowsList } from '@/components/csv/bad-rows-list';
import { CsvFileInput } from '@/components/csv/csv-file-input';
import { CsvNumberFormatSelect } from '@/components/csv/csv-number-format-select';
import { CsvPreviewTable } from '@/components/csv/csv-preview-table';
import type { ParsedCsv } from '@/lib/parse-csv';
import { type FillLog, useAddReadings } from '../api/fill-logs-api';
import { FILL_LOG_RANGES, outsideRange } from '../lib/fill-log-ranges';
import {
  MASS_UNITS,
  PRESSURE_UNITS,
  type ReadingColumns,
  readingsFromCsv,
  TEMPERATURE_UNITS,
  TIME_UNITS,
} from '../lib/readings-from-csv';

const UNIT_LABELS: Record<string, string> = { degC: '°C', degF: '°F', day: 'days' };
const unitOptions = (units: readonly string[]) =>
  units.map((unit) => ({ value: unit, label: UNIT_LABELS[unit] ?? unit }));

/** The column whose header looks like it, for a first guess the user can change. */
const guess = (columns: string[], pattern: RegExp) =>
  columns.find((column) => pattern.test(column));

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
  const [fileFormat, setFileFormat] = useState<NumberFormat>(numberFormat);
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const [parsed, setParsed] = useState<ParsedCsv>();
  const [time, setTime] = useState<ReadingColumns['time']>({ column: '', unit: 's' });
  const [liftKind, setLiftKind] = useState<'ballast' | 'direct'>('ballast');
  const [liftColumn, setLiftColumn] = useState('');
  const [massUnit, setMassUnit] = useState<(typeof MASS_UNITS)[number]>('kg');
  const first = log.readings[0];
  const [ballastMassKg, setBallastMassKg] = useState<number | undefined>(
    first?.kind === 'ballast' ? first.ballastMassKg : undefined,
  );
  const [temperature, setTemperature] = useState<ReadingColumns['temperature']>();
  const [pressure, setPressure] = useState<ReadingColumns['pressure']>();
  const [mode, setMode] = useState<'append' | 'replace'>('append');

  const chose = (next: ParsedCsv) => {
    setParsed(next);
    setTime({
      column: guess(next.columns, /time|^t\b|^t_|min|hour|sec/i) ?? next.columns[0] ?? '',
      unit: 's',
    });
    setLiftColumn(guess(next.columns, /scale|lift|kg|mass|weight/i) ?? next.columns[1] ?? '');
    const air = guess(next.columns, /temp|air/i);
    setTemperature(air ? { column: air, unit: 'degC' } : undefined);
    const baro = guess(next.columns, /press|baro|hpa/i);
    setPressure(baro ? { column: baro, unit: 'hPa' } : undefined);
  };

  const mapped = useMemo(() => {
    if (!parsed || !time.column || !liftColumn) return undefined;
    if (liftKind === 'ballast' && ballastMassKg === undefined) return undefined;
    const columns: ReadingColumns = {
      time,
      lift:
        liftKind === 'ballast'
          ? {
              kind: 'ballast',
              column: liftColumn,
              unit: massUnit,
              ballastMassKg: ballastMassKg ?? 0,
            }
          : { kind: 'direct', column: liftColumn, unit: massUnit },
      ...(temperature ? { temperature } : {}),
      ...(pressure ? { pressure } : {}),
    };
    return readingsFromCsv(parsed, columns, log.ambient, fileFormat);
  }, [
    parsed,
    time,
    liftKind,
    liftColumn,
    massUnit,
    ballastMassKg,
    temperature,
    pressure,
    log.ambient,
    fileFormat,
  ]);

  const columnOptions = (parsed?.columns ?? []).map((column) => ({ value: column, label: column }));
  const count = mapped?.readings.length ?? 0;
  const badCount = mapped?.bad.length ?? 0;
  // The ballast mass is checked against the server's range as it is typed; importing waits.
  const ballastShown = parsed !== undefined && liftKind === 'ballast';
  const heldBack: UnreadableField[] = [
    ...unreadable,
    ...(ballastShown && outsideRange(ballastMassKg, FILL_LOG_RANGES.ballastMassKg)
      ? [
          {
            label: 'Ballast mass',
            reason: `must be ${formatRange(FILL_LOG_RANGES.ballastMassKg.min, FILL_LOG_RANGES.ballastMassKg.max, 'mass', { unitSystem, numberFormat })}`,
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
            <CsvFileInput label="CSV file" onParsed={chose} />
          </Form.Item>
          {parsed ? (
            <>
              <CsvPreviewTable parsed={parsed} label="First rows of the file" />
              <Space wrap align="start" style={{ marginTop: 12 }}>
                <CsvNumberFormatSelect value={fileFormat} onChange={setFileFormat} />
                <Form.Item label="Time column">
                  <Select
                    aria-label="Time column"
                    style={{ width: 160 }}
                    value={time.column}
                    options={columnOptions}
                    onChange={(column: string) => setTime({ ...time, column })}
                  />
                </Form.Item>
                <Form.Item label="Time unit">
                  <Select
                    aria-label="Time unit"
                    style={{ width: 100 }}
                    value={time.unit}
                    options={unitOptions(TIME_UNITS)}
                    onChange={(unit: ReadingColumns['time']['unit']) => setTime({ ...time, unit })}
                  />
                </Form.Item>
                <Form.Item label="The file holds">
                  <Radio.Group
                    value={liftKind}
                    onChange={(event) => setLiftKind(event.target.value as 'ballast' | 'direct')}
                  >
                    <Radio value="ballast">scale readings under a ballast</Radio>
                    <Radio value="direct">net lift</Radio>
                  </Radio.Group>
                </Form.Item>
                <Form.Item
                  label={liftKind === 'ballast' ? 'Scale reading column' : 'Net lift column'}
                >
                  <Select
                    aria-label="Lift column"
                    style={{ width: 160 }}
                    value={liftColumn}
                    options={columnOptions}
                    onChange={setLiftColumn}
                  />
                </Form.Item>
                <Form.Item label="Mass unit">
                  <Select
                    aria-label="Mass unit"
                    style={{ width: 90 }}
                    value={massUnit}
                    options={unitOptions(MASS_UNITS)}
                    onChange={setMassUnit}
                  />
                </Form.Item>
                {liftKind === 'ballast' ? (
                  <Form.Item label="Ballast mass (the same for every row)">
                    <QuantityInput
                      label="Ballast mass"
                      dimension="mass"
                      value={ballastMassKg}
                      onChange={setBallastMassKg}
                      unitSystem={unitSystem}
                      range={FILL_LOG_RANGES.ballastMassKg}
                    />
                  </Form.Item>
                ) : null}
                <Form.Item label="Air temperature column (optional)">
                  <Select
                    aria-label="Air temperature column"
                    allowClear
                    style={{ width: 160 }}
                    value={temperature?.column}
                    options={columnOptions}
                    onChange={(column?: string) =>
                      setTemperature(
                        column ? { column, unit: temperature?.unit ?? 'degC' } : undefined,
                      )
                    }
                  />
                </Form.Item>
                {temperature ? (
                  <Form.Item label="Temperature unit">
                    <Select
                      aria-label="Temperature unit"
                      style={{ width: 90 }}
                      value={temperature.unit}
                      options={unitOptions(TEMPERATURE_UNITS)}
                      onChange={(unit: NonNullable<ReadingColumns['temperature']>['unit']) =>
                        setTemperature({ ...temperature, unit })
                      }
                    />
                  </Form.Item>
                ) : null}
                <Form.Item label="Pressure column (optional)">
                  <Select
                    aria-label="Pressure column"
                    allowClear
                    style={{ width: 160 }}
                    value={pressure?.column}
                    options={columnOptions}
                    onChange={(column?: string) =>
                      setPressure(column ? { column, unit: pressure?.unit ?? 'hPa' } : undefined)
                    }
                  />
                </Form.Item>
                {pressure ? (
                  <Form.Item label="Pressure unit">
                    <Select
                      aria-label="Pressure unit"
                      style={{ width: 90 }}
                      value={pressure.unit}
                      options={unitOptions(PRESSURE_UNITS)}
                      onChange={(unit: NonNullable<ReadingColumns['pressure']>['unit']) =>
                        setPressure({ ...pressure, unit })
                      }
                    />
                  </Form.Item>
                ) : null}
              </Space>
              <Form.Item label="The readings already logged">
                <Radio.Group
                  value={mode}
                  onChange={(event) => setMode(event.target.value as 'append' | 'replace')}
                >
                  <Radio value="append">keep them, add these</Radio>
                  <Radio value="replace">replace them with these</Radio>
                </Radio.Group>
              </Form.Item>
              {mapped ? (
                <div role="status" aria-label="Import check">
                  <Alert
                    type={badCount > 0 ? 'warning' : 'success'}
                    showIcon
                    title={`${count} readings ready${badCount > 0 ? `, ${badCount} ${badCount === 1 ? 'row' : 'rows'} cannot be read` : ''}. Nothing is stored until you import.`}
                  />
                  {badCount > 0 ? (
                    <BadRowsList rows={mapped.bad} label="Rows that cannot be read" />
                  ) : null}
                </div>
              ) : null}
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
