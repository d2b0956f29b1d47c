import { Table } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import type { ReactNode } from 'react';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import type { FillLog } from '../api/fill-logs-api';

/** The fills logged, newest first, each row opening to its detail. */
export function FillLogsTable({
  logs,
  loading,
  expanded,
  onExpandedChange,
  detail,
  unitSystem,
}: {
  logs: FillLog[];
  loading: boolean;
  expanded: string[];
  onExpandedChange: (ids: string[]) => void;
  detail: (log: FillLog) => ReactNode;
  unitSystem: UnitSystem;
}) {
  const display = useNumberDisplay(unitSystem);
  const mass = (value: number | undefined) =>
    value === undefined ? '—' : display.quantity(value, 'mass').text;
  return (
    <Table<FillLog>
      size="small"
      rowKey="id"
      aria-label="Fill logs"
      loading={loading}
      dataSource={logs}
      pagination={{ pageSize: 10, hideOnSinglePage: true }}
      locale={{ emptyText: 'No fills logged yet' }}
      expandable={{
        expandedRowKeys: expanded,
        onExpandedRowsChange: (keys) => onExpandedChange(keys.map(String)),
        expandRowByClick: true,
        expandedRowRender: detail,
      }}
      columns={[
        {
          title: 'Filled at',
          dataIndex: 'filledAt',
          render: (at: string) => new Date(at).toLocaleString(),
        },
        { title: 'Place', dataIndex: 'place' },
        { title: 'Envelope', dataIndex: 'envelopeLabel' },
        {
          title: 'Version',
          dataIndex: 'versionNumber',
          render: (n: number) => <span className="lw-mono">v{n}</span>,
        },
        { title: 'Readings', key: 'readings', render: (_: unknown, log) => log.readings.length },
        {
          title: 'Measured net lift',
          key: 'measured',
          render: (_: unknown, log) => mass(log.outputs.measuredNetLift?.value),
        },
        {
          title: 'Predicted',
          key: 'predicted',
          render: (_: unknown, log) => mass(log.outputs.predictedNetLift?.value),
        },
        {
          title: 'Difference',
          key: 'difference',
          render: (_: unknown, log) =>
            log.outputs.differencePercent
              ? `${display.fixed(log.outputs.differencePercent.value, 1)} %`
              : '—',
        },
      ]}
    />
  );
}
