import { theme } from 'antd';
import { formatQuantity, type UnitSystem } from '@loftwright/buoyancy';
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
import type { LiftSweep } from './lift-sweeps';
import { niceAxis, tickDecimals } from './nice-axis';
import { useNumberDisplay } from '@/components/reading/use-number-display';

/** A quantity's unit for a whole axis, picked by the size of a typical value on it. */
function axisUnit(typicalSI: number, dimension: LiftSweep['xDimension'], unitSystem: UnitSystem) {
  const { unitName, unit } = formatQuantity(typicalSI, dimension, unitSystem);
  const convert = (valueSI: number) =>
    formatQuantity(valueSI, dimension, unitSystem, { unit: unitName }).value;
  return { unit, convert };
}

/**
 * Net and free lift against one varied input. The design point is a first-light dot with dashed
 * guides to both axes; zero lift is a rule, since below it the balloon does not rise.
 */
export function SweepChart({ sweep, unitSystem }: { sweep: LiftSweep; unitSystem: UnitSystem }) {
  const { token } = theme.useToken();
  const display = useNumberDisplay(unitSystem);
  const x = axisUnit(sweep.design.x, sweep.xDimension, unitSystem);
  const largestLiftKg = Math.max(...sweep.points.map((point) => Math.abs(point.netKg)));
  const lift = axisUnit(largestLiftKg, 'mass', unitSystem);
  const data = sweep.points.map((point) => ({
    x: x.convert(point.x),
    net: lift.convert(point.netKg),
    free: lift.convert(point.freeKg),
  }));
  if (data.length < 2) return null;
  const design = { x: x.convert(sweep.design.x), y: lift.convert(sweep.design.freeKg) };
  const target = sweep.targetFreeKg === undefined ? undefined : lift.convert(sweep.targetFreeKg);
  const ys = data.flatMap((point) => [point.net, point.free]).concat(0, target ?? 0);
  const yAxis = niceAxis(Math.min(...ys), Math.max(...ys));
  const xDomain: [number, number] = [data[0]?.x ?? 0, data.at(-1)?.x ?? 1];
  const yDecimals = tickDecimals(yAxis.ticks);
  // Round ticks inside the data's span, so the curve fills the plot and the guides reach the axis.
  const xTicks = niceAxis(xDomain[0], xDomain[1], 6).ticks.filter(
    (tick) => tick >= xDomain[0] - 1e-9 && tick <= xDomain[1] + 1e-9,
  );
  const xDecimals = tickDecimals(xTicks);
  const description =
    `${sweep.title}: net and free lift from ${display.fixed(xDomain[0], xDecimals)} to ` +
    `${display.fixed(xDomain[1], xDecimals)} ${x.unit}; design point ${display.number(design.x, { significantDigits: 3 })} ${x.unit}, ` +
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
            ticks={xTicks}
            allowDataOverflow
            tickFormatter={(value: number) => display.fixed(value, xDecimals)}
            label={{ value: `${sweep.xLabel} (${x.unit})`, position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            domain={yAxis.domain}
            ticks={yAxis.ticks}
            allowDataOverflow
            tickFormatter={(value: number) => display.fixed(value, yDecimals)}
            label={{ value: `Lift (${lift.unit})`, angle: -90, position: 'insideLeft', offset: -4 }}
          />
          <Tooltip
            formatter={(value) =>
              typeof value === 'number'
                ? `${display.fixed(value, yDecimals + 1)} ${lift.unit}`
                : String(value)
            }
            labelFormatter={(label) => `${display.fixed(Number(label), xDecimals + 1)} ${x.unit}`}
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
              { x: design.x, y: yAxis.domain[0] },
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
