import { Card, Form, InputNumber, Space, Typography } from 'antd';
import { useState } from 'react';
import {
  AIR_PRESSURE_RANGE_PA,
  AIR_TEMPERATURE_RANGE_K,
  dryAirDensityKgM3,
  InputError,
} from '@loftwright/buoyancy';

const KELVIN_AT_ZERO_CELSIUS = 273.15;
const toCelsius = (temperatureK: number) => Math.round(temperatureK - KELVIN_AT_ZERO_CELSIUS);
const TEMPERATURE_RANGE_TEXT = `Air temperature must be between ${toCelsius(
  AIR_TEMPERATURE_RANGE_K.min,
)} °C and ${toCelsius(AIR_TEMPERATURE_RANGE_K.max)} °C.`;
const PRESSURE_RANGE_TEXT = `Air pressure must be between ${AIR_PRESSURE_RANGE_PA.min / 100} hPa and ${
  AIR_PRESSURE_RANGE_PA.max / 100
} hPa.`;

/**
 * A first look at the engine running in the browser: dry-air density from temperature and
 * pressure, recomputed as the user types. The full ambient-air editor replaces it later.
 */
export function AirDensityPreview() {
  const [temperatureC, setTemperatureC] = useState<number | null>(15);
  const [pressureHPa, setPressureHPa] = useState<number | null>(1013.25);

  let densityKgM3: number | undefined;
  let problem: string | undefined;
  if (temperatureC === null || pressureHPa === null) {
    problem = 'Enter both temperature and pressure.';
  } else {
    try {
      densityKgM3 = dryAirDensityKgM3(temperatureC + KELVIN_AT_ZERO_CELSIUS, pressureHPa * 100);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      problem = error.field === 'temperatureK' ? TEMPERATURE_RANGE_TEXT : PRESSURE_RANGE_TEXT;
    }
  }

  return (
    <Card title="Dry air density">
      <Form layout="vertical">
        <Space wrap size="large">
          <Form.Item label="Air temperature" htmlFor="air-temperature">
            <InputNumber
              id="air-temperature"
              value={temperatureC}
              onChange={setTemperatureC}
              suffix="°C"
              step={1}
              style={{ width: 160 }}
            />
          </Form.Item>
          <Form.Item label="Air pressure" htmlFor="air-pressure">
            <InputNumber
              id="air-pressure"
              value={pressureHPa}
              onChange={setPressureHPa}
              suffix="hPa"
              step={1}
              style={{ width: 160 }}
            />
          </Form.Item>
        </Space>
      </Form>
      <div role="status" aria-live="polite">
        {densityKgM3 === undefined ? (
          <Typography.Text type="danger">{problem}</Typography.Text>
        ) : (
          <>
            <Typography.Title level={3} style={{ margin: 0 }}>
              <span className="lw-mono">{densityKgM3.toFixed(4)}</span> kg/m³
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
