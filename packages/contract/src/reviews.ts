import type { UserRef } from './common.js';
import type { VersionDetail } from './calculations.js';

export type ReviewDecision = 'approved' | 'changes_requested';

/** A version waiting in GET /api/reviews/queue. */
export interface ReviewQueueItem {
  calculationId: string;
  title: string;
  kind: string;
  number: number;
  author: UserRef | null;
  reviewer: UserRef | null;
  submittedAt: string | null;
  fingerprint: string;
}

/** POST .../versions/:n/submit: a named reviewer, or anyone with the role. */
export interface SubmitVersionBody {
  reviewerId?: string;
}

/** POST .../versions/:n/approve */
export interface ApproveVersionBody {
  comment?: string;
  /** The approver's IANA time zone: the archived sheet gives the time in it and in UTC. */
  timeZone?: string;
}

/** POST .../versions/:n/send-back: the reason is required. */
export interface SendBackVersionBody {
  comment: string;
}

/** One decision on a version. */
export interface ReviewRecord {
  reviewer: UserRef | null;
  decision: ReviewDecision;
  comment: string;
  fingerprint: string;
  /** The calculation's title when the decision was made (null for decisions before it was kept). */
  calculationTitle: string | null;
  createdAt: string;
}

/** GET /api/calculations/:id/versions/:n/reviews: the version as its sheet shows it. */
export interface ReviewedVersion extends VersionDetail {
  /** The verify page of the fingerprint, with host (PUBLIC_URL, else the host asked). */
  verifyUrl: string;
  reviews: ReviewRecord[];
}

export type CommentAnchorKind = 'input' | 'result';

/** A review comment as the calculation page shows it: on what (by label), open or addressed. */
export interface ReviewComment {
  id: string;
  versionNumber: number;
  author: UserRef | null;
  anchor: { kind: CommentAnchorKind; path: string; label: string } | null;
  body: string;
  createdAt: string;
  addressed: { versionNumber: number; by: UserRef | null; at: string } | null;
}

/** POST .../versions/:n/comments */
export interface AddReviewCommentBody {
  body: string;
  anchor?: { kind: CommentAnchorKind; path: string };
}

/** POST /api/comments/:id/addressed: the version that answers the comment. */
export interface MarkAddressedBody {
  versionNumber: number;
}

/** A result that the engine running now computes differently from the approved version. */
export interface OutputComparison {
  name: string;
  /** The result's label, as the sheet prints it. */
  label: string;
  unit: string;
  approved: number | null;
  recomputed: number | null;
  /** (recomputed − approved) / |approved|, null where either is missing or approved is 0. */
  relativeChange: number | null;
}

/** GET /api/verify/:fingerprint */
export type Verification =
  | { fingerprint: string; match: false; message: string }
  | {
      fingerprint: string;
      match: true;
      /** id and title only when the reader may open the calculation; the title as approved. */
      calculation: { id?: string; title?: string; kind: string };
      version: number;
      approvedBy: UserRef | null;
      approvedAt: string;
      comment: string | null;
      engineVersionAtApproval: string;
      currentEngineVersion: string;
      reproduces: boolean;
      differences: OutputComparison[];
      /** Why the engine could not recompute the stored inputs, if it could not. */
      recomputeError: string | null;
      approvals: {
        calculation: { id: string; title: string } | null;
        version: number;
        approvedBy: UserRef | null;
        approvedAt: string;
      }[];
    };
