/** How an envelope behaves as it climbs: it stretches until it bursts, or it keeps its volume. */
export const LIBRARY_ENVELOPE_KINDS = ['extensible', 'fixed'] as const;
export type LibraryEnvelopeKind = (typeof LIBRARY_ENVELOPE_KINDS)[number];

/**
 * The figures of an envelope a team keeps on its shelf, as the calculations read them. SI units;
 * the film and notes stay with the library and never reach a calculation.
 */
export interface LibraryEnvelope {
  readonly kind: LibraryEnvelopeKind;
  /** Mass of the empty envelope [kg]. */
  readonly massKg: number;
  /** Diameter at which an extensible envelope bursts [m]; null for a fixed one. */
  readonly burstDiameterM: number | null;
  /** Superpressure a fixed envelope is rated to hold [Pa]; null for an extensible one. */
  readonly ratedSuperpressurePa: number | null;
  /** Drag coefficient on the frontal area [1]; null when the team has none for it. */
  readonly dragCoefficient: number | null;
}

/**
 * Ranges a library envelope's figures must lie in: the widest any calculation taking them accepts
 * (the flight profile's envelope mass, burst diameter and drag coefficient), so an envelope the
 * library keeps never fails a calculation's own range check once chosen.
 */
export const LIBRARY_ENVELOPE_RANGES = {
  massKg: { min: 0, max: 1000 },
  burstDiameterM: { min: 0.2, max: 50 },
  dragCoefficient: { min: 0.05, max: 2 },
  // A fixed envelope's rating: above zero, up to 10 bar (far beyond any film envelope).
  ratedSuperpressurePa: { min: 1, max: 1_000_000 },
} as const;
