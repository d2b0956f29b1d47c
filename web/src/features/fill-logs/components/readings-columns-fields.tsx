import { Form, Radio, Space } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { CsvNumberFormatSelect } from '@/components/csv/csv-number-format-select';
import { QuantityInput } from '@/components/quantity/quantity-input';
import type { LiftKind, ReadingsMapping } from '../hooks/use-readings-mapping';
import { FILL_LOG_RANGES } from '../lib/fill-log-ranges';
import {
  MASS_UNITS,
  PRESSURE_UNITS,
  TEMPERATURE_UNITS,
  TIME_UNITS,
} from '../lib/readings-from-csv';
import { LabelledSelect } from './labelled-select';

const UNIT_LABELS: Record<string, string> = { degC: '°C', degF: '°F', day: 'days' };
const unitOptions = <T extends string>(units: readonly T[]) =>
  units.map((unit) => ({ value: unit, label: UNIT_LABELS[unit] ?? unit }));

/**
 * An optional column of the file and, once one is chosen, its unit. Called rather than rendered
 * as a component, so each field stays an item of the enclosing Space of its own.
 */
function optionalColumnFields<U extends string>({
  what,
  unitName,
  column,
  firstUnit,
  units,
  columnOptions,
  onChange,
}: {
  what: string;
  unitName: string;
  column: { column: string; unit: U } | undefined;
  firstUnit: U;
  units: readonly U[];
  columnOptions: { value: string; label: string }[];
  onChange: (column: { column: string; unit: U } | undefined) => void;
}) {
  return (
    <>
      <LabelledSelect
        label={`${what} column (optional)`}
        name={`${what} column`}
        allowClear
        width={160}
        value={column?.column}
        options={columnOptions}
        onChange={(name?: string) =>
          onChange(name ? { column: name, unit: column?.unit ?? firstUnit } : undefined)
        }
      />
      {column ? (
        <LabelledSelect
          label={unitName}
          name={unitName}
          width={90}
          value={column.unit}
          options={unitOptions(units)}
          onChange={(unit) => onChange({ ...column, unit })}
        />
      ) : null}
    </>
  );
}

/**
 * Which column of the readings file holds what, in which unit: time, lift (and the ballast it
 * was read under), and optionally the air's temperature and pressure.
 */
export function ReadingsColumnsFields({
  mapping,
  unitSystem,
}: {
  mapping: ReadingsMapping;
  unitSystem: UnitSystem;
}) {
  const { time, setTime, liftKind, temperature, setTemperature, pressure, setPressure } = mapping;
  const columnOptions = (mapping.parsed?.columns ?? []).map((column) => ({
    value: column,
    label: column,
  }));
  return (
    <Space wrap align="start" style={{ marginTop: 12 }}>
      <CsvNumberFormatSelect value={mapping.fileFormat} onChange={mapping.setFileFormat} />
      <LabelledSelect
        label="Time column"
        name="Time column"
        width={160}
        value={time.column}
        options={columnOptions}
        onChange={(column) => setTime({ ...time, column })}
      />
      <LabelledSelect
        label="Time unit"
        name="Time unit"
        width={100}
        value={time.unit}
        options={unitOptions(TIME_UNITS)}
        onChange={(unit) => setTime({ ...time, unit })}
      />
      <Form.Item label="The file holds">
        <Radio.Group
          value={liftKind}
          onChange={(event) => mapping.setLiftKind(event.target.value as LiftKind)}
        >
          <Radio value="ballast">scale readings under a ballast</Radio>
          <Radio value="direct">net lift</Radio>
        </Radio.Group>
      </Form.Item>
      <LabelledSelect
        label={liftKind === 'ballast' ? 'Scale reading column' : 'Net lift column'}
        name="Lift column"
        width={160}
        value={mapping.liftColumn}
        options={columnOptions}
        onChange={mapping.setLiftColumn}
      />
      <LabelledSelect
        label="Mass unit"
        name="Mass unit"
        width={90}
        value={mapping.massUnit}
        options={unitOptions(MASS_UNITS)}
        onChange={mapping.setMassUnit}
      />
      {liftKind === 'ballast' ? (
        <Form.Item label="Ballast mass (the same for every row)">
          <QuantityInput
            label="Ballast mass"
            dimension="mass"
            value={mapping.ballastMassKg}
            onChange={mapping.setBallastMassKg}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.ballastMassKg}
          />
        </Form.Item>
      ) : null}
      {optionalColumnFields({
        what: 'Air temperature',
        unitName: 'Temperature unit',
        column: temperature,
        firstUnit: 'degC',
        units: TEMPERATURE_UNITS,
        columnOptions,
        onChange: setTemperature,
      })}
      {optionalColumnFields({
        what: 'Pressure',
        unitName: 'Pressure unit',
        column: pressure,
        firstUnit: 'hPa',
        units: PRESSURE_UNITS,
        columnOptions,
        onChange: setPressure,
      })}
    </Space>
  );
}
