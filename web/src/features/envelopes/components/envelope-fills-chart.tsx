import { Card, theme } from 'antd';
import { formatQuantity, type UnitSystem } from '@loftwright/buoyancy';
import {
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { EnvelopeFill } from '../api/envelopes-api';

/** Each fill's measured net lift as a dot and the prediction as a line, oldest fill first. */
export function EnvelopeFillsChart({
  fills,
  unitSystem,
}: {
  fills: readonly EnvelopeFill[];
  unitSystem: UnitSystem;
}) {
  const { token } = theme.useToken();
  const ordered = [...fills].sort((a, b) => a.filledAt.localeCompare(b.filledAt));
  const typical = Math.max(...ordered.map((fill) => Math.abs(fill.measuredNetLiftKg ?? 0)), 1e-3);
  const unit = formatQuantity(typical, 'mass', unitSystem);
  const toUnit = (kg: number | null) =>
    kg === null ? undefined : formatQuantity(kg, 'mass', unitSystem, { unit: unit.unitName }).value;
  const data = ordered.map((fill, index) => ({
    fill: index + 1,
    measured: toUnit(fill.measuredNetLiftKg),
    predicted: toUnit(fill.predictedNetLiftKg),
  }));
  return (
    <Card title="Measured against predicted net lift, fill by fill" size="small">
      <ResponsiveContainer width="100%" height={240}>
        <ComposedChart data={data} margin={{ top: 8, right: 16, bottom: 16, left: 8 }}>
          <CartesianGrid stroke={token.colorBorderSecondary} />
          <XAxis dataKey="fill" label={{ value: 'fill', position: 'insideBottom', offset: -8 }} />
          <YAxis label={{ value: unit.unit, angle: -90, position: 'insideLeft' }} />
          <Tooltip />
          <Legend verticalAlign="top" />
          <Line
            dataKey="predicted"
            name="predicted"
            stroke={token.colorPrimary}
            dot={false}
            connectNulls
          />
          <Scatter dataKey="measured" name="measured" fill={token.colorWarning} />
        </ComposedChart>
      </ResponsiveContainer>
    </Card>
  );
}
