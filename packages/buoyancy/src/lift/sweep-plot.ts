import { niceAxis, tickDecimals } from '../units/nice-axis.js';
import type { Dimension, UnitSystem } from '../units/dimensions.js';
import { formatQuantity } from '../units/quantity-text.js';
import type { LiftSweep } from './lift-sweeps.js';

/** One axis of a sweep's chart, in the reader's unit: its span, round ticks and their decimals. */
export interface PlotAxis {
  /** Quantity and unit, for the axis title: "Diameter (ft)". */
  readonly label: string;
  readonly unit: string;
  readonly domain: readonly [number, number];
  readonly ticks: readonly number[];
  /** Decimals that tell neighbouring ticks apart. */
  readonly decimals: number;
}

/** A sweep ready to draw in one unit system: every value converted, axes laid out. */
export interface SweepPlot {
  readonly x: PlotAxis;
  readonly y: PlotAxis;
  /** The curve in the axes' units: net and free lift at each x. */
  readonly points: readonly { readonly x: number; readonly net: number; readonly free: number }[];
  /** The design point: its x and its free lift. */
  readonly design: { readonly x: number; readonly y: number };
  /** Free lift the design asks for, where it asks for one. */
  readonly target?: number;
}

/** A quantity's unit for a whole axis, picked by the size of a typical value on it. */
function axisUnit(typicalSI: number, dimension: Dimension, unitSystem: UnitSystem) {
  const { unitName, unit } = formatQuantity(typicalSI, dimension, unitSystem);
  const convert = (valueSI: number) =>
    formatQuantity(valueSI, dimension, unitSystem, { unit: unitName }).value;
  return { unit, convert };
}

/**
 * Lays out a lift sweep for a chart in the reader's units: the x unit picked by the design point,
 * the lift unit by the largest net lift, a lift axis on round numbers that always shows zero (and
 * the wanted free lift), and round x ticks inside the curve's span, so the curve fills the plot
 * and the design point's guides reach the axes. The web charts and the printed sign-off sheet
 * draw from the same layout. Undefined for a curve of fewer than two points.
 */
export function sweepPlot(sweep: LiftSweep, unitSystem: UnitSystem): SweepPlot | undefined {
  if (sweep.points.length < 2) return undefined;
  const x = axisUnit(sweep.design.x, sweep.xDimension, unitSystem);
  const largestLiftKg = Math.max(...sweep.points.map((point) => Math.abs(point.netKg)));
  const lift = axisUnit(largestLiftKg, 'mass', unitSystem);
  const points = sweep.points.map((point) => ({
    x: x.convert(point.x),
    net: lift.convert(point.netKg),
    free: lift.convert(point.freeKg),
  }));
  const target = sweep.targetFreeKg === undefined ? undefined : lift.convert(sweep.targetFreeKg);
  const ys = points.flatMap((point) => [point.net, point.free]).concat(0, target ?? 0);
  const yAxis = niceAxis(Math.min(...ys), Math.max(...ys));
  const xDomain: [number, number] = [points[0]?.x ?? 0, points.at(-1)?.x ?? 1];
  const xTicks = niceAxis(xDomain[0], xDomain[1], 6).ticks.filter(
    (tick) => tick >= xDomain[0] - 1e-9 && tick <= xDomain[1] + 1e-9,
  );
  return {
    x: {
      label: `${sweep.xLabel} (${x.unit})`,
      unit: x.unit,
      domain: xDomain,
      ticks: xTicks,
      decimals: tickDecimals(xTicks),
    },
    y: {
      label: `Lift (${lift.unit})`,
      unit: lift.unit,
      domain: yAxis.domain,
      ticks: yAxis.ticks,
      decimals: tickDecimals(yAxis.ticks),
    },
    points,
    design: { x: x.convert(sweep.design.x), y: lift.convert(sweep.design.freeKg) },
    ...(target === undefined ? {} : { target }),
  };
}
