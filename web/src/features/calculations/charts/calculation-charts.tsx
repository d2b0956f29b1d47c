import {
  type CalculationResult,
  kindCapabilities,
  type LandingArea,
  liftSweeps,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useMemo } from 'react';
import { FlightChart } from './flight-chart';
import { SupplyCostChart } from '@/components/charts/supply-cost-chart';
import { SweepChart } from './sweep-chart';
import { TrackChart } from './track-chart';

type Inputs = Record<string, unknown>;

/**
 * The pictures that fit a kind's result: lift sweeps, the flight profile and its drift track
 * (with the landing area once estimated), supply costs.
 */
export function CalculationCharts({
  kind,
  inputs,
  result,
  unitSystem,
  landingArea,
}: {
  kind: string;
  inputs: Inputs;
  result: CalculationResult;
  unitSystem: UnitSystem;
  /** The landing area estimated for these inputs, drawn on the drift track. */
  landingArea?: LandingArea;
}) {
  // Which charts a kind has is the engine's to say (kindCapabilities), not a switch on its id.
  const offered = kindCapabilities(kind).charts;
  // The engine's sweeps, on its fast path: the lift check's curves, or a sizing's.
  const sweeps = useMemo(
    () => liftSweeps(kind, inputs, result.outputs),
    [kind, inputs, result.outputs],
  );
  const charts = [
    ...sweeps.map((sweep) => <SweepChart key={sweep.id} sweep={sweep} unitSystem={unitSystem} />),
    result.series ? (
      <FlightChart key="flight" series={result.series} outputs={result.outputs} />
    ) : null,
    offered.includes('drift-track') && result.series?.track ? (
      <TrackChart
        key="track"
        series={result.series.track}
        outputs={result.outputs}
        unitSystem={unitSystem}
        landingArea={landingArea}
      />
    ) : null,
    offered.includes('supply-cost') ? (
      <SupplyCostChart key="cost" result={result} inputs={inputs} />
    ) : null,
  ].filter((chart) => chart !== null);
  if (charts.length === 0) return null;
  return <section aria-label="Charts">{charts}</section>;
}
