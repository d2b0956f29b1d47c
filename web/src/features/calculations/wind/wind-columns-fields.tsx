import { Checkbox, Form, InputNumber, Select, Space } from 'antd';
import {
  WIND_HEIGHT_UNITS,
  WIND_PRESSURE_UNITS,
  WIND_SPEED_UNITS,
  WIND_TEMPERATURE_UNITS,
} from '@loftwright/buoyancy';
import { CsvNumberFormatSelect } from '@/components/csv/csv-number-format-select';
import type { WindImport } from './use-wind-import';
import type { WindImportSettings, WindSeparator } from './wind-import-settings';

const options = (values: readonly string[]) => values.map((value) => ({ value, label: value }));

const SEPARATORS: { value: WindSeparator; label: string }[] = [
  { value: 'auto', label: 'as the first line shows' },
  { value: ',', label: 'comma' },
  { value: ';', label: 'semicolon' },
  { value: '\t', label: 'tab' },
  { value: 'whitespace', label: 'spaces' },
];

type ColumnKey =
  | 'heightColumn'
  | 'pressureColumn'
  | 'directionColumn'
  | 'speedColumn'
  | 'temperatureColumn'
  | 'dewPointColumn';

/** A column chooser: positions named by the header line when there is one. */
function ColumnSelect({
  wind,
  field,
  label,
  optional,
}: {
  wind: WindImport;
  field: ColumnKey;
  label: string;
  optional: boolean;
}) {
  const positions = Array.from({ length: wind.columnCount }, (_, index) => index + 1);
  const choices = positions.map((position) => {
    const name = wind.columnNames[position - 1];
    return { value: position, label: name ? `${position}: ${name}` : `column ${position}` };
  });
  return (
    <Form.Item label={label}>
      <Select<number | 'none'>
        aria-label={label}
        style={{ width: 170 }}
        value={wind.settings[field] ?? 'none'}
        options={[
          ...(optional ? [{ value: 'none' as const, label: 'not in the file' }] : []),
          ...choices,
        ]}
        onChange={(value) =>
          wind.change({
            [field]: value === 'none' ? undefined : value,
          } as Partial<WindImportSettings>)
        }
      />
    </Form.Item>
  );
}

/** A unit chooser from the engine's list for that quantity. */
function UnitSelect<U extends string>({
  label,
  value,
  units,
  onChange,
}: {
  label: string;
  value: U;
  units: readonly U[];
  onChange: (unit: U) => void;
}) {
  return (
    <Form.Item label={label}>
      <Select<U>
        aria-label={label}
        style={{ width: 90 }}
        value={value}
        options={options(units) as { value: U; label: string }[]}
        onChange={onChange}
      />
    </Form.Item>
  );
}

/** How the file is laid out: lines to skip, header, separator, number format. */
function LayoutFields({ wind }: { wind: WindImport }) {
  const { settings, change } = wind;
  return (
    <Space wrap align="start">
      <Form.Item label="Lines to skip at the top">
        <InputNumber
          aria-label="Lines to skip at the top"
          min={0}
          precision={0}
          value={settings.skipLines}
          onChange={(value) => change({ skipLines: typeof value === 'number' ? value : 0 })}
        />
      </Form.Item>
      <Form.Item label="Header row">
        <Checkbox
          checked={settings.headerRow}
          onChange={(event) => change({ headerRow: event.target.checked })}
        >
          the first line read names the columns
        </Checkbox>
      </Form.Item>
      <Form.Item label="Separator">
        <Select<WindSeparator>
          aria-label="Separator"
          style={{ width: 170 }}
          value={settings.separator}
          options={SEPARATORS}
          onChange={(separator) => change({ separator })}
        />
      </Form.Item>
      <CsvNumberFormatSelect
        value={settings.numberFormat}
        onChange={(numberFormat) => change({ numberFormat })}
      />
    </Space>
  );
}

/**
 * Which column holds the height or pressure, direction, speed, and (if the file has them) the
 * temperature and dew point, each with its unit.
 */
export function WindColumnsFields({ wind }: { wind: WindImport }) {
  const { settings, change } = wind;
  const column = (field: ColumnKey, label: string, optional: boolean) => (
    <ColumnSelect wind={wind} field={field} label={label} optional={optional} />
  );
  return (
    <>
      <LayoutFields wind={wind} />
      <Space wrap align="start">
        {column('heightColumn', 'Height column', true)}
        <UnitSelect
          label="Height unit"
          value={settings.heightUnit}
          units={WIND_HEIGHT_UNITS}
          onChange={(heightUnit) => change({ heightUnit })}
        />
        {column('pressureColumn', 'Pressure column', true)}
        <UnitSelect
          label="Pressure unit"
          value={settings.pressureUnit}
          units={WIND_PRESSURE_UNITS}
          onChange={(pressureUnit) => change({ pressureUnit })}
        />
      </Space>
      <Space wrap align="start">
        {column('directionColumn', 'Direction column (from, °)', false)}
        {column('speedColumn', 'Speed column', false)}
        <UnitSelect
          label="Speed unit"
          value={settings.speedUnit}
          units={WIND_SPEED_UNITS}
          onChange={(speedUnit) => change({ speedUnit })}
        />
      </Space>
      <Space wrap align="start">
        {column('temperatureColumn', 'Temperature column', true)}
        <UnitSelect
          label="Temperature unit"
          value={settings.temperatureUnit}
          units={WIND_TEMPERATURE_UNITS}
          onChange={(temperatureUnit) => change({ temperatureUnit })}
        />
        {column('dewPointColumn', 'Dew point column', true)}
        <UnitSelect
          label="Dew point unit"
          value={settings.dewPointUnit}
          units={WIND_TEMPERATURE_UNITS}
          onChange={(dewPointUnit) => change({ dewPointUnit })}
        />
      </Space>
    </>
  );
}
