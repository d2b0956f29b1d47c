import { Select, Space, Spin, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { useVersionDiff, type VersionSummary } from '../api/calculations-api';
import { VersionDiffView } from './version-diff-view';

/** Pick two versions; see what changed between them. */
export function VersionCompare({
  calculationId,
  kind,
  versions,
  unitSystem,
}: {
  calculationId: string;
  kind: string;
  versions: readonly VersionSummary[];
  unitSystem: UnitSystem;
}) {
  const numbers = versions.map((version) => version.number);
  const [a, setA] = useState<number | undefined>(numbers.at(-2));
  const [b, setB] = useState<number | undefined>(numbers.at(-1));
  const diff = useVersionDiff(calculationId, a, b);
  if (numbers.length < 2)
    return <Typography.Text type="secondary">Save a second version to compare.</Typography.Text>;
  const options = numbers.map((number) => ({ value: number, label: `Version ${number}` }));
  return (
    <>
      <Space style={{ marginBottom: 12 }}>
        <Select
          aria-label="Compare from version"
          value={a}
          options={options}
          onChange={setA}
          style={{ width: 140 }}
        />
        <Typography.Text>with</Typography.Text>
        <Select
          aria-label="Compare with version"
          value={b}
          options={options}
          onChange={setB}
          style={{ width: 140 }}
        />
      </Space>
      {diff.isFetching ? (
        <Spin />
      ) : diff.data ? (
        <VersionDiffView kind={kind} diff={diff.data} unitSystem={unitSystem} />
      ) : null}
      {diff.error ? <Typography.Text type="danger">{diff.error.message}</Typography.Text> : null}
    </>
  );
}
