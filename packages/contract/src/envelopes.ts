import type { LibraryEnvelopeKind } from '@loftwright/buoyancy';

export type { LibraryEnvelopeKind };

/** What the signed-in person may do with one envelope of the library. */
export interface EnvelopePermissions {
  /** Change its figures and notes. */
  edit: boolean;
  /** Remove it: only while no fill log names it. */
  remove: boolean;
}

/**
 * GET /api/envelopes: one envelope the team keeps, its figures in SI. `burstDiameterM` belongs to
 * an extensible envelope, `ratedSuperpressurePa` to a fixed one; the other is null.
 */
export interface Envelope {
  id: string;
  name: string;
  kind: LibraryEnvelopeKind;
  massKg: number;
  burstDiameterM: number | null;
  ratedSuperpressurePa: number | null;
  /** null: the team has no drag coefficient for it (calculations keep their own). */
  dragCoefficient: number | null;
  /** Free text: "natural latex", "metallised film". */
  film: string;
  notes: string;
  /** Bumped by every change; an update names the one it started from. */
  version: number;
  /** Fill logs that name this envelope. */
  fillCount: number;
  permissions: EnvelopePermissions;
  createdAt: string;
  updatedAt: string;
}

/** One fill of the envelope: where and when, against which calculation, lift measured vs predicted. */
export interface EnvelopeFill {
  fillLogId: string;
  calculationId: string;
  calculationTitle: string;
  versionNumber: number;
  filledAt: string;
  place: string;
  /** Net lift the fill log measured [kg] (its first reading). */
  measuredNetLiftKg: number | null;
  /** Net lift the calculation version predicted in the logged air [kg]; null when it predicts none. */
  predictedNetLiftKg: number | null;
}

/** GET /api/envelopes/:id: the envelope with its fills, newest first (those the reader may see). */
export interface EnvelopeDetail extends Envelope {
  history: EnvelopeFill[];
}

/** POST /api/envelopes: a new envelope for the library. */
export interface EnvelopeBody {
  name: string;
  kind: LibraryEnvelopeKind;
  massKg: number;
  /** Needed for an extensible envelope; refused for a fixed one. */
  burstDiameterM?: number;
  /** Needed for a fixed envelope; refused for an extensible one. */
  ratedSuperpressurePa?: number;
  dragCoefficient?: number;
  film?: string;
  notes?: string;
}

/**
 * PUT /api/envelopes/:id: the whole envelope again, with the version the edit started from; a
 * change saved meanwhile answers 409 with the envelope as it now is.
 */
export interface UpdateEnvelopeBody extends EnvelopeBody {
  version: number;
}
