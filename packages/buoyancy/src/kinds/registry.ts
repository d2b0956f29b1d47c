import * as z from 'zod';
import type { CalculationResult } from '../derivation.js';
import { InputError } from '../errors.js';
import type { ReadableOptions } from '../schema/field-info.js';
import { parseInputs } from '../schema/parse-inputs.js';
import { plausibilityNotes } from '../schema/plausibility.js';
import { ambientAirKind } from './ambient-air.kind.js';
import { balloonRulesKind } from './balloon-rules.kind.js';
import { envelopeGeometryKind } from './envelope-geometry.kind.js';
import { envelopeSizingKind } from './envelope-sizing.kind.js';
import { flightProfileKind } from './flight-profile.kind.js';
import { gasSupplyKind } from './gas-supply.kind.js';
import { type CalculationKind, type KindCapabilities, NO_CAPABILITIES } from './kind.js';
import { liftCheckKind } from './lift-check.kind.js';
import { liftingGasKind } from './lifting-gas.kind.js';
import { libraryEnvelopeMapping } from '../library/apply-library-envelope.js';
import { liftMeasurementKind } from './lift-measurement.kind.js';

const KIND_LIST = [
  ambientAirKind,
  liftingGasKind,
  envelopeGeometryKind,
  liftCheckKind,
  envelopeSizingKind,
  liftMeasurementKind,
  flightProfileKind,
  gasSupplyKind,
  balloonRulesKind,
] as const;

export type KindId = (typeof KIND_LIST)[number]['id'];

/** A kind as other programs see it: id, title, what it does, and its inputs as JSON Schema. */
export interface KindDescription {
  readonly id: string;
  readonly title: string;
  readonly description: string;
  /** JSON Schema (draft 2020-12) of the inputs; numbers carry `unit`, `minimum`, `maximum`. */
  readonly inputSchema: Record<string, unknown>;
  readonly example: unknown;
  readonly capabilities: KindCapabilities;
}

const byId = new Map<string, CalculationKind>(
  KIND_LIST.map((kind) => [kind.id, kind as unknown as CalculationKind]),
);

const jsonSchemas = new Map<string, Record<string, unknown>>();

/** A kind's inputs as JSON Schema, built once: evaluate reads it on every call. */
function jsonSchemaOf(kind: CalculationKind): Record<string, unknown> {
  let schema = jsonSchemas.get(kind.id);
  if (!schema) {
    schema = z.toJSONSchema(kind.schema, { io: 'input', unrepresentable: 'any' }) as Record<
      string,
      unknown
    >;
    jsonSchemas.set(kind.id, schema);
  }
  return schema;
}

/**
 * A kind as other programs see it. Everything the web and the API show of a kind (its form, units,
 * ranges, capabilities) comes from this, so a new kind needs no code outside the engine.
 */
export function describeKind(kind: CalculationKind): KindDescription {
  return {
    id: kind.id,
    title: kind.title,
    description: kind.description,
    get inputSchema() {
      // A fresh copy each time: callers may not change the one evaluate reads.
      return JSON.parse(JSON.stringify(jsonSchemaOf(kind))) as Record<string, unknown>;
    },
    example: kind.example,
    capabilities: capabilitiesOf(kind),
  };
}

/** A kind's own capabilities, with whether a library envelope can fill its inputs. */
function capabilitiesOf(kind: CalculationKind): KindCapabilities {
  const declared = kind.capabilities ?? NO_CAPABILITIES;
  return libraryEnvelopeMapping(kind.id) ? { ...declared, libraryEnvelope: true } : declared;
}

/** Every calculation kind the engine offers. */
export const KINDS: readonly KindDescription[] = KIND_LIST.map((kind) =>
  describeKind(kind as unknown as CalculationKind),
);

export const KIND_IDS = KIND_LIST.map((kind) => kind.id) as readonly KindId[];

export function isKindId(value: unknown): value is KindId {
  return typeof value === 'string' && byId.has(value);
}

export interface EvaluateOptions {
  /**
   * Units and number format the "check this" notes are written in: the reader's, in a browser.
   * Without it they are written in SI with a decimal point, as the server records them.
   */
  readonly display?: ReadableOptions;
}

/**
 * Evaluates a calculation of the given kind: validates the inputs against the kind's schema
 * (defaults filled in), computes outputs, derivation steps and warnings, and adds a "check this"
 * note for every value outside what the trade usually meets.
 * @throws InputError naming the field for an unknown kind or any invalid input
 */
export function evaluate(
  kindId: string,
  inputs: unknown,
  options: EvaluateOptions = {},
): CalculationResult {
  const kind = byId.get(kindId);
  if (!kind) {
    throw new InputError('kind', kindId, `must be one of: ${[...byId.keys()].join(', ')}`);
  }
  return evaluateKind(kind, inputs, options);
}

/** Evaluates inputs with a kind definition itself, as `evaluate` does with a registered one. */
export function evaluateKind(
  kind: CalculationKind,
  inputs: unknown,
  options: EvaluateOptions = {},
): CalculationResult {
  const parsed = parseInputs(kind.schema, inputs);
  const result = kind.compute(parsed);
  const notes = plausibilityNotes(jsonSchemaOf(kind), parsed, options.display);
  return notes.length === 0 ? result : { ...result, warnings: [...result.warnings, ...notes] };
}

/** Inputs with every default filled in, as the engine reads them (for storage and diffs). */
export function normaliseInputs(kindId: string, inputs: unknown): unknown {
  const kind = byId.get(kindId);
  if (!kind) throw new InputError('kind', kindId, `must be one of: ${[...byId.keys()].join(', ')}`);
  return parseInputs(kind.schema, inputs);
}

/** What a kind offers besides its results; nothing for an id the engine does not know. */
export function kindCapabilities(id: string): KindCapabilities {
  const kind = byId.get(id);
  return kind ? capabilitiesOf(kind) : NO_CAPABILITIES;
}
