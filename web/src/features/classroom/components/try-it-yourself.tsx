import { Alert, Button, Card, Slider, Space, Table, Typography } from 'antd';
import {
  evaluate,
  formatRange,
  InputError,
  numberAtPath,
  type OutputQuantity,
  type UnitSystem,
  valuesOutsideRanges,
  withNumberAtPath,
} from '@loftwright/buoyancy';
import { useState } from 'react';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { TryRanges } from '../api/classroom-api';
import { inputFieldInfo } from '../lib/input-field';

interface Row {
  name: string;
  label: string;
  original: OutputQuantity;
  yours: OutputQuantity | undefined;
}

/**
 * The example's inputs a teacher opened up, each within its allowed range, with results
 * recomputed in the browser as they move. Nothing is saved; the published example stays as it is.
 */
export function TryItYourself({
  kind,
  inputs,
  outputs,
  ranges,
  unitSystem,
}: {
  kind: string;
  inputs: Record<string, unknown>;
  outputs: Readonly<Record<string, OutputQuantity>>;
  ranges: TryRanges;
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  const show = useNumberDisplay(unitSystem);
  const [changes, setChanges] = useState<Record<string, number | undefined>>({});
  // Bumped on reset so the quantity fields show the original values again.
  const [generation, setGeneration] = useState(0);
  const paths = Object.keys(ranges);
  const unreadable = paths.filter((path) => path in changes && changes[path] === undefined);

  const computed = ((): {
    result: ReturnType<typeof evaluate> | undefined;
    problem: string | undefined;
    outside: string[];
  } => {
    try {
      let modified: Record<string, unknown> = inputs;
      for (const [path, value] of Object.entries(changes)) {
        if (value !== undefined) modified = withNumberAtPath(modified, path, value);
      }
      const outside = valuesOutsideRanges(modified, ranges).map((issue) => issue.path);
      if (outside.length > 0 || unreadable.length > 0) {
        return { result: undefined, problem: undefined, outside };
      }
      return { result: evaluate(kind, modified), problem: undefined, outside };
    } catch (error) {
      return {
        result: undefined,
        problem:
          error instanceof InputError || error instanceof Error ? error.message : String(error),
        outside: [],
      };
    }
  })();
  const { outside } = computed;

  if (paths.length === 0) {
    return (
      <Alert
        type="info"
        showIcon
        title="Your teacher has not opened any inputs of this example for trying out."
      />
    );
  }

  const rows: Row[] = Object.entries(outputs).map(([name, original]) => ({
    name,
    label: original.label,
    original,
    yours: computed.result?.outputs[name],
  }));

  return (
    <Space orientation="vertical" size="middle" style={{ width: '100%' }}>
      <Typography.Paragraph style={{ margin: 0 }}>
        Change these inputs within the ranges your teacher set and watch the results move. The
        worked example itself does not change.
      </Typography.Paragraph>
      <Card size="small" title="Inputs you may change">
        {paths.map((path) => {
          const range = ranges[path] as { min: number; max: number };
          const info = inputFieldInfo(kind, path);
          const dimension = info.dimension ?? 'coefficient';
          const original = numberAtPath(inputs, path) ?? range.min;
          const value = path in changes ? changes[path] : original;
          const allowed = formatRange(range.min, range.max, dimension, {
            unitSystem,
            numberFormat,
          }).replace(/^between (.*) and /, '$1 to ');
          const isOutside = outside.includes(path);
          return (
            <div key={path} style={{ marginBottom: 16, maxWidth: 480 }} data-try={path}>
              <label htmlFor={`try-${path}`} style={{ display: 'block', fontWeight: 600 }}>
                {info.label.replace(/^./, (first) => first.toUpperCase())}
              </label>
              {
                <QuantityInput
                  key={generation}
                  id={`try-${path}`}
                  label={info.label}
                  dimension={dimension}
                  value={value}
                  unitSystem={unitSystem}
                  onChange={(next) => setChanges((now) => ({ ...now, [path]: next }))}
                />
              }
              <Slider
                min={range.min}
                max={range.max}
                step={(range.max - range.min) / 200}
                value={
                  value !== undefined ? Math.min(range.max, Math.max(range.min, value)) : range.min
                }
                tooltip={{ open: false }}
                aria-label={`${info.label}, slider`}
                onChange={(next: number) => setChanges((now) => ({ ...now, [path]: next }))}
              />
              <Typography.Text
                type={isOutside ? 'danger' : 'secondary'}
                role={isOutside ? 'alert' : undefined}
              >
                {isOutside
                  ? `Outside what your teacher allowed: ${allowed}.`
                  : `Allowed: ${allowed}.`}
              </Typography.Text>
            </div>
          );
        })}
        <Button
          onClick={() => {
            setChanges({});
            setGeneration((now) => now + 1);
          }}
        >
          Back to the example’s values
        </Button>
      </Card>
      {computed.problem ? <Alert type="error" showIcon title={computed.problem} /> : null}
      <div role="status" aria-live="polite" aria-label="Your results">
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
              render: (_: unknown, row) => {
                return (
                  <span className="lw-mono">
                    {show.outputText(row.original.value, row.original.unit)}
                  </span>
                );
              },
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
      </div>
    </Space>
  );
}
