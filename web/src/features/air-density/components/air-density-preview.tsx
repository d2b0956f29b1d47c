import { Card, Form, Space, Typography } from 'antd';
import { useState } from 'react';
import {
  AIR_PRESSURE_RANGE_PA,
  AIR_TEMPERATURE_RANGE_K,
  dryAirDensityKgM3,
  formatNumber,
  InputError,
  type NumberFormat,
  readLeadingNumber,
} from '@loftwright/buoyancy';
import { ReadingInput } from '@/components/reading/reading-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';

const KELVIN_AT_ZERO_CELSIUS = 273.15;
const PA_PER_HPA = 100;

/**
 * One fixed unit per field keeps this first page light: the engine's unit library (which reads
 * "59 °F" or "29.9 inHg") loads with the editor. Numbers still follow the one reading rule.
 */
const FIELDS = {
  temperature: {
    label: 'Air temperature',
    unit: '°C',
    spellings: ['', '°C', '° C', 'degC', 'C'],
    fromSI: (kelvin: number) => kelvin - KELVIN_AT_ZERO_CELSIUS,
    range: AIR_TEMPERATURE_RANGE_K,
  },
  pressure: {
    label: 'Air pressure',
    unit: 'hPa',
    spellings: ['', 'hPa'],
    fromSI: (pascal: number) => pascal / PA_PER_HPA,
    range: AIR_PRESSURE_RANGE_PA,
  },
} as const;

type FieldName = keyof typeof FIELDS;

function readIn(name: FieldName, text: string, numberFormat: NumberFormat): number {
  const field = FIELDS[name];
  const reading = readLeadingNumber(text, numberFormat);
  if (!reading.ok) throw new InputError(field.label, text, reading.reason);
  if (!(field.spellings as readonly string[]).includes(reading.rest.trim())) {
    throw new InputError(
      field.label,
      text,
      `is read in ${field.unit} here: type a number such as ${name === 'temperature' ? '15' : '1013'}`,
    );
  }
  return reading.value;
}

/**
 * A first look at the engine running in the browser: dry-air density from temperature and
 * pressure, recomputed as the person types, with ranges checked beside each field.
 */
export function AirDensityPreview() {
  const { numberFormat } = useReadingPreferences();
  const [temperatureC, setTemperatureC] = useState<number | undefined>(15);
  const [pressureHPa, setPressureHPa] = useState<number | undefined>(1013.25);
  const plain = (value: number) => formatNumber(value, numberFormat, { trimZeros: true });
  const outside = (name: FieldName, value: number | undefined) => {
    const { fromSI, range, unit } = FIELDS[name];
    if (value === undefined) return 'is empty';
    return value < fromSI(range.min) || value > fromSI(range.max)
      ? `must be between ${plain(fromSI(range.min))} ${unit} and ${plain(fromSI(range.max))} ${unit}`
      : undefined;
  };
  const problems = {
    temperature: outside('temperature', temperatureC),
    pressure: outside('pressure', pressureHPa),
  };
  const waitingFor = (Object.keys(problems) as FieldName[]).filter((name) => problems[name]);
  const densityKgM3 =
    waitingFor.length === 0 && temperatureC !== undefined && pressureHPa !== undefined
      ? dryAirDensityKgM3(temperatureC + KELVIN_AT_ZERO_CELSIUS, pressureHPa * PA_PER_HPA)
      : undefined;

  const field = (name: FieldName, value: number | undefined, set: (next?: number) => void) => (
    <Form.Item label={`${FIELDS[name].label} (${FIELDS[name].unit})`} htmlFor={`air-${name}`}>
      <ReadingInput
        id={`air-${name}`}
        label={FIELDS[name].label}
        value={value}
        onChange={set}
        displayKey={numberFormat}
        display={(next) => `${plain(next)} ${FIELDS[name].unit}`}
        read={(text) => {
          const next = readIn(name, text, numberFormat);
          return { value: next, readAs: `${plain(next)} ${FIELDS[name].unit}` };
        }}
        check={(next) => outside(name, next)}
      />
    </Form.Item>
  );

  return (
    <Card title="Dry air density">
      <Form layout="vertical" component="div">
        <Space wrap size="large" align="start">
          {field('temperature', temperatureC, setTemperatureC)}
          {field('pressure', pressureHPa, setPressureHPa)}
        </Space>
      </Form>
      <div role="status" aria-live="polite">
        {densityKgM3 === undefined ? (
          <Typography.Text type="danger">
            {`The density waits for: ${waitingFor.map((name) => FIELDS[name].label.toLowerCase()).join(' and ')}.`}
          </Typography.Text>
        ) : (
          <>
            <Typography.Title level={3} style={{ margin: 0 }}>
              <span className="lw-mono">
                {formatNumber(densityKgM3, numberFormat, { significantDigits: 5 })}
              </span>{' '}
              kg/m³
            </Typography.Title>
            <Typography.Text type="secondary">
              ideal-gas law, dry air, molar mass of the U.S. Standard Atmosphere 1976
            </Typography.Text>
          </>
        )}
      </div>
    </Card>
  );
}
