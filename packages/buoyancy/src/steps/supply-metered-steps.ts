import { type Derivation, v } from '../derivation.js';
import type { GasSupplyValues } from '../kinds/gas-supply.kind.js';
import { SOURCES } from '../sources.js';

const J_PER_WH = 3600;

/** Metered energy per litre of gas, and its electricity cost per cubic metre when priced. */
export function deriveMeteredSupply(
  d: Derivation,
  measured: NonNullable<GasSupplyValues['measured']>,
  prices: GasSupplyValues['prices'],
): void {
  const whPerL = d.step({
    id: 'measured-specific-energy',
    label: 'Metered energy per litre of gas',
    formula: 'e = E / V',
    values: [v('E', measured.energyJ / J_PER_WH, 'Wh'), v('V', measured.volumeM3 * 1000, 'L')],
    result: v('e', measured.energyJ / J_PER_WH / (measured.volumeM3 * 1000), 'Wh/L'),
    source: SOURCES.measured,
  });
  d.output('measuredSpecificEnergy', 'Metered energy per litre', 'measured-specific-energy');
  if (prices?.electricityPerKWh === undefined) return;
  const currency = prices.currency;
  // Wh/L and kWh/m³ are the same number.
  d.step({
    id: 'measured-cost-per-m3',
    label: 'Electricity cost per cubic metre (metered)',
    formula: 'c = e·price',
    values: [v('e', whPerL, 'kWh/m³'), v('price', prices.electricityPerKWh, `${currency}/kWh`)],
    result: v('c', whPerL * prices.electricityPerKWh, `${currency}/m³`),
    source: 'energy × price',
  });
  d.output('measuredCostPerM3', 'Metered electricity cost per m³', 'measured-cost-per-m3');
}
