/**
 * An axis range that starts and ends on round numbers, with its ticks, so the design point's
 * guides can be drawn to the very edge of the plot.
 */
export function niceAxis(
  min: number,
  max: number,
  tickCount = 5,
): { domain: [number, number]; ticks: number[] } {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return { domain: [0, 1], ticks: [0, 1] };
  if (min === max) {
    const pad = Math.abs(min) * 0.1 || 1;
    return niceAxis(min - pad, max + pad, tickCount);
  }
  const rough = (max - min) / tickCount;
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = ([1, 2, 2.5, 5, 10].find((factor) => factor * power >= rough) ?? 10) * power;
  const low = Math.floor(min / step) * step;
  const high = Math.ceil(max / step) * step;
  const ticks: number[] = [];
  // Rounded so that 0.1 + 0.2 shows as 0.3 on the axis.
  for (let tick = low; tick <= high + step / 2; tick += step)
    ticks.push(Number(tick.toPrecision(12)));
  return { domain: [low, high], ticks };
}

/** Decimals that tell neighbouring ticks apart. */
export function tickDecimals(ticks: readonly number[]): number {
  const step = ticks.length > 1 ? Math.abs((ticks[1] ?? 0) - (ticks[0] ?? 0)) : 1;
  const text = String(Number(step.toPrecision(12)));
  if (text.includes('e')) return 6;
  const dot = text.indexOf('.');
  return dot < 0 ? 0 : Math.min(6, text.length - dot - 1);
}
