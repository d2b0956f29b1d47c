import { Form, Radio, Select, Space } from 'antd';
import { CsvNumberFormatSelect } from '@/components/csv/csv-number-format-select';
import type { MeterKind, MeterMapping } from '../hooks/use-meter-mapping';
import {
  ENERGY_UNITS,
  METER_TIME_UNITS,
  type MeterColumns,
  POWER_UNITS,
} from '../lib/meter-from-csv';

const options = (values: readonly string[]) => values.map((value) => ({ value, label: value }));

/** Which columns of the meter file hold the time and the power or energy, and their units. */
export function MeterColumnsFields({ mapping }: { mapping: MeterMapping }) {
  const { time, setTime, kind } = mapping;
  const columnOptions = options(mapping.parsed?.columns ?? []);
  return (
    <Space wrap align="start" style={{ marginTop: 12 }}>
      <CsvNumberFormatSelect value={mapping.fileFormat} onChange={mapping.setFileFormat} />
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
          onChange={(event) => mapping.chooseKind(event.target.value as MeterKind)}
        >
          <Radio value="power">power</Radio>
          <Radio value="cumulative">energy so far</Radio>
        </Radio.Group>
      </Form.Item>
      <Form.Item label={kind === 'power' ? 'Power column' : 'Energy column'}>
        <Select
          aria-label="Meter value column"
          style={{ width: 150 }}
          value={mapping.valueColumn}
          options={columnOptions}
          onChange={mapping.setValueColumn}
        />
      </Form.Item>
      <Form.Item label="Unit">
        <Select
          aria-label="Meter value unit"
          style={{ width: 90 }}
          value={mapping.valueUnit}
          options={options(kind === 'power' ? POWER_UNITS : ENERGY_UNITS)}
          onChange={mapping.setValueUnit}
        />
      </Form.Item>
    </Space>
  );
}
