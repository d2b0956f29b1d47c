import type { EnvelopeSizingValues } from '../kinds/envelope-sizing.kind.js';

/** Largest launch diameter a flight profile's stretching envelope takes [m] (its input range). */
export const FLIGHT_LAUNCH_DIAMETER_MAX_M = 20;

/**
 * Whether a sizing's envelope is a stretching (latex) one: a sphere given by its mass, as such
 * envelopes are sold, no wider than a flight profile launches. One rule for the design chain (it
 * continues such a sizing as a stretching envelope) and the fill card (which then lets it take
 * more gas than the sized volume), so the two never disagree.
 * @param sizeM the sizing's solved diameter [m]
 */
export function sizingEnvelopeStretches(
  sizing: Pick<EnvelopeSizingValues, 'shape' | 'envelopeMass'>,
  sizeM: number,
): boolean {
  return (
    sizing.shape.shape === 'sphere' &&
    sizing.envelopeMass.kind === 'fixed' &&
    sizeM <= FLIGHT_LAUNCH_DIAMETER_MAX_M
  );
}
