import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { evaluate, kindCapabilities, KINDS, normaliseInputs } from '../kinds/registry.js';
import { applyLibraryEnvelope, LIBRARY_ENVELOPE_MAPPINGS } from './apply-library-envelope.js';
import { LIBRARY_ENVELOPE_RANGES, type LibraryEnvelope } from './library-envelope.js';

const stretching: LibraryEnvelope = {
  kind: 'extensible',
  massKg: 0.3,
  burstDiameterM: 4.8,
  ratedSuperpressurePa: null,
  dragCoefficient: 0.4,
};
const fixedFilm: LibraryEnvelope = {
  kind: 'fixed',
  massKg: 0.12,
  burstDiameterM: null,
  ratedSuperpressurePa: 2000,
  dragCoefficient: 0.5,
};

const exampleOf = (kindId: string) => KINDS.find((kind) => kind.id === kindId)?.example;
/** A value at a dotted path of normalised inputs. */
const at = (inputs: unknown, path: string): unknown =>
  path
    .split('.')
    .reduce<unknown>((value, key) => (value as Record<string, unknown> | undefined)?.[key], inputs);

describe('applyLibraryEnvelope', () => {
  it('flags exactly the kinds that map an envelope, and only kinds the engine knows', () => {
    const flagged = KINDS.filter((kind) => kind.capabilities.libraryEnvelope).map(
      (kind) => kind.id,
    );
    expect(flagged.sort()).toEqual(Object.keys(LIBRARY_ENVELOPE_MAPPINGS).sort());
    expect(flagged.sort()).toEqual(['envelope-sizing', 'flight-profile', 'lift-check']);
    expect(kindCapabilities('ambient-air').libraryEnvelope).toBeFalsy();
  });

  it('fills a flight profile’s burst diameter, mass and drag and keeps its launch diameter', () => {
    const inputs = applyLibraryEnvelope('flight-profile', exampleOf('flight-profile'), stretching);
    const read = normaliseInputs('flight-profile', inputs) as Record<string, unknown>;
    expect(read.envelope).toEqual({
      kind: 'extensible',
      launchDiameterM: 1.6,
      burstDiameterM: 4.8,
    });
    expect(read.envelopeMassKg).toBe(0.3);
    expect(read.dragCoefficient).toBe(0.4);
    // Everything else is as the person typed it.
    expect(read.payloadMassKg).toBe(0.9);
  });

  it('keeps the inputs’ drag coefficient when the envelope has none', () => {
    const example = { ...(exampleOf('flight-profile') as object), dragCoefficient: 0.3 };
    const inputs = applyLibraryEnvelope('flight-profile', example, {
      ...stretching,
      dragCoefficient: null,
    });
    expect(inputs.dragCoefficient).toBe(0.3);
  });

  it('refuses a fixed envelope in a flight profile’s stretching model, naming the envelope', () => {
    expect(() =>
      applyLibraryEnvelope('flight-profile', exampleOf('flight-profile'), fixedFilm),
    ).toThrow(InputError);
    expect(() =>
      applyLibraryEnvelope('flight-profile', exampleOf('flight-profile'), fixedFilm),
    ).toThrow(/envelope/);
  });

  it('gives a lift check the envelope’s mass as a known mass, either kind of envelope', () => {
    for (const envelope of [stretching, fixedFilm]) {
      const inputs = applyLibraryEnvelope('lift-check', exampleOf('lift-check'), envelope);
      const read = normaliseInputs('lift-check', inputs);
      expect(at(read, 'envelopeMass')).toEqual({ kind: 'fixed', massKg: envelope.massKg });
      expect(at(read, 'envelope')).toEqual({ shape: 'sphere', diameterM: 1.2 });
      // Net lift = gross lift − envelope mass (Archimedes' principle as the lift check states
      // it), so changing only the mass moves the net lift by exactly the mass difference.
      const before = evaluate('lift-check', exampleOf('lift-check')).outputs.netLift?.value ?? 0;
      const after = evaluate('lift-check', inputs).outputs.netLift?.value ?? 0;
      expect(before - after).toBeCloseTo(envelope.massKg - 0.18, 12);
    }
  });

  it('gives a sizing the mass, and the drag only where its target is an ascent rate', () => {
    const freeLift = applyLibraryEnvelope(
      'envelope-sizing',
      exampleOf('envelope-sizing'),
      fixedFilm,
    );
    const readFree = normaliseInputs('envelope-sizing', freeLift);
    expect(at(readFree, 'envelopeMass')).toEqual({ kind: 'fixed', massKg: 0.12 });
    expect(at(readFree, 'target')).toEqual({ kind: 'freeLift', freeLiftKg: 0.3 });

    const ascent = {
      ...(exampleOf('envelope-sizing') as object),
      target: { kind: 'ascentRate', ascentRateMS: 5 },
    };
    const inputs = applyLibraryEnvelope('envelope-sizing', ascent, stretching);
    expect(at(normaliseInputs('envelope-sizing', inputs), 'target.dragCoefficient')).toBe(0.4);
    expect(evaluate('envelope-sizing', inputs).outputs).toHaveProperty('volume');
  });

  it('keeps an envelope at the edges of the library’s ranges within every kind’s ranges', () => {
    const { massKg, burstDiameterM, dragCoefficient } = LIBRARY_ENVELOPE_RANGES;
    for (const edge of ['min', 'max'] as const) {
      const envelope: LibraryEnvelope = {
        kind: 'extensible',
        massKg: massKg[edge],
        burstDiameterM: burstDiameterM[edge],
        ratedSuperpressurePa: null,
        dragCoefficient: dragCoefficient[edge],
      };
      for (const kindId of Object.keys(LIBRARY_ENVELOPE_MAPPINGS)) {
        const inputs = applyLibraryEnvelope(kindId, exampleOf(kindId), envelope);
        expect(() => normaliseInputs(kindId, inputs), `${kindId} at ${edge}`).not.toThrow();
      }
    }
  });

  it('refuses a kind with no envelope figures, naming the kind', () => {
    expect(() => applyLibraryEnvelope('ambient-air', {}, stretching)).toThrow(/kind/);
  });
});
