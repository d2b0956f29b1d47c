import type { CalculationResult } from '../derivation.js';
import { InputError, type InputIssue } from '../errors.js';
import { evaluate } from '../kinds/registry.js';
import type { GasSupplyInput } from '../kinds/gas-supply.kind.js';

/** One kind of envelope in a plan: its gas volume at fill conditions and how many are filled. */
export interface GasPlanLine {
  label: string;
  volumeM3: number;
  count: number;
}

/** A campaign's envelopes and the supply and prices to fill them from. */
export interface GasPlanInput {
  lines: readonly GasPlanLine[];
  fill: { temperatureK: number; pressurePa: number };
  electrolyser?: GasSupplyInput['electrolyser'];
  measured?: GasSupplyInput['measured'];
  cylinder?: GasSupplyInput['cylinder'];
  prices?: GasSupplyInput['prices'];
}

export interface GasPlan {
  lines: (GasPlanLine & { totalM3: number })[];
  totalM3: number;
  /** The gas-supply kind's result for the whole plan: volumes, running time, energy, costs. */
  result: CalculationResult;
}

/**
 * The gas a plan needs, line by line and in all, and what it takes from each source: the lines'
 * volumes are added up and the total is run through the gas-supply kind as one fill.
 */
export function planGas(input: GasPlanInput): GasPlan {
  const issues: InputIssue[] = input.lines.flatMap((line, index) => [
    ...(Number.isFinite(line.volumeM3) && line.volumeM3 > 0
      ? []
      : [
          {
            field: `lines.${index}.volumeM3`,
            value: line.volumeM3,
            reason: 'must be a volume above 0 m³',
          },
        ]),
    ...(Number.isInteger(line.count) && line.count >= 1 && line.count <= 100000
      ? []
      : [
          {
            field: `lines.${index}.count`,
            value: line.count,
            reason: 'must be a whole number from 1 to 100000',
          },
        ]),
  ]);
  if (input.lines.length === 0)
    issues.push({ field: 'lines', value: [], reason: 'needs at least one envelope' });
  if (issues.length > 0) throw new InputError(issues);
  const lines = input.lines.map((line) => ({ ...line, totalM3: line.volumeM3 * line.count }));
  const totalM3 = lines.reduce((sum, line) => sum + line.totalM3, 0);
  let result: CalculationResult;
  try {
    result = evaluate('gas-supply', {
      fill: {
        volumeM3: totalM3,
        temperatureK: input.fill.temperatureK,
        pressurePa: input.fill.pressurePa,
        count: 1,
      },
      ...(input.electrolyser ? { electrolyser: input.electrolyser } : {}),
      ...(input.measured ? { measured: input.measured } : {}),
      ...(input.cylinder ? { cylinder: input.cylinder } : {}),
      ...(input.prices ? { prices: input.prices } : {}),
    });
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    // The total volume is the plan's sum; any other field keeps its name.
    throw new InputError(
      error.issues.map((issue) =>
        issue.field === 'fill.volumeM3'
          ? { ...issue, field: 'lines', reason: `in all ${issue.reason}` }
          : issue,
      ),
    );
  }
  return { lines, totalM3, result };
}
