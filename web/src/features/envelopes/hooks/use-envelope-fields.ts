import { useState } from 'react';
import type { Envelope, EnvelopeBody, LibraryEnvelopeKind } from '../api/envelopes-api';

/** Every field of the envelope form, starting from the envelope being changed (or empty). */
export function useEnvelopeFields(start?: Envelope) {
  const [name, setName] = useState(start?.name ?? '');
  const [kind, setKind] = useState<LibraryEnvelopeKind>(start?.kind ?? 'extensible');
  const [massKg, setMassKg] = useState<number | undefined>(start?.massKg);
  const [burstDiameterM, setBurstDiameterM] = useState<number | undefined>(
    start?.burstDiameterM ?? undefined,
  );
  const [ratedSuperpressurePa, setRatedSuperpressurePa] = useState<number | undefined>(
    start?.ratedSuperpressurePa ?? undefined,
  );
  const [dragCoefficient, setDragCoefficient] = useState<number | undefined>(
    start?.dragCoefficient ?? undefined,
  );
  const [film, setFilm] = useState(start?.film ?? '');
  const [notes, setNotes] = useState(start?.notes ?? '');
  return {
    name,
    setName,
    kind,
    setKind,
    massKg,
    setMassKg,
    burstDiameterM,
    setBurstDiameterM,
    ratedSuperpressurePa,
    setRatedSuperpressurePa,
    dragCoefficient,
    setDragCoefficient,
    film,
    setFilm,
    notes,
    setNotes,
  };
}

export type EnvelopeFields = ReturnType<typeof useEnvelopeFields>;

/**
 * The envelope to send once the fields it needs are filled: its kind's own measure only (a burst
 * diameter typed before switching to fixed is not sent). Undefined while one is missing.
 */
export function envelopeBodyOf(fields: EnvelopeFields): EnvelopeBody | undefined {
  const measure =
    fields.kind === 'extensible'
      ? fields.burstDiameterM === undefined
        ? undefined
        : { burstDiameterM: fields.burstDiameterM }
      : fields.ratedSuperpressurePa === undefined
        ? undefined
        : { ratedSuperpressurePa: fields.ratedSuperpressurePa };
  if (fields.name.trim() === '' || fields.massKg === undefined || !measure) return undefined;
  return {
    name: fields.name.trim(),
    kind: fields.kind,
    massKg: fields.massKg,
    ...measure,
    ...(fields.dragCoefficient === undefined ? {} : { dragCoefficient: fields.dragCoefficient }),
    film: fields.film.trim(),
    notes: fields.notes,
  };
}
