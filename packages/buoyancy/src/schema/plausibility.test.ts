import { describe, expect, it } from 'vitest';
import { evaluate, KINDS } from '../kinds/registry.js';
import { CHECK_THIS } from './plausibility.js';

const liftCheck = (overrides: Record<string, unknown>) => ({
  envelope: { shape: 'sphere', diameterM: 2 },
  envelopeMass: { kind: 'fixed', massKg: 0.5 },
  payloadMassKg: 1,
  gas: { gasId: 'helium' },
  ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
  ...overrides,
});

const notesOf = (result: ReturnType<typeof evaluate>) =>
  result.warnings.filter((warning) => warning.code === CHECK_THIS);

describe('"check this" notes for values the trade seldom meets', () => {
  it('notes a 120 m envelope, keeps it as typed and computes with it', () => {
    const result = evaluate(
      'lift-check',
      liftCheck({ envelope: { shape: 'sphere', diameterM: 120 } }),
    );
    expect(notesOf(result)).toEqual([
      {
        code: CHECK_THIS,
        severity: 'note',
        field: 'envelope.diameterM',
        message:
          'Check this: Diameter is 120 m, above the usual 100 m (envelopes are seldom larger ' +
          'across). It is kept as typed.',
      },
    ]);
    // V = π·d³/6 (sphere volume, CRC Standard Mathematical Tables): the 120 m itself is used.
    expect(result.outputs.volume?.value).toBeCloseTo((Math.PI * 120 ** 3) / 6, 3);
  });

  it('writes the note in the reader’s units and number format when asked', () => {
    const result = evaluate(
      'lift-check',
      liftCheck({ envelope: { shape: 'sphere', diameterM: 120 } }),
      { display: { unitSystem: 'us', numberFormat: 'comma-space' } },
    );
    // 1 ft = 0.3048 m exactly (NIST SP 811, Appendix B): 120 m = 393.7 ft, 100 m = 328.1 ft.
    expect(notesOf(result)[0]?.message).toBe(
      'Check this: Diameter is 393,7 ft, above the usual 328,1 ft (envelopes are seldom larger ' +
        'across). It is kept as typed.',
    );
  });

  it('notes a heavy payload and hard frost at filling, each by its own field', () => {
    const result = evaluate(
      'lift-check',
      liftCheck({
        payloadMassKg: 150,
        ambient: { mode: 'measured', temperatureK: 228.15, pressurePa: 101325 },
      }),
    );
    const notes = notesOf(result);
    expect(notes.map((note) => note.field).sort()).toEqual([
      'ambient.temperatureK',
      'payloadMassKg',
    ]);
    expect(notes.find((note) => note.field === 'ambient.temperatureK')?.message).toMatch(
      /^Check this: Air temperature is −45 °C, below the usual −40 °C/,
    );
  });

  it('stays quiet at the usual limit itself and for every kind’s own example', () => {
    const atLimit = evaluate(
      'lift-check',
      liftCheck({ envelope: { shape: 'sphere', diameterM: 100 }, payloadMassKg: 100 }),
    );
    expect(notesOf(atLimit)).toEqual([]);
    for (const kind of KINDS) {
      expect({ kind: kind.id, notes: notesOf(evaluate(kind.id, kind.example)) }).toEqual({
        kind: kind.id,
        notes: [],
      });
    }
  });

  it('reads the variant the inputs chose: a radius is held to half the usual diameter', () => {
    const result = evaluate(
      'lift-check',
      liftCheck({ envelope: { shape: 'sphere-radius', radiusM: 60 } }),
    );
    expect(notesOf(result).map((note) => note.field)).toEqual(['envelope.radiusM']);
  });

  it('publishes the usual range beside the allowed one in the JSON Schema', () => {
    const schema = KINDS.find((kind) => kind.id === 'envelope-sizing')?.inputSchema as {
      properties: { payloadMassKg: Record<string, unknown> };
    };
    expect(schema.properties.payloadMassKg).toMatchObject({
      minimum: 0,
      maximum: 10000,
      usualMaximum: 100,
    });
  });
});
