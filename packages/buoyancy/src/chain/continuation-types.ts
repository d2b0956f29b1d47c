import type { CalculationResult } from '../derivation.js';

/** A saved calculation's results, by output name, as a continuation reads them. */
export type SourceOutputs = CalculationResult['outputs'];

/** Inputs of the target kind made from a source, before the engine validates them. */
export interface ContinuationDraft {
  readonly inputs: Record<string, unknown>;
  /** Input paths whose values came from the source; "Take version N" re-maps exactly these. */
  readonly filled: readonly string[];
  /**
   * Input paths the source cannot give. They hold the target kind's example value so the inputs
   * compute, and the person must replace them: the web marks them until a version is saved.
   */
  readonly needs: readonly string[];
  /** What the person should know about the mapping, in words. */
  readonly notes: readonly string[];
}

/** How one kind continues into another. */
export interface Continuation {
  readonly fromKind: string;
  readonly toKind: string;
  /** What the action says: "Continue as <title>". */
  readonly title: string;
  /** Maps the source's normalised inputs and its saved outputs to the target's inputs. */
  map(fromInputs: unknown, fromOutputs: SourceOutputs): ContinuationDraft;
}
