import { Table } from 'antd';
import type { OutputQuantity, UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';

interface Row {
  name: string;
  label: string;
  original: OutputQuantity;
  yours: OutputQuantity | undefined;
}

/** Each result of the example beside the student's, and how far theirs moved. */
export function TryResultsTable({
  outputs,
  yours,
  unitSystem,
}: {
  outputs: Readonly<Record<string, OutputQuantity>>;
  /** The results of the student's inputs, if they computed. */
  yours: Readonly<Record<string, OutputQuantity>> | undefined;
  unitSystem: UnitSystem;
}) {
  const show = useNumberDisplay(unitSystem);
  const rows: Row[] = Object.entries(outputs).map(([name, original]) => ({
    name,
    label: original.label,
    original,
    yours: yours?.[name],
  }));
  return (
    <Table<Row>
      rowKey="name"
      size="small"
      pagination={false}
      dataSource={rows}
      aria-label="Results: the example and yours"
      columns={[
        { title: 'Result', dataIndex: 'label' },
        {
          title: 'In the example',
          key: 'original',
          render: (_: unknown, row) => (
            <span className="lw-mono">
              {show.outputText(row.original.value, row.original.unit)}
            </span>
          ),
        },
        {
          title: 'With your inputs',
          key: 'yours',
          render: (_: unknown, row) => {
            if (!row.yours) return '—';
            return (
              <span className="lw-mono" data-yours={row.name}>
                {show.outputText(row.yours.value, row.yours.unit)}
              </span>
            );
          },
        },
        {
          title: 'Change',
          key: 'change',
          render: (_: unknown, row) => {
            if (!row.yours || row.original.value === 0) return '—';
            const percent =
              ((row.yours.value - row.original.value) / Math.abs(row.original.value)) * 100;
            return (
              <span className="lw-mono">{`${percent >= 0 ? '+' : ''}${show.fixed(percent, 1)} %`}</span>
            );
          },
        },
      ]}
    />
  );
}
