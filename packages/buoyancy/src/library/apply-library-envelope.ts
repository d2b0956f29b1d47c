import { InputError } from '../errors.js';
import type { LibraryEnvelope, LibraryEnvelopeKind } from './library-envelope.js';

type Inputs = Record<string, unknown>;

/** What a kind takes from a library envelope: which kinds of envelope, and into which inputs. */
export interface LibraryEnvelopeMapping {
  /** Kinds of envelope the calculation can describe. */
  readonly accepts: readonly LibraryEnvelopeKind[];
  /** Input paths (dotted) the envelope fills, for the editor to point out. */
  readonly fields: readonly string[];
  apply(inputs: Inputs, envelope: LibraryEnvelope): Inputs;
}

const asObject = (value: unknown): Inputs =>
  typeof value === 'object' && value !== null && !Array.isArray(value) ? (value as Inputs) : {};

/** The envelope's drag coefficient where it has one; the inputs' own value otherwise. */
const withDrag = (target: Inputs, envelope: LibraryEnvelope): Inputs =>
  envelope.dragCoefficient === null
    ? target
    : { ...target, dragCoefficient: envelope.dragCoefficient };

/**
 * The flight profile: a stretching envelope's burst diameter, mass and drag. The launch diameter
 * is how full the team fills it, not a property of the envelope, so it stays as typed (and is left
 * for the person to type when the inputs described a fixed envelope before).
 */
const flightProfile: LibraryEnvelopeMapping = {
  accepts: ['extensible'],
  fields: ['envelope.burstDiameterM', 'envelopeMassKg', 'dragCoefficient'],
  apply(inputs, envelope) {
    if (envelope.burstDiameterM === null) {
      throw new InputError('envelope.burstDiameterM', null, 'is needed for a flight profile');
    }
    const current = asObject(inputs.envelope);
    const launch =
      current.kind === 'extensible' ? { launchDiameterM: current.launchDiameterM } : {};
    return withDrag(
      {
        ...inputs,
        envelope: { kind: 'extensible', ...launch, burstDiameterM: envelope.burstDiameterM },
        envelopeMassKg: envelope.massKg,
      },
      envelope,
    );
  },
};

/** The lift check: the envelope's mass as a known mass (its shape and size stay as typed). */
const liftCheck: LibraryEnvelopeMapping = {
  accepts: ['extensible', 'fixed'],
  fields: ['envelopeMass.massKg'],
  apply: (inputs, envelope) => ({
    ...inputs,
    envelopeMass: { kind: 'fixed', massKg: envelope.massKg },
  }),
};

/**
 * The sizing: the envelope's mass as a known mass, and its drag where the target is an ascent
 * rate (a free-lift target has no drag to fill).
 */
const envelopeSizing: LibraryEnvelopeMapping = {
  accepts: ['extensible', 'fixed'],
  fields: ['envelopeMass.massKg', 'target.dragCoefficient'],
  apply(inputs, envelope) {
    const target = asObject(inputs.target);
    return {
      ...inputs,
      envelopeMass: { kind: 'fixed', massKg: envelope.massKg },
      ...(target.kind === 'ascentRate' ? { target: withDrag(target, envelope) } : {}),
    };
  },
};

/** Every kind that takes a library envelope; the kinds declare `libraryEnvelope` to match. */
export const LIBRARY_ENVELOPE_MAPPINGS: Readonly<Record<string, LibraryEnvelopeMapping>> = {
  'flight-profile': flightProfile,
  'lift-check': liftCheck,
  'envelope-sizing': envelopeSizing,
};

/** What a kind takes from a library envelope; undefined for a kind with no envelope figures. */
export function libraryEnvelopeMapping(kindId: string): LibraryEnvelopeMapping | undefined {
  return Object.hasOwn(LIBRARY_ENVELOPE_MAPPINGS, kindId)
    ? LIBRARY_ENVELOPE_MAPPINGS[kindId]
    : undefined;
}

/**
 * New inputs for a calculation of `kindId` with a library envelope's figures (SI) in the fields
 * its kind maps; every other input is kept as given. The result is what a person then sees and
 * may change in the form; the engine's usual range checks apply when it is evaluated.
 * @throws InputError on `kind` for a kind that takes no envelope, on `envelope` for an envelope
 *   the kind cannot describe (a fixed envelope in a flight profile's stretching model)
 */
export function applyLibraryEnvelope(
  kindId: string,
  inputs: unknown,
  envelope: LibraryEnvelope,
): Record<string, unknown> {
  const mapping = libraryEnvelopeMapping(kindId);
  if (!mapping) throw new InputError('kind', kindId, 'takes no envelope from the library');
  if (!mapping.accepts.includes(envelope.kind)) {
    throw new InputError(
      'envelope',
      envelope.kind,
      `must be ${mapping.accepts.join(' or ')} for this kind of calculation`,
    );
  }
  return mapping.apply(asObject(inputs), envelope);
}
