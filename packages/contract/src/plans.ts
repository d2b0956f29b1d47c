import type { CalculationResult, GasPlanInput } from '@loftwright/buoyancy';

/** One kind of envelope in a plan: a saved calculation version, or a volume typed in. */
export interface PlanLineInput {
  label?: string;
  count: number;
  calculationId?: string;
  /** Leave out to take the calculation's latest version. */
  versionNumber?: number;
  diameterM?: number;
  volumeM3?: number;
}

/** POST /api/plans and PUT /api/plans/:id: what a planner enters. */
export interface SavePlanBody {
  title: string;
  /** ISO date (YYYY-MM-DD). */
  eventDate?: string;
  lines: PlanLineInput[];
  fill: GasPlanInput['fill'];
  electrolyser?: GasPlanInput['electrolyser'];
  measured?: GasPlanInput['measured'];
  cylinder?: GasPlanInput['cylinder'];
  prices?: GasPlanInput['prices'];
  /** When the prices were true (ISO date). */
  pricesDate?: string;
}

/** A line as computed: its gas per envelope, the envelopes, and where the volume came from. */
export interface PlanLineResult {
  label: string;
  volumeM3: number;
  count: number;
  totalM3: number;
  calculationId: string | null;
  versionNumber: number | null;
}

/** A saved gas plan and the engine's answer for it. */
export interface Plan {
  id: string;
  ownerId: string;
  title: string;
  eventDate: string;
  inputs: SavePlanBody;
  result: {
    lines: PlanLineResult[];
    totalM3: number;
    outputs: CalculationResult['outputs'];
    steps: CalculationResult['steps'];
    warnings: CalculationResult['warnings'];
  };
  engineVersion: string;
  createdAt: string;
  updatedAt: string;
}
