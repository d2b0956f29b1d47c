import type { CalculationResult, UnitSystem } from '@loftwright/buoyancy';
import { useMemo } from 'react';
import { FlightChart } from './flight-chart';
import { airTemperatureSweep, puritySweep, sizeSweep, sizingSweep } from './lift-sweeps';
import { SupplyCostChart } from '@/components/charts/supply-cost-chart';
import { SweepChart } from './sweep-chart';

type Inputs = Record<string, unknown>;

/** The pictures that fit a kind's result: lift sweeps, the flight profile, supply costs. */
export function CalculationCharts({
  kind,
  inputs,
  result,
  unitSystem,
}: {
  kind: string;
  inputs: Inputs;
  result: CalculationResult;
  unitSystem: UnitSystem;
}) {
  const sweeps = useMemo(() => {
    if (kind === 'lift-check')
      return [sizeSweep(inputs), airTemperatureSweep(inputs), puritySweep(inputs)];
    if (kind === 'envelope-sizing') return [sizingSweep(inputs, result.outputs.size?.value)];
    return [];
  }, [kind, inputs, result]);
  const charts = [
    ...sweeps.map((sweep) =>
      sweep ? <SweepChart key={sweep.id} sweep={sweep} unitSystem={unitSystem} /> : null,
    ),
    result.series ? (
      <FlightChart key="flight" series={result.series} outputs={result.outputs} />
    ) : null,
    kind === 'gas-supply' ? <SupplyCostChart key="cost" result={result} inputs={inputs} /> : null,
  ].filter((chart) => chart !== null);
  if (charts.length === 0) return null;
  return <section aria-label="Charts">{charts}</section>;
}
