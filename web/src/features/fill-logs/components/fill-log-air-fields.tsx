import { Form, Space, Typography } from 'antd';
import {
  type Dimension,
  formatQuantity,
  type NumberFormat,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { FillLogFields, FillLogVersion } from '../hooks/use-fill-log-fields';
import { NO_AIR, type VersionAir } from '../lib/air-of-version';
import { FILL_LOG_RANGES } from '../lib/fill-log-ranges';

/** One line saying where the starting air comes from, or why it is sea level. */
function airNote(
  version: FillLogVersion,
  versionNumber: number,
  air: VersionAir,
  unitSystem: UnitSystem,
  numberFormat: NumberFormat,
): string | undefined {
  const show = (value: number, dimension: Dimension) =>
    formatQuantity(value, dimension, unitSystem, {
      numberFormat,
      significantDigits: 6,
      trimZeros: true,
      grouping: false,
    }).text;
  const seaLevel = `starting from ${show(NO_AIR.temperatureK, 'temperature')}, ${show(NO_AIR.pressurePa, 'pressure')}`;
  if (version.status === 'pending') return undefined;
  if (version.status === 'error') {
    return `The version’s air could not be read (${version.message}); ${seaLevel}`;
  }
  const { origin } = air;
  if (origin.kind === 'none') return `This version names no air; ${seaLevel}`;
  const where =
    origin.kind === 'measured'
      ? 'measured air'
      : `the 1976 standard atmosphere at ${show(origin.altitudeM, 'length')}${
          origin.temperatureOffsetK === 0
            ? ''
            : `, ISA ${origin.temperatureOffsetK > 0 ? '+' : '−'} ${show(Math.abs(origin.temperatureOffsetK), 'temperatureDifference')}`
        }`;
  const dewPoint =
    air.dewPointK === undefined
      ? ''
      : `; relative humidity from its dew point of ${show(air.dewPointK, 'temperature')}`;
  return `Starting from the air version ${versionNumber} was computed for: ${where}${dewPoint}.`;
}

/** The air at the fill, starting from the air the version was computed for, and where that is. */
export function FillLogAirFields({
  fields,
  version,
  versionNumber,
  unitSystem,
  idPrefix,
}: {
  fields: FillLogFields;
  version: FillLogVersion;
  versionNumber: number;
  unitSystem: UnitSystem;
  idPrefix: string;
}) {
  const { numberFormat } = useReadingPreferences();
  const airOrigin = airNote(version, versionNumber, fields.air, unitSystem, numberFormat);
  return (
    <>
      <Typography.Title level={5}>Air at the fill</Typography.Title>
      {airOrigin ? (
        <Typography.Paragraph type="secondary" data-air-origin={fields.air.origin.kind}>
          {airOrigin}
        </Typography.Paragraph>
      ) : null}
      <Space wrap align="start">
        <Form.Item label="Air temperature" htmlFor={`${idPrefix}-t`}>
          <QuantityInput
            id={`${idPrefix}-t`}
            label="Air temperature"
            dimension="temperature"
            value={fields.temperatureK}
            onChange={fields.setTemperatureK}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.temperatureK}
          />
        </Form.Item>
        <Form.Item label="Air pressure (absolute)" htmlFor={`${idPrefix}-p`}>
          <QuantityInput
            id={`${idPrefix}-p`}
            label="Air pressure (absolute)"
            dimension="pressure"
            value={fields.pressurePa}
            onChange={fields.setPressurePa}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.pressurePa}
          />
        </Form.Item>
        <Form.Item label="Relative humidity (optional)" htmlFor={`${idPrefix}-rh`}>
          <QuantityInput
            id={`${idPrefix}-rh`}
            label="Relative humidity"
            dimension="fraction"
            value={fields.relativeHumidity}
            onChange={fields.setRelativeHumidity}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.relativeHumidity}
          />
        </Form.Item>
      </Space>
    </>
  );
}
