import { Empty, Table, Typography, theme } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import type { VersionDiff } from '../api/calculations-api';

const show = (value: unknown) =>
  value === null || value === undefined
    ? '—'
    : typeof value === 'object'
      ? JSON.stringify(value)
      : String(value);

/** Inputs and outputs that changed between two versions, side by side, the new value marked. */
export function VersionDiffView({
  diff,
  unitSystem,
  titles,
}: {
  diff: VersionDiff;
  unitSystem: UnitSystem;
  /** Column headings for the two sides; versions by number unless told otherwise. */
  titles?: { from: string; to: string };
}) {
  const { token } = theme.useToken();
  const headings = titles ?? { from: `Version ${diff.from}`, to: `Version ${diff.to}` };
  const changed = { background: token.colorWarningBg, fontWeight: 600 };
  if (diff.inputs.length === 0 && diff.outputs.length === 0) {
    return (
      <Empty
        description={`${titles ? `${titles.from} and ${titles.to}` : `Versions ${diff.from} and ${diff.to}`} have the same inputs and results.`}
      />
    );
  }
  return (
    <>
      <Typography.Title level={5}>Inputs that changed</Typography.Title>
      <Table
        size="small"
        pagination={false}
        rowKey="path"
        dataSource={diff.inputs}
        aria-label="Changed inputs"
        columns={[
          {
            title: 'Input',
            dataIndex: 'path',
            render: (path: string) => <span className="lw-mono">{path}</span>,
          },
          {
            title: headings.from,
            dataIndex: 'from',
            render: (value: unknown) => <span className="lw-mono">{show(value)}</span>,
          },
          {
            title: headings.to,
            dataIndex: 'to',
            render: (value: unknown) => (
              <span className="lw-mono" style={changed}>
                {show(value)}
              </span>
            ),
          },
        ]}
      />
      <Typography.Title level={5} style={{ marginTop: 16 }}>
        Results that changed
      </Typography.Title>
      <Table
        size="small"
        pagination={false}
        rowKey="name"
        dataSource={diff.outputs}
        aria-label="Changed results"
        columns={[
          { title: 'Result', dataIndex: 'label' },
          {
            title: headings.from,
            dataIndex: 'from',
            render: (value: number | null, row) => (
              <Value value={value} unit={row.unit} unitSystem={unitSystem} />
            ),
          },
          {
            title: headings.to,
            dataIndex: 'to',
            render: (value: number | null, row) => (
              <span style={changed}>
                <Value value={value} unit={row.unit} unitSystem={unitSystem} />
              </span>
            ),
          },
        ]}
      />
      {diff.engineVersion.from !== diff.engineVersion.to ? (
        <Typography.Paragraph type="secondary" style={{ marginTop: 8 }}>
          Computed by engine {diff.engineVersion.from} and {diff.engineVersion.to}: part of the
          change may come from the engine.
        </Typography.Paragraph>
      ) : null}
    </>
  );
}

function Value({
  value,
  unit,
  unitSystem,
}: {
  value: number | null;
  unit: string;
  unitSystem: UnitSystem;
}) {
  const show = useNumberDisplay(unitSystem);
  if (value === null) return <>—</>;
  const shown = show.output(value, unit);
  return (
    <span className="lw-mono">
      {shown.value} {shown.unit}
    </span>
  );
}
