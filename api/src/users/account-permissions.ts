import type { AccountPermissions } from '@loftwright/contract';
import { AUTHOR_ROLES, type Role } from './roles';

const holds = (roles: readonly Role[], ...wanted: readonly Role[]): boolean =>
  wanted.some((role) => roles.includes(role));

/**
 * What roles allow across the product. The services enforce the same rules on every request;
 * this is how the web learns them without knowing the roles' meaning.
 */
export function accountPermissions(roles: readonly Role[]): AccountPermissions {
  return {
    createCalculations: holds(roles, ...AUTHOR_ROLES),
    planGas: holds(roles, ...AUTHOR_ROLES, 'admin'),
    review: holds(roles, 'reviewer'),
    runClasses: holds(roles, 'teacher'),
    joinClasses: holds(roles, 'student'),
    seeClasses: holds(roles, 'teacher', 'student', 'admin'),
    administer: holds(roles, 'admin'),
  };
}
