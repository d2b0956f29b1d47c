import { Alert, Button, Card, Space, Typography } from 'antd';
import type { OutputQuantity, UnitSystem } from '@loftwright/buoyancy';
import type { TryRanges } from '../api/classroom-api';
import { useTryItYourself } from '../hooks/use-try-it-yourself';
import { TryInputField } from './try-input-field';
import { TryResultsTable } from './try-results-table';

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
  const trying = useTryItYourself(kind, inputs, ranges);

  if (trying.paths.length === 0) {
    return (
      <Alert
        type="info"
        showIcon
        title="Your teacher has not opened any inputs of this example for trying out."
      />
    );
  }

  return (
    <Space orientation="vertical" size="middle" style={{ width: '100%' }}>
      <Typography.Paragraph style={{ margin: 0 }}>
        Change these inputs within the ranges your teacher set and watch the results move. The
        worked example itself does not change.
      </Typography.Paragraph>
      <Card size="small" title="Inputs you may change">
        {trying.paths.map((path) => (
          <TryInputField
            key={path}
            kind={kind}
            inputs={inputs}
            path={path}
            range={ranges[path] as { min: number; max: number }}
            changed={path in trying.changes}
            value={trying.changes[path]}
            onChange={(next) => trying.change(path, next)}
            outside={trying.outside.includes(path)}
            generation={trying.generation}
            unitSystem={unitSystem}
          />
        ))}
        <Button onClick={trying.reset}>Back to the example’s values</Button>
      </Card>
      {trying.problem ? <Alert type="error" showIcon title={trying.problem} /> : null}
      <div role="status" aria-live="polite" aria-label="Your results">
        <TryResultsTable outputs={outputs} yours={trying.result?.outputs} unitSystem={unitSystem} />
      </div>
    </Space>
  );
}
