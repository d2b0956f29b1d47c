import {
  type CalculationResult,
  ENGINE_VERSION,
  evaluate,
  InputError,
  normaliseInputs,
} from '@loftwright/buoyancy';
import { versionFingerprint } from './fingerprint';

export interface VersionContent {
  inputs: Record<string, unknown>;
  outputs: CalculationResult['outputs'];
  steps: CalculationResult['steps'];
  warnings: CalculationResult['warnings'];
  series: CalculationResult['series'] | null;
  engineVersion: string;
  fingerprint: string;
}

/**
 * What a saved version holds, computed here on the server from the inputs alone: inputs with the
 * engine's defaults filled in, outputs, derivation, warnings, the engine version and the content
 * fingerprint. Numbers a client sends are never used. Throws the engine's InputError (422).
 */
export function computeVersionContent(kind: string, inputs: unknown): VersionContent {
  const { normalised, result } = inBodyField('inputs', () => {
    // Every kind's inputs are an object, so what the engine hands back is one.
    const normalisedInputs = normaliseInputs(kind, inputs) as Record<string, unknown>;
    return { normalised: normalisedInputs, result: evaluate(kind, normalisedInputs) };
  });
  return {
    inputs: normalised,
    outputs: result.outputs,
    steps: result.steps,
    warnings: result.warnings,
    series: result.series ?? null,
    engineVersion: ENGINE_VERSION,
    fingerprint: versionFingerprint(normalised, result.outputs, ENGINE_VERSION),
  };
}

/**
 * Runs engine work whose inputs arrived in the request body under `field`, so an InputError names
 * the field as the client sent it (`inputs.ambient.altitudeM`, not `ambient.altitudeM`).
 */
export function inBodyField<T>(field: string, work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    throw new InputError(
      error.issues.map((issue) => ({
        ...issue,
        field: issue.field === '(inputs)' ? field : `${field}.${issue.field}`,
      })),
    );
  }
}
