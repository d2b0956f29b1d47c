import type { Derivation } from '../derivation.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import type { AmbientState } from './ambient-state.js';
import { deriveMeasuredAir } from './measured-air-steps.js';
import { deriveStandardAir } from './standard-air-steps.js';

export type { AmbientState } from './ambient-state.js';

/**
 * Derives the ambient air state, recording a step for each quantity: the 1976 standard at an
 * altitude (its own ideal gas), or measured temperature and pressure (CIPM-2007 real air).
 */
export function deriveAmbient(d: Derivation, ambient: AmbientInput): AmbientState {
  return ambient.mode === 'standard'
    ? deriveStandardAir(d, ambient)
    : deriveMeasuredAir(d, ambient);
}
