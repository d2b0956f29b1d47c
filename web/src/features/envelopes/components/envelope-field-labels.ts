import type { InputFieldInfo } from '@loftwright/buoyancy';

/** The form's labels, by the field the API names; the server's messages use the same words. */
export const ENVELOPE_FIELDS: Record<string, InputFieldInfo> = {
  name: { label: 'Name' },
  kind: { label: 'Kind' },
  massKg: { label: 'Mass', dimension: 'mass' },
  burstDiameterM: { label: 'Burst diameter', dimension: 'length' },
  ratedSuperpressurePa: { label: 'Rated superpressure', dimension: 'pressureDifference' },
  dragCoefficient: { label: 'Drag coefficient', dimension: 'coefficient' },
  film: { label: 'Film' },
  notes: { label: 'Notes' },
  version: { label: 'Version' },
};

export const envelopeLabel = (field: string): InputFieldInfo | undefined => ENVELOPE_FIELDS[field];

export const KIND_WORDS = {
  extensible: 'Extensible (stretches until it bursts)',
  fixed: 'Fixed volume (superpressure)',
} as const;
