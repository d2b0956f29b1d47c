import { InputError } from '../errors.js';
import { KINDS, normaliseInputs } from '../kinds/registry.js';
import type { Continuation, ContinuationDraft, SourceOutputs } from './continuation-types.js';
import { FLIGHT_TO_RULES } from './flight-to-rules.js';
import { SIZING_TO_FLIGHT } from './sizing-to-flight.js';

/** Every way one kind continues into another: the design chain sizing → flight → rules check. */
const CONTINUATIONS: readonly Continuation[] = [SIZING_TO_FLIGHT, FLIGHT_TO_RULES];

/** What the web offers as "Continue as …" for a kind. */
export interface ContinuationTarget {
  readonly toKind: string;
  readonly title: string;
}

/**
 * The kinds a calculation of `kindId` continues into, with the action's title; none for a kind
 * that does not continue (or an id the engine does not know).
 */
export function continuations(kindId: string): readonly ContinuationTarget[] {
  return CONTINUATIONS.filter((entry) => entry.fromKind === kindId).map((entry) => ({
    toKind: entry.toKind,
    title: entry.title,
  }));
}

const kindTitle = (id: string) => KINDS.find((kind) => kind.id === id)?.title ?? id;

function findContinuation(fromKind: string, toKind: string): Continuation {
  const found = CONTINUATIONS.find(
    (entry) => entry.fromKind === fromKind && entry.toKind === toKind,
  );
  if (found) return found;
  const offered = continuations(fromKind).map((entry) => entry.toKind);
  throw new InputError(
    'toKind',
    toKind,
    `a ${kindTitle(fromKind)} does not continue into a ${kindTitle(toKind)}` +
      (offered.length > 0
        ? ` (it continues into: ${offered.join(', ')})`
        : ' (it continues into nothing)'),
  );
}

/**
 * Inputs of `toKind` made from a saved calculation of `fromKind`, validated and with defaults
 * filled in by the target kind's schema, with the paths filled from the source, the paths the
 * person still has to fill (holding the target's example value meanwhile) and notes.
 * @param fromInputs the source version's inputs (validated again here)
 * @param fromOutputs the source version's results, as saved
 * @throws InputError naming `toKind` for a pair that does not continue, or the field the
 *   source's value does not fit in the target (e.g. `envelopeMassKg` over the flight's range)
 */
export function continueInputs(
  fromKind: string,
  toKind: string,
  fromInputs: unknown,
  fromOutputs: SourceOutputs,
): ContinuationDraft {
  const continuation = findContinuation(fromKind, toKind);
  const draft = continuation.map(normaliseInputs(fromKind, fromInputs), fromOutputs);
  return {
    ...draft,
    inputs: normaliseInputs(toKind, draft.inputs) as Record<string, unknown>,
  };
}
