import { theme } from 'antd';
import { type LiftSweep, sweepPlot, type UnitSystem } from '@loftwright/buoyancy';
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
import { useNumberDisplay } from '@/components/reading/use-number-display';

/**
 * Net and free lift against one varied input. The design point is a first-light dot with dashed
 * guides to both axes; zero lift is a rule, since below it the balloon does not rise.
 */
export function SweepChart({ sweep, unitSystem }: { sweep: LiftSweep; unitSystem: UnitSystem }) {
  const { token } = theme.useToken();
  const display = useNumberDisplay(unitSystem);
  // Units, conversion and round ticks come from the engine, which lays out the printed sheet's
  // charts the same way.
  const plot = sweepPlot(sweep, unitSystem);
  if (!plot) return null;
  const { x, y: lift, design, target } = plot;
  const data = [...plot.points];
  const xDomain: [number, number] = [x.domain[0], x.domain[1]];
  const yDomain: [number, number] = [lift.domain[0], lift.domain[1]];
  const description =
    `${sweep.title}: net and free lift from ${display.fixed(xDomain[0], x.decimals)} to ` +
    `${display.fixed(xDomain[1], x.decimals)} ${x.unit}; design point ${display.number(design.x, { significantDigits: 3 })} ${x.unit}, ` +
    `free lift ${display.number(design.y, { significantDigits: 3 })} ${lift.unit}`;
  const guide = {
    stroke: token.colorWarning,
    strokeDasharray: '4 3',
    ifOverflow: 'hidden' as const,
  };
  return (
    <ChartFrame title={sweep.title} description={description} testId={sweep.id}>
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 24, left: 16 }}>
          <CartesianGrid stroke={token.colorBorder} />
          <XAxis
            dataKey="x"
            type="number"
            domain={xDomain}
            ticks={[...x.ticks]}
            allowDataOverflow
            tickFormatter={(value: number) => display.fixed(value, x.decimals)}
            label={{ value: x.label, position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            domain={yDomain}
            ticks={[...lift.ticks]}
            allowDataOverflow
            tickFormatter={(value: number) => display.fixed(value, lift.decimals)}
            label={{ value: lift.label, angle: -90, position: 'insideLeft', offset: -4 }}
          />
          <Tooltip
            formatter={(value) =>
              typeof value === 'number'
                ? `${display.fixed(value, lift.decimals + 1)} ${lift.unit}`
                : String(value)
            }
            labelFormatter={(label) => `${display.fixed(Number(label), x.decimals + 1)} ${x.unit}`}
          />
          <Legend verticalAlign="top" />
          <ReferenceLine y={0} stroke={token.colorError} />
          {target === undefined ? null : (
            <ReferenceLine
              y={target}
              stroke={token.colorTextSecondary}
              strokeDasharray="2 2"
              label={{ value: 'free lift wanted', position: 'insideTopRight', fontSize: 11 }}
            />
          )}
          <Line
            type="monotone"
            dataKey="net"
            name="Net lift"
            stroke={token.colorPrimary}
            strokeWidth={2}
            dot={false}
            isAnimationActive={false}
          />
          <Line
            type="monotone"
            dataKey="free"
            name="Free lift"
            stroke={token.colorText}
            strokeDasharray="6 3"
            dot={false}
            isAnimationActive={false}
          />
          <ReferenceLine
            segment={[
              { x: design.x, y: yDomain[0] },
              { x: design.x, y: design.y },
            ]}
            {...guide}
          />
          <ReferenceLine
            segment={[
              { x: xDomain[0], y: design.y },
              { x: design.x, y: design.y },
            ]}
            {...guide}
          />
          <ReferenceDot x={design.x} y={design.y} r={5} fill={token.colorWarning} stroke="none" />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
