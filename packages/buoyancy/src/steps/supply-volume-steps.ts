import { NORMAL_PRESSURE_PA, NORMAL_TEMPERATURE_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import type { GasSupplyValues } from '../kinds/gas-supply.kind.js';
import { SOURCES } from '../sources.js';

/** The gas all fills take, at fill conditions and at normal conditions (0 °C, 101.325 kPa). */
export interface SupplyVolumes {
  readonly totalVolumeM3: number;
  readonly normalVolumeM3: number;
}

/** The gas needed for every fill, at fill and at normal conditions; publishes both. */
export function deriveSupplyVolumes(d: Derivation, fill: GasSupplyValues['fill']): SupplyVolumes {
  const totalVolumeM3 = d.step({
    id: 'total-volume',
    label: 'Gas needed for all fills, at fill conditions',
    formula: 'V_total = V_fill·n_fills',
    values: [v('V_fill', fill.volumeM3, 'm³'), v('n_fills', fill.count, '')],
    result: v('V_total', fill.volumeM3 * fill.count, 'm³'),
    source: SOURCES.given,
  });
  const normalVolumeM3 = d.step({
    id: 'total-volume-normal',
    label: 'Gas needed at normal conditions (0 °C, 101.325 kPa)',
    formula: 'V_n = V_total·(p / p_n)·(T_n / T)',
    values: [
      v('V_total', totalVolumeM3, 'm³'),
      v('p', fill.pressurePa, 'Pa'),
      v('T', fill.temperatureK, 'K'),
    ],
    result: v(
      'V_n',
      (totalVolumeM3 * fill.pressurePa * NORMAL_TEMPERATURE_K) /
        (NORMAL_PRESSURE_PA * fill.temperatureK),
      'm³',
    ),
    source: SOURCES.normalConditions,
  });
  d.output('totalVolume', 'Gas needed, at fill conditions', 'total-volume');
  d.output('totalVolumeNormal', 'Gas needed, at normal conditions', 'total-volume-normal');
  return { totalVolumeM3, normalVolumeM3 };
}

/** Cost of delivered gas for all fills, priced per normal cubic metre. */
export function deriveBulkGasCost(
  d: Derivation,
  normalVolumeM3: number,
  pricePerM3: number,
  currency: string,
): void {
  d.step({
    id: 'bulk-cost',
    label: 'Delivered gas cost for all fills',
    formula: 'C = V_n·price',
    values: [v('V_n', normalVolumeM3, 'm³'), v('price', pricePerM3, `${currency}/m³`)],
    result: v('C', normalVolumeM3 * pricePerM3, currency),
    source: 'volume × price',
  });
  d.output('bulkCost', 'Delivered gas: cost', 'bulk-cost');
}
