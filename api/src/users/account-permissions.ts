import type { AccountPermissions } from '@loftwright/contract';
import { hasRole } from '../auth/auth-user';
import { AUTHOR_ROLES, ENVELOPE_MANAGER_ROLES, type Role, TEAM_ROLES } from './roles';

/**
 * What roles allow across the product. The services enforce the same rules on every request;
 * this is how the web learns them without knowing the roles' meaning.
 */
export function accountPermissions(roles: readonly Role[]): AccountPermissions {
  const holds = (...wanted: readonly Role[]) => hasRole({ roles }, ...wanted);
  return {
    createCalculations: holds(...AUTHOR_ROLES),
    planGas: holds(...AUTHOR_ROLES, 'admin'),
    review: holds('reviewer'),
    runClasses: holds('teacher'),
    joinClasses: holds('student'),
    seeClasses: holds('teacher', 'student', 'admin'),
    administer: holds('admin'),
    seeEnvelopes: holds(...TEAM_ROLES),
    manageEnvelopes: holds(...ENVELOPE_MANAGER_ROLES),
  };
}
