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
import type { FillLog } from '../api/fill-logs-api';
import { useNumberDisplay } from '@/components/reading/use-number-display';

/** Hours for a day's readings, days for a week's. */
const timeScale = (spanS: number) =>
  spanS > 3 * 86400 ? { unit: 'days', perS: 1 / 86400 } : { unit: 'h', perS: 1 / 3600 };

/** Measured net lift as dots, the prediction at each reading's air as a line, against time. */
export function FillLogChart({ log, unitSystem }: { log: FillLog; unitSystem: UnitSystem }) {
  const { token } = theme.useToken();
  const display = useNumberDisplay(unitSystem);
  const points = [...log.points].sort((a, b) => a.timeS - b.timeS);
  const span = (points.at(-1)?.timeS ?? 0) - (points[0]?.timeS ?? 0);
  const time = timeScale(span);
  const typical = Math.max(...points.map((point) => Math.abs(point.measuredKg)));
  const mass = formatQuantity(typical, 'mass', unitSystem);
  const toMass = (kg: number) =>
    formatQuantity(kg, 'mass', unitSystem, { unit: mass.unitName }).value;
  const data = points.map((point) => ({
    t: point.timeS * time.perS,
    measured: toMass(point.measuredKg),
    predicted: point.predictedKg === null ? undefined : toMass(point.predictedKg),
  }));
  const hasPrediction = data.some((point) => point.predicted !== undefined);
  const first = data[0];
  const description =
    `Measured${hasPrediction ? ' and predicted' : ''} net lift over ${data.length} readings; ` +
    `first reading ${display.number(first?.measured ?? Number.NaN, { significantDigits: 3 })} ${mass.unit}` +
    (first?.predicted === undefined
      ? ''
      : ` against ${display.number(first.predicted, { significantDigits: 3 })} ${mass.unit} predicted`);
  return (
    <Card
      title="Measured against predicted lift"
      size="small"
      style={{ marginTop: 12 }}
      data-chart="fill-log"
    >
      <div style={{ width: '100%', height: 260 }} role="img" aria-label={description}>
        <ResponsiveContainer>
          <ComposedChart data={data} margin={{ top: 8, right: 16, bottom: 24, left: 16 }}>
            <CartesianGrid stroke={token.colorBorder} />
            <XAxis
              dataKey="t"
              type="number"
              domain={['dataMin', 'dataMax']}
              tickFormatter={(value: number) => display.fixed(value, span === 0 ? 0 : 1)}
              label={{
                value: `Time since filling (${time.unit})`,
                position: 'insideBottom',
                offset: -12,
              }}
            />
            <YAxis
              domain={['auto', 'auto']}
              tickFormatter={(value: number) => display.number(value, { significantDigits: 3 })}
              label={{
                value: `Net lift (${mass.unit})`,
                angle: -90,
                position: 'insideLeft',
                offset: -4,
              }}
            />
            <Tooltip
              formatter={(value) =>
                typeof value === 'number'
                  ? `${display.number(value, { significantDigits: 4 })} ${mass.unit}`
                  : String(value)
              }
              labelFormatter={(label) => `${display.fixed(Number(label), 2)} ${time.unit}`}
            />
            <Legend verticalAlign="top" />
            {hasPrediction ? (
              <Line
                dataKey="predicted"
                name="Predicted at the logged air"
                stroke={token.colorText}
                strokeDasharray="6 3"
                dot={false}
                isAnimationActive={false}
              />
            ) : null}
            <Scatter
              dataKey="measured"
              name="Measured"
              fill={token.colorPrimary}
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
    </Card>
  );
}
