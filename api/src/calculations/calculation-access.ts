import { type AuthUser, hasRole } from '../auth/auth-user';
import { AUTHOR_ROLES, TEAM_ROLES } from '../users/roles';
import type { CalculationVersion } from './calculation-version.entity';
import type { Calculation } from './calculation.entity';

/**
 * Who may see a calculation. Private ones: their owner, admins, and reviewers once a version has
 * been submitted. Team ones: anyone on the team. Published examples: every signed-in user.
 * Archived ones: their owner and admins only. Everyone else is told it does not exist.
 */
export function canRead(user: AuthUser, calculation: Calculation): boolean {
  if (calculation.ownerId === user.id || hasRole(user, 'admin')) return true;
  if (calculation.archivedAt) return false;
  if (calculation.visibility === 'published') return true;
  if (calculation.visibility === 'team' && hasRole(user, ...TEAM_ROLES)) return true;
  return calculation.everSubmitted && hasRole(user, 'reviewer');
}

/** Only the owner, holding an author role, saves versions or changes its details. */
export function canEdit(user: AuthUser, calculation: Calculation): boolean {
  return (
    calculation.ownerId === user.id && hasRole(user, ...AUTHOR_ROLES) && !calculation.archivedAt
  );
}

export function canArchive(user: AuthUser, calculation: Calculation): boolean {
  return calculation.ownerId === user.id || hasRole(user, 'admin');
}

/** The owner (an author) or an admin adds files to a calculation and its fill logs. */
export function canAddFiles(user: AuthUser, calculation: Calculation): boolean {
  return canEdit(user, calculation) || hasRole(user, 'admin');
}

/** The version's author, or the calculation's owner, submits a draft for review. */
export function canSubmit(
  user: AuthUser,
  calculation: Calculation,
  version: Pick<CalculationVersion, 'authorId' | 'status'>,
): boolean {
  return (
    (version.authorId === user.id || calculation.ownerId === user.id) && version.status === 'draft'
  );
}

/**
 * A reviewer who did not write the version decides it (and comments on it) while it is in
 * review, when it was asked of them by name or of any reviewer.
 */
export function canReview(
  user: AuthUser,
  version: Pick<CalculationVersion, 'authorId' | 'reviewerId' | 'status'>,
): boolean {
  return (
    hasRole(user, 'reviewer') &&
    version.authorId !== user.id &&
    version.status === 'in_review' &&
    (!version.reviewerId || version.reviewerId === user.id)
  );
}

/** What the signed-in user may do with a calculation, sent with it so the web needs no rules. */
export interface CalculationPermissions {
  /** Save versions and change its details. */
  edit: boolean;
  archive: boolean;
  /** Submit its latest version for review. */
  submit: boolean;
  /** Approve or send back its latest version, and comment on it. */
  review: boolean;
  /** Add files to it and its fill logs. */
  upload: boolean;
  /** Download it as a calculation file. */
  export: boolean;
}

export function calculationPermissions(
  user: AuthUser,
  calculation: Calculation,
  latest: Pick<CalculationVersion, 'authorId' | 'reviewerId' | 'status'> | undefined,
): CalculationPermissions {
  return {
    edit: canEdit(user, calculation),
    archive: canArchive(user, calculation),
    submit: latest ? canEdit(user, calculation) && canSubmit(user, calculation, latest) : false,
    review: latest ? canReview(user, latest) : false,
    upload: canAddFiles(user, calculation),
    // Anyone who may read a calculation may take it away as a file.
    export: canRead(user, calculation),
  };
}
