import { Table } from 'antd';
import type { FillReading, UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import type { FillLog } from '../api/fill-logs-api';

/** The lift readings of one fill, ten to a page, each with the air it was read in if logged. */
export function LiftReadingsTable({ log, unitSystem }: { log: FillLog; unitSystem: UnitSystem }) {
  const display = useNumberDisplay(unitSystem);
  const show = (
    value: number | undefined,
    dimension: 'mass' | 'time' | 'temperature' | 'pressure',
  ) => (value === undefined ? '—' : display.quantity(value, dimension).text);
  return (
    <Table<FillReading & { key: number }>
      size="small"
      style={{ marginTop: 12 }}
      aria-label="Lift readings"
      pagination={{ pageSize: 10, hideOnSinglePage: true }}
      dataSource={log.readings.map((reading, index) => ({ ...reading, key: index }))}
      columns={[
        { title: '#', key: 'n', render: (_: unknown, row) => row.key + 1 },
        {
          title: 'Time since filling',
          dataIndex: 'timeS',
          render: (t: number) => show(t, 'time'),
        },
        {
          title: 'Ballast − scale',
          key: 'lift',
          render: (_: unknown, row) =>
            row.kind === 'ballast'
              ? `${show(row.ballastMassKg, 'mass')} − ${show(row.scaleReadingKg, 'mass')}`
              : `${show(row.netLiftKg, 'mass')} (direct)`,
        },
        {
          title: 'Air',
          key: 'air',
          render: (_: unknown, row) =>
            row.airTemperatureK === undefined && row.pressurePa === undefined
              ? 'as logged'
              : [
                  row.airTemperatureK === undefined ? '' : show(row.airTemperatureK, 'temperature'),
                  row.pressurePa === undefined ? '' : show(row.pressurePa, 'pressure'),
                ]
                  .filter(Boolean)
                  .join(', '),
        },
      ]}
    />
  );
}
