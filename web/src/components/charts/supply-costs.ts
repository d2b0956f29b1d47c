import type { CalculationResult } from '@loftwright/buoyancy';

export interface SourceCost {
  source: string;
  perFill: number;
}

/**
 * Cost of one fill from each source the gas-supply result priced. The engine prices all fills
 * together (whole cylinders for the lot), so one fill's share is the total over the fill count.
 * The metered rate is per cubic metre as measured, taken to be at the fill conditions.
 */
export function supplyCostsPerFill(
  result: CalculationResult,
  inputs: { fill?: { volumeM3?: number; count?: number }; prices?: { currency?: string } },
): { currency: string; costs: SourceCost[] } {
  const count = inputs.fill?.count ?? 1;
  const { outputs } = result;
  const costs: SourceCost[] = [];
  const add = (source: string, perFill: number | undefined) => {
    if (perFill !== undefined && Number.isFinite(perFill)) costs.push({ source, perFill });
  };
  add('Electrolysis', outputs.electrolysisCost && outputs.electrolysisCost.value / count);
  const fillVolumeM3 = inputs.fill?.volumeM3;
  if (outputs.measuredCostPerM3 && fillVolumeM3 !== undefined)
    add('Electrolysis, metered', outputs.measuredCostPerM3.value * fillVolumeM3);
  add('Cylinders', outputs.cylinderCost && outputs.cylinderCost.value / count);
  add('Delivered gas', outputs.bulkCost && outputs.bulkCost.value / count);
  return { currency: inputs.prices?.currency ?? '', costs };
}
