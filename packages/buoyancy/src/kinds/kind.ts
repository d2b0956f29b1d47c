import type * as z from 'zod';
import type { CalculationResult } from '../derivation.js';

/** Charts the web draws for a kind beyond a flight's series (which any kind with `series` gets). */
export type KindChart = 'lift-sweeps' | 'sizing-sweep' | 'supply-cost' | 'drift-track';

/**
 * What a kind offers besides its results, so the web and the API read it here rather than
 * switching on kind ids.
 */
export interface KindCapabilities {
  /** Charts drawn from its inputs and results. */
  readonly charts: readonly KindChart[];
  /** The result that is an envelope volume a gas plan can fill, if it gives one. */
  readonly volumeOutput?: string;
  /** Fill logs of it compare the measured lift with its predicted net lift. */
  readonly predictsFillLift: boolean;
  /** Its metered energy can be read from an energy-meter log (CSV). */
  readonly meterImport: boolean;
  /** A landing area can be drawn for it (repeated flights with varied inputs; needs its wind). */
  readonly landingArea: boolean;
  /**
   * An envelope from the team's library can fill its inputs (`applyLibraryEnvelope`). Set by the
   * registry from the library's own mapping (library/apply-library-envelope.ts), so the flag and
   * the fields it fills cannot disagree; absent means no.
   */
  readonly libraryEnvelope?: boolean;
  /** A fill card for the crew can be printed from it (fill-card/fill-card.ts); absent means no. */
  readonly fillCard?: boolean;
}

export const NO_CAPABILITIES: KindCapabilities = {
  charts: [],
  predictsFillLift: false,
  meterImport: false,
  landingArea: false,
};

/** One kind of calculation: its inputs (schema with ranges and units), an example, and its rule. */
export interface CalculationKind<S extends z.ZodType = z.ZodType> {
  readonly id: string;
  readonly title: string;
  readonly description: string;
  readonly schema: S;
  /** A valid input, for documentation, forms and tests. Not demo data. */
  readonly example: z.input<S>;
  /** What it offers besides results; none when left out. */
  readonly capabilities?: KindCapabilities;
  compute(inputs: z.output<S>): CalculationResult;
}

export function defineKind<S extends z.ZodType>(kind: CalculationKind<S>): CalculationKind<S> {
  return kind;
}
