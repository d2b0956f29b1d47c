import type { Role } from '@loftwright/contract';

export { ROLES, type Role } from '@loftwright/contract';

/** Roles that make up "the team": they see calculations shared with the team. */
export const TEAM_ROLES: readonly Role[] = ['admin', 'designer', 'reviewer', 'teacher'];

/** Roles that add, change and remove envelopes of the team's library (the rest of the team reads it). */
export const ENVELOPE_MANAGER_ROLES: readonly Role[] = ['designer', 'admin'];

/** Roles that may create calculations and save versions of their own. */
export const AUTHOR_ROLES: readonly Role[] = ['designer', 'teacher'];
