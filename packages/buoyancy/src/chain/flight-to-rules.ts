import { InputError } from '../errors.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { evaluate } from '../kinds/registry.js';
import type { Continuation, ContinuationDraft } from './continuation-types.js';
import { exampleValue } from './source-values.js';
import { withValueAtPath } from './path-values.js';

const AREA_PATH = 'packages.0.smallestSurfaceAreaM2';

/** Whether the rules check refuses these inputs for want of the package's smallest surface area. */
function asksForArea(inputs: Record<string, unknown>): boolean {
  try {
    evaluate('balloon-rules', inputs);
    return false;
  } catch (error) {
    if (error instanceof InputError && error.field === AREA_PATH) return true;
    throw error;
  }
}

/**
 * A flight's payload becomes the rules check's one package, of a free balloon. The flight knows
 * no jurisdiction, so the person picks it; a package heavy enough for the rules to ask its
 * smallest surface area gets the example area, also to be replaced.
 */
export function flightToRules(fromInputs: unknown): ContinuationDraft {
  const flight = fromInputs as FlightProfileValues;
  const inputs: Record<string, unknown> = {
    profileId: exampleValue('balloon-rules', 'profileId'),
    operation: 'free',
    packages: [{ massKg: flight.payloadMassKg }],
  };
  const needsArea = asksForArea(inputs);
  return {
    inputs: needsArea
      ? (withValueAtPath(inputs, AREA_PATH, exampleValue('balloon-rules', AREA_PATH)) as Record<
          string,
          unknown
        >)
      : inputs,
    filled: ['operation', 'packages.0.massKg'],
    needs: needsArea ? ['profileId', AREA_PATH] : ['profileId'],
    notes: [
      'Package 1 is the flight’s whole payload (payload, parachute and line). Split it if it hangs as several packages, and give each one’s smallest surface area where the rules ask for it.',
      'Pick the jurisdiction you fly in; the aviation authority there decides.',
    ],
  };
}

export const FLIGHT_TO_RULES: Continuation = {
  fromKind: 'flight-profile',
  toKind: 'balloon-rules',
  title: 'Balloon rules check',
  map: flightToRules,
};
