import { Card, Typography } from 'antd';
import { numericInputPaths, type UnitSystem } from '@loftwright/buoyancy';
import type { Dispatch, SetStateAction } from 'react';
import type { ExampleDetail, TryRanges } from '../api/classroom-api';
import { TryRangeRow } from './try-range-row';

/** Which of the example's numeric inputs students may try, each within its range. */
export function TryRangesCard({
  example,
  ranges,
  setRanges,
  unitSystem,
}: {
  example: ExampleDetail;
  ranges: TryRanges;
  setRanges: Dispatch<SetStateAction<TryRanges>>;
  unitSystem: UnitSystem;
}) {
  return (
    <Card
      size="small"
      title="Try it yourself: inputs students may change"
      style={{ marginBottom: 16 }}
    >
      <Typography.Paragraph type="secondary">
        Type each end with its unit, as in the editor; the example’s own value must lie inside.
      </Typography.Paragraph>
      {numericInputPaths(example.inputs).map((path) => (
        <TryRangeRow
          key={path}
          example={example}
          path={path}
          ranges={ranges}
          setRanges={setRanges}
          unitSystem={unitSystem}
        />
      ))}
    </Card>
  );
}
