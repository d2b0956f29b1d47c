import { theme } from 'antd';
import type { CalculationResult } from '@loftwright/buoyancy';
import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { ChartFrame } from '@/components/charts/chart-frame';
import { usePlainNumbers } from '@/components/reading/use-number-display';

/** Altitude and ascent rate against time, the end of the ascent (burst or float) marked. */
export function FlightChart({
  series,
  outputs,
}: {
  series: CalculationResult['series'];
  outputs: CalculationResult['outputs'];
}) {
  const { token } = theme.useToken();
  const display = usePlainNumbers();
  const ascent = series?.ascent;
  if (!ascent) return null;
  const column = (key: string) => ascent.columns.findIndex((candidate) => candidate.key === key);
  const [t, z, w] = [column('time'), column('altitude'), column('ascentRate')];
  const toPoint = (row: readonly number[]) => ({
    minutes: (row[t] ?? 0) / 60,
    km: (row[z] ?? 0) / 1000,
    rate: row[w] ?? 0,
  });
  const points = [...ascent.rows.map(toPoint), ...(series?.descent?.rows.map(toPoint) ?? [])];
  const end = toPoint(ascent.rows.at(-1) ?? []);
  const endName = outputs.burstAltitude
    ? 'burst'
    : outputs.floatAltitude
      ? 'float'
      : 'end of ascent';
  return (
    <ChartFrame
      title="Flight profile"
      testId="flight"
      description={`Altitude and vertical rate against time; ${endName} at ${display.fixed(end.km, 2)} km after ${display.fixed(end.minutes, 1)} min`}
    >
      <ResponsiveContainer>
        <LineChart data={points} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={token.colorBorder} />
          <XAxis
            dataKey="minutes"
            type="number"
            domain={[0, 'dataMax']}
            tickFormatter={(value: number) => display.fixed(value, 0)}
            label={{ value: 'Time (min)', position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            yAxisId="km"
            tickFormatter={(value: number) => display.fixed(value, 0)}
            label={{ value: 'Altitude (km)', angle: -90, position: 'insideLeft' }}
          />
          <YAxis
            yAxisId="rate"
            orientation="right"
            tickFormatter={(value: number) => display.fixed(value, 0)}
            label={{ value: 'Vertical rate (m/s)', angle: 90, position: 'insideRight' }}
          />
          <Tooltip
            formatter={(value) =>
              typeof value === 'number' ? display.fixed(value, 2) : String(value)
            }
            labelFormatter={(label) => `${display.fixed(Number(label), 1)} min`}
          />
          <Legend verticalAlign="top" />
          <Line
            yAxisId="km"
            type="monotone"
            dataKey="km"
            name="Altitude (km)"
            stroke={token.colorPrimary}
            dot={false}
            isAnimationActive={false}
          />
          <Line
            yAxisId="rate"
            type="monotone"
            dataKey="rate"
            name="Vertical rate (m/s)"
            stroke={token.colorText}
            strokeDasharray="4 2"
            dot={false}
            isAnimationActive={false}
          />
          <ReferenceDot
            yAxisId="km"
            x={end.minutes}
            y={end.km}
            r={5}
            fill={token.colorWarning}
            stroke="none"
            label={{ value: endName, position: 'top', fontSize: 12 }}
          />
          <ReferenceLine
            yAxisId="km"
            segment={[
              { x: end.minutes, y: 0 },
              { x: end.minutes, y: end.km },
            ]}
            stroke={token.colorWarning}
            strokeDasharray="4 3"
          />
          <ReferenceLine
            yAxisId="km"
            segment={[
              { x: 0, y: end.km },
              { x: end.minutes, y: end.km },
            ]}
            stroke={token.colorWarning}
            strokeDasharray="4 3"
          />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
