import { Empty, Table, Typography, theme } from 'antd';
import {
  fieldSchemaAt,
  inputLabel,
  inputValueText,
  KINDS,
  sharedUnit,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useMemo } from 'react';
import { formatOutputText, sharedOutputUnit } from '@/components/quantity/format-output';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { VersionDiff } from '../api/calculations-api';

interface InputRow {
  path: string;
  label: string;
  from: string;
  to: string;
}

interface OutputRow {
  name: string;
  label: string;
  from: string;
  to: string;
}

/** Inputs and outputs that changed between two versions, side by side, the new value marked. */
export function VersionDiffView({
  kind,
  diff,
  unitSystem,
  titles,
}: {
  /** The calculation's kind: its input schema names and measures each changed input. */
  kind: string;
  diff: VersionDiff;
  unitSystem: UnitSystem;
  /** Column headings for the two sides; versions by number unless told otherwise. */
  titles?: { from: string; to: string };
}) {
  const { token } = theme.useToken();
  const { numberFormat } = useReadingPreferences();
  const { inputs, outputs } = useMemo(() => {
    const schema = KINDS.find((candidate) => candidate.id === kind)?.inputSchema;
    const shownAs = { unitSystem, numberFormat };
    // Each row in one unit for both sides, by the label and section the editor shows.
    const inputRows: InputRow[] = diff.inputs.map((change) => {
      const field = fieldSchemaAt(schema, change.path);
      const unit = sharedUnit(field, [change.from, change.to], shownAs);
      const text = (value: unknown) =>
        inputValueText(field, value, { ...shownAs, ...(unit ? { unit } : {}) });
      return {
        path: change.path,
        label: inputLabel(schema, change.path),
        from: text(change.from),
        to: text(change.to),
      };
    });
    const outputRows: OutputRow[] = diff.outputs.map((change) => {
      const unit = sharedOutputUnit([change.from, change.to], change.unit, shownAs);
      const text = (value: number | null) =>
        value === null ? '—' : formatOutputText(value, change.unit, shownAs, unit);
      return {
        name: change.name,
        label: change.label,
        from: text(change.from),
        to: text(change.to),
      };
    });
    return { inputs: inputRows, outputs: outputRows };
  }, [kind, diff, unitSystem, numberFormat]);
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
      {inputs.length === 0 ? (
        <Typography.Paragraph type="secondary">No input changed.</Typography.Paragraph>
      ) : (
        <Table<InputRow>
          size="small"
          pagination={false}
          rowKey="path"
          dataSource={inputs}
          aria-label="Changed inputs"
          columns={[
            { title: 'Input', dataIndex: 'label' },
            { title: headings.from, dataIndex: 'from' },
            {
              title: headings.to,
              dataIndex: 'to',
              render: (text: string) => <span style={changed}>{text}</span>,
            },
          ]}
        />
      )}
      <Typography.Title level={5} style={{ marginTop: 16 }}>
        Results that changed
      </Typography.Title>
      {outputs.length === 0 ? (
        <Typography.Paragraph type="secondary">
          No result changed (the same to within one part in a billion).
        </Typography.Paragraph>
      ) : (
        <Table<OutputRow>
          size="small"
          pagination={false}
          rowKey="name"
          dataSource={outputs}
          aria-label="Changed results"
          columns={[
            { title: 'Result', dataIndex: 'label' },
            {
              title: headings.from,
              dataIndex: 'from',
              render: (text: string) => <span className="lw-mono">{text}</span>,
            },
            {
              title: headings.to,
              dataIndex: 'to',
              render: (text: string) => (
                <span className="lw-mono" style={changed}>
                  {text}
                </span>
              ),
            },
          ]}
        />
      )}
      {diff.engineVersion.from !== diff.engineVersion.to ? (
        <Typography.Paragraph type="secondary" style={{ marginTop: 8 }}>
          Computed by engine {diff.engineVersion.from} and {diff.engineVersion.to}: part of the
          change may come from the engine.
        </Typography.Paragraph>
      ) : null}
    </>
  );
}
