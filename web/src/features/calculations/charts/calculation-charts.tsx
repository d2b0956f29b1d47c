import { type CalculationResult, kindCapabilities, type UnitSystem } from '@loftwright/buoyancy';
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
  // Which charts a kind has is the engine's to say (kindCapabilities), not a switch on its id.
  const offered = kindCapabilities(kind).charts;
  const sweeps = useMemo(
    () => [
      ...(offered.includes('lift-sweeps')
        ? [sizeSweep(inputs), airTemperatureSweep(inputs), puritySweep(inputs)]
        : []),
      ...(offered.includes('sizing-sweep')
        ? [sizingSweep(inputs, result.outputs.size?.value)]
        : []),
    ],
    [offered, inputs, result],
  );
  const charts = [
    ...sweeps.map((sweep) =>
      sweep ? <SweepChart key={sweep.id} sweep={sweep} unitSystem={unitSystem} /> : null,
    ),
    result.series ? (
      <FlightChart key="flight" series={result.series} outputs={result.outputs} />
    ) : null,
    offered.includes('supply-cost') ? (
      <SupplyCostChart key="cost" result={result} inputs={inputs} />
    ) : null,
  ].filter((chart) => chart !== null);
  if (charts.length === 0) return null;
  return <section aria-label="Charts">{charts}</section>;
}
