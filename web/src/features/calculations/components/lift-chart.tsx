import { Card, theme } from 'antd';
import { evaluate, type UnitSystem, convertFromSI } from '@loftwright/buoyancy';
import { useMemo } from 'react';
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

interface Point {
  diameter: number;
  net: number;
  free: number;
}

/**
 * Net and free lift of the same envelope at other diameters, the design point marked: how much
 * margin a bigger or smaller envelope buys. For spheres given by their diameter.
 */
export function LiftChart({
  kind,
  inputs,
  unitSystem,
}: {
  kind: string;
  inputs: Record<string, unknown>;
  unitSystem: UnitSystem;
}) {
  const { token } = theme.useToken();
  const envelope = inputs.envelope as { shape?: string; diameterM?: number } | undefined;
  const diameterM = envelope?.shape === 'sphere' ? envelope.diameterM : undefined;
  const lengthUnit = unitSystem === 'us' ? 'ft' : 'm';
  const massUnit = unitSystem === 'us' ? 'lb' : 'kg';
  const points = useMemo(() => {
    if (kind !== 'lift-check' || diameterM === undefined) return [];
    const result: Point[] = [];
    for (let index = 0; index <= 60; index += 1) {
      const d = diameterM * (0.4 + (1.6 * index) / 60);
      try {
        const outputs = evaluate(kind, {
          ...inputs,
          envelope: { shape: 'sphere', diameterM: d },
        }).outputs;
        result.push({
          diameter: convertFromSI(d, 'length', lengthUnit),
          net: convertFromSI(outputs.netLift?.value ?? 0, 'mass', massUnit),
          free: convertFromSI(outputs.freeLift?.value ?? 0, 'mass', massUnit),
        });
      } catch {
        // Sizes outside the model's range are left out of the curve.
      }
    }
    return result;
  }, [kind, inputs, diameterM, lengthUnit, massUnit]);
  if (points.length === 0 || diameterM === undefined) return null;
  const design = evaluate(kind, inputs).outputs;
  const x = convertFromSI(diameterM, 'length', lengthUnit);
  const y = convertFromSI(design.freeLift?.value ?? 0, 'mass', massUnit);
  return (
    <Card title="Lift against diameter" size="small" style={{ marginTop: 16 }}>
      <div
        style={{ width: '100%', height: 260 }}
        role="img"
        aria-label={`Net and free lift against envelope diameter; design point ${x.toFixed(2)} ${lengthUnit}, free lift ${y.toFixed(3)} ${massUnit}`}
      >
        <ResponsiveContainer>
          <LineChart data={points} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
            <CartesianGrid stroke={token.colorBorder} />
            <XAxis
              dataKey="diameter"
              type="number"
              domain={['dataMin', 'dataMax']}
              tickFormatter={(value: number) => value.toFixed(1)}
              label={{ value: `Diameter (${lengthUnit})`, position: 'insideBottom', offset: -12 }}
            />
            <YAxis
              tickFormatter={(value: number) => value.toFixed(2)}
              label={{ value: `Lift (${massUnit})`, angle: -90, position: 'insideLeft' }}
            />
            <Tooltip
              formatter={(value) =>
                typeof value === 'number' ? `${value.toFixed(3)} ${massUnit}` : String(value)
              }
              labelFormatter={(label) => `${Number(label).toFixed(2)} ${lengthUnit}`}
            />
            <Legend verticalAlign="top" />
            <Line
              type="monotone"
              dataKey="net"
              name="Net lift"
              stroke={token.colorPrimary}
              dot={false}
              isAnimationActive={false}
            />
            <Line
              type="monotone"
              dataKey="free"
              name="Free lift"
              stroke={token.colorText}
              strokeDasharray="4 2"
              dot={false}
              isAnimationActive={false}
            />
            <ReferenceLine y={0} stroke={token.colorError} />
            <ReferenceLine x={x} stroke={token.colorWarning} strokeDasharray="3 3" />
            <ReferenceLine y={y} stroke={token.colorWarning} strokeDasharray="3 3" />
            <ReferenceDot x={x} y={y} r={5} fill={token.colorWarning} stroke="none" />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </Card>
  );
}
