import { type CustomDecorator, SetMetadata } from '@nestjs/common';
import type { Role } from '../../users/roles';

export const ROLES_KEY = 'roles';

/** The route needs a user holding at least one of these roles. */
export const Roles = (...roles: Role[]): CustomDecorator<string> => SetMetadata(ROLES_KEY, roles);
