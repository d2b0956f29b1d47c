import type { CalculationResult, InputChange, OutputChange } from '@loftwright/buoyancy';
import type { Page, UserRef } from './common.js';

/** Where a version stands in review. */
export const VERSION_STATUSES = ['draft', 'in_review', 'approved', 'changes_requested'] as const;
export type VersionStatus = (typeof VERSION_STATUSES)[number];

/** Who sees a calculation besides its owner. */
export const VISIBILITIES = ['private', 'team', 'published'] as const;
export type Visibility = (typeof VISIBILITIES)[number];

/** What the signed-in person may do with a calculation; the API decides, the web shows. */
export interface CalculationPermissions {
  edit: boolean;
  archive: boolean;
  submit: boolean;
  review: boolean;
  upload: boolean;
  export: boolean;
}

export interface CalculationSummary {
  id: string;
  title: string;
  kind: string;
  owner: UserRef | null;
  visibility: Visibility;
  tags: string[];
  latestVersion: number;
  status: VersionStatus;
  archived: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface VersionSummary {
  number: number;
  status: VersionStatus;
  note: string;
  author: UserRef | null;
  reviewer: UserRef | null;
  engineVersion: string;
  fingerprint: string;
  createdAt: string;
  submittedAt: string | null;
}

/** A saved version with the inputs it was computed from and the engine's answer. */
export interface VersionDetail extends VersionSummary {
  inputs: Record<string, unknown>;
  outputs: CalculationResult['outputs'];
  steps: CalculationResult['steps'];
  warnings: CalculationResult['warnings'];
  series: CalculationResult['series'] | null;
}

/**
 * The calculation this one was continued from (sizing → flight → rules check). When the reader may
 * not see the source, `calculationId`, `title` and `newestVersionNumber` are null: the link is
 * shown as "from a calculation you cannot open", never who or what it is.
 */
export interface CalculationSource {
  calculationId: string | null;
  title: string | null;
  kind: string;
  /** The source version the inputs were last taken from. */
  versionNumber: number;
  /** The source's newest version; above `versionNumber` means a newer one can be taken. */
  newestVersionNumber: number | null;
  /** Input paths still holding the kind's example value, to be filled by the person. */
  needs: string[];
}

/** A calculation continued from this one; those the reader may not see are left out. */
export interface CalculationContinuation {
  id: string;
  title: string;
  kind: string;
}

/** GET /api/calculations/:id */
export interface CalculationDetail extends CalculationSummary {
  versions: VersionSummary[];
  latest: VersionDetail | null;
  permissions: CalculationPermissions;
  source: CalculationSource | null;
  continuations: CalculationContinuation[];
  /**
   * The kinds the reader may continue this calculation into ("Continue as …"): the engine's
   * `continuations(kind)`, empty for a reader who may not create calculations.
   */
  continueAs: { toKind: string; title: string }[];
}

/** POST /api/calculations/:id/versions/:number/continue: answers 201 with the new calculation. */
export interface ContinueCalculationBody {
  /** The kind to continue into; the engine's `continuations(kind)` lists the ones offered. */
  toKind: string;
}

/** A row of GET /api/calculations: the summary and whether the reader may archive it. */
export interface CalculationListItem extends CalculationSummary {
  permissions: Pick<CalculationPermissions, 'archive'>;
}

export type CalculationPage = Page<CalculationListItem>;

/** GET /api/calculations query: `sort` is a field, `-field` for descending. */
export interface CalculationListQuery {
  page?: number;
  pageSize?: number;
  sort?: string;
  kind?: string;
  status?: string;
  owner?: string;
  tag?: string;
  q?: string;
}

/** POST /api/calculations */
export interface CreateCalculationBody {
  title: string;
  kind: string;
  inputs: unknown;
  visibility?: Visibility;
  tags?: string[];
  note?: string;
}

/** PATCH /api/calculations/:id */
export interface UpdateCalculationBody {
  title?: string;
  visibility?: Visibility;
  tags?: string[];
}

/** POST /api/calculations/:id/versions: `baseVersion` is the version the edit started from. */
export interface SaveVersionBody {
  baseVersion: number;
  inputs: unknown;
  note?: string;
  /** A continued calculation: the source version its inputs were re-taken from ("Take version N"). */
  sourceVersion?: number;
}

/** GET /api/calculations/:id/versions/:a/diff/:b */
export interface VersionDiff {
  from: number;
  to: number;
  inputs: InputChange[];
  outputs: OutputChange[];
  engineVersion: { from: string; to: string };
}
