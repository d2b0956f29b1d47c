import * as z from 'zod';
import type { CalculationResult } from '../derivation.js';
import { InputError } from '../errors.js';
import { parseInputs } from '../schema/parse-inputs.js';
import { ambientAirKind } from './ambient-air.kind.js';
import { balloonRulesKind } from './balloon-rules.kind.js';
import { envelopeGeometryKind } from './envelope-geometry.kind.js';
import { envelopeSizingKind } from './envelope-sizing.kind.js';
import { flightProfileKind } from './flight-profile.kind.js';
import { gasSupplyKind } from './gas-supply.kind.js';
import type { CalculationKind } from './kind.js';
import { liftCheckKind } from './lift-check.kind.js';
import { liftingGasKind } from './lifting-gas.kind.js';
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
}

const byId = new Map<string, CalculationKind>(
  KIND_LIST.map((kind) => [kind.id, kind as unknown as CalculationKind]),
);

/** Every calculation kind the engine offers. */
export const KINDS: readonly KindDescription[] = KIND_LIST.map((kind) => ({
  id: kind.id,
  title: kind.title,
  description: kind.description,
  get inputSchema() {
    return z.toJSONSchema(kind.schema, { io: 'input', unrepresentable: 'any' }) as Record<
      string,
      unknown
    >;
  },
  example: kind.example,
}));

export const KIND_IDS = KIND_LIST.map((kind) => kind.id) as readonly KindId[];

export function isKindId(value: unknown): value is KindId {
  return typeof value === 'string' && byId.has(value);
}

/**
 * Evaluates a calculation of the given kind: validates the inputs against the kind's schema
 * (defaults filled in), computes outputs, derivation steps and warnings.
 * @throws InputError naming the field for an unknown kind or any invalid input
 */
export function evaluate(kindId: string, inputs: unknown): CalculationResult {
  const kind = byId.get(kindId);
  if (!kind) {
    throw new InputError('kind', kindId, `must be one of: ${[...byId.keys()].join(', ')}`);
  }
  return kind.compute(parseInputs(kind.schema, inputs));
}

/** Inputs with every default filled in, as the engine reads them (for storage and diffs). */
export function normaliseInputs(kindId: string, inputs: unknown): unknown {
  const kind = byId.get(kindId);
  if (!kind) throw new InputError('kind', kindId, `must be one of: ${[...byId.keys()].join(', ')}`);
  return parseInputs(kind.schema, inputs);
}
