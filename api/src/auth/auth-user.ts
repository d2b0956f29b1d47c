import type { Role } from '../users/roles';

/** The signed-in user as routes see it. */
export interface AuthUser {
  readonly id: string;
  readonly email: string;
  readonly displayName: string;
  readonly roles: readonly Role[];
}

export const hasRole = (user: Pick<AuthUser, 'roles'>, ...roles: readonly Role[]): boolean =>
  roles.some((role) => user.roles.includes(role));
