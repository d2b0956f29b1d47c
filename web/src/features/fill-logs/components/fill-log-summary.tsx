import { Descriptions } from 'antd';
import { INSTRUMENT_DEFAULTS, type UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { type FillLog, GAS_SOURCES } from '../api/fill-logs-api';

/** What was logged for one fill: when, where, the envelope, the gas, the air and instruments. */
export function FillLogSummary({ log, unitSystem }: { log: FillLog; unitSystem: UnitSystem }) {
  const display = useNumberDisplay(unitSystem);
  const show = (value: number | undefined, dimension: 'mass' | 'temperature' | 'pressure') =>
    value === undefined ? '—' : display.quantity(value, dimension).text;
  return (
    <Descriptions
      size="small"
      column={{ xs: 1, md: 3 }}
      items={[
        { key: 'at', label: 'Filled at', children: new Date(log.filledAt).toLocaleString() },
        { key: 'place', label: 'Place', children: log.place || '—' },
        { key: 'envelope', label: 'Envelope', children: log.envelopeLabel || '—' },
        {
          key: 'gas',
          label: 'Gas source',
          children:
            GAS_SOURCES.find((source) => source.value === log.gasSource)?.label ?? log.gasSource,
        },
        {
          key: 'air',
          label: 'Air',
          children: `${show(log.ambient.temperatureK, 'temperature')}, ${show(log.ambient.pressurePa, 'pressure')}${log.ambient.relativeHumidity === undefined ? ', dry' : `, ${display.fixed(log.ambient.relativeHumidity * 100, 0)} % RH`}`,
        },
        {
          key: 'instrument',
          label: 'Instruments',
          children: log.instrument
            ? `scale shows ${show(log.instrument.scaleResolutionKg, 'mass')} steps, ballast ± ${show(log.instrument.ballastToleranceKg, 'mass')}`
            : `defaults: scale shows ${show(INSTRUMENT_DEFAULTS.scaleResolutionKg, 'mass')} steps, ballast ± ${show(INSTRUMENT_DEFAULTS.ballastToleranceKg, 'mass')}`,
        },
        { key: 'version', label: 'Against version', children: `v${log.versionNumber}` },
      ]}
    />
  );
}
