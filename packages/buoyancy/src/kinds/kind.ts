import type * as z from 'zod';
import type { CalculationResult } from '../derivation.js';

/** One kind of calculation: its inputs (schema with ranges and units), an example, and its rule. */
export interface CalculationKind<S extends z.ZodType = z.ZodType> {
  readonly id: string;
  readonly title: string;
  readonly description: string;
  readonly schema: S;
  /** A valid input, for documentation, forms and tests. Not demo data. */
  readonly example: z.input<S>;
  compute(inputs: z.output<S>): CalculationResult;
}

export function defineKind<S extends z.ZodType>(kind: CalculationKind<S>): CalculationKind<S> {
  return kind;
}
