import type { CalculationResult, KindDescription } from '@loftwright/buoyancy';

/** POST /api/evaluate: any kind, nothing saved. */
export interface EvaluateBody {
  kind: string;
  inputs: unknown;
}

export type Evaluation = CalculationResult & { kind: string; engineVersion: string };

/** GET /api/kinds: the engine's kinds with their inputs as JSON Schema. */
export interface KindCatalogue {
  engineVersion: string;
  kinds: KindDescription[];
}
