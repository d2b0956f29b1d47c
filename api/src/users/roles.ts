/** What a user may do; a user may hold several roles. */
export const ROLES = ['admin', 'designer', 'reviewer', 'teacher', 'student'] as const;
export type Role = (typeof ROLES)[number];

/** Roles that make up "the team": they see calculations shared with the team. */
export const TEAM_ROLES: readonly Role[] = ['admin', 'designer', 'reviewer', 'teacher'];

/** Roles that may create calculations and save versions of their own. */
export const AUTHOR_ROLES: readonly Role[] = ['designer', 'teacher'];
