import { theme } from 'antd';
import type { CalculationResult } from '@loftwright/buoyancy';
import {
  Bar,
  BarChart,
  CartesianGrid,
  LabelList,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { ChartFrame } from './chart-frame';
import { supplyCostsPerFill } from './supply-costs';
import { usePlainNumbers } from '@/components/reading/use-number-display';

/** What one fill costs from each priced source, side by side. */
export function SupplyCostChart({
  result,
  inputs,
  title = 'Cost per fill by source',
  axisLabel = 'Cost per fill',
}: {
  result: CalculationResult;
  inputs: Parameters<typeof supplyCostsPerFill>[1];
  title?: string;
  axisLabel?: string;
}) {
  const { token } = theme.useToken();
  const display = usePlainNumbers();
  const { currency, costs } = supplyCostsPerFill(result, inputs);
  if (costs.length === 0) return null;
  const money = (value: number) => `${display.fixed(value, 2)} ${currency}`;
  const description = `${title}: ${costs
    .map((cost) => `${cost.source} ${money(cost.perFill)}`)
    .join('; ')}`;
  return (
    <ChartFrame title={title} description={description} testId="supply-cost">
      <ResponsiveContainer>
        <BarChart data={costs} margin={{ top: 20, right: 16, bottom: 8, left: 16 }}>
          <CartesianGrid stroke={token.colorBorder} vertical={false} />
          <XAxis dataKey="source" interval={0} tick={{ fontSize: 11 }} />
          <YAxis
            tickFormatter={(value: number) => display.fixed(value, value < 10 ? 1 : 0)}
            label={{
              value: `${axisLabel} (${currency})`,
              angle: -90,
              position: 'insideLeft',
              offset: -4,
            }}
          />
          <Tooltip
            formatter={(value) => (typeof value === 'number' ? money(value) : String(value))}
          />
          <Bar
            dataKey="perFill"
            name="Cost per fill"
            fill={token.colorPrimary}
            isAnimationActive={false}
          >
            <LabelList
              dataKey="perFill"
              position="top"
              formatter={(value: unknown) =>
                typeof value === 'number' ? display.fixed(value, 2) : ''
              }
            />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
