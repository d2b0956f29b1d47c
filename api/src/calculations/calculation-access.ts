import { type AuthUser, hasRole } from '../auth/auth-user';
import { AUTHOR_ROLES, TEAM_ROLES } from '../users/roles';
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
