import {
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import { ROLES_KEY } from '../../common/decorators/roles.decorator';
import type { Role } from '../../users/roles';
import type { AuthUser } from '../auth-user';

/** Checks @Roles(): the signed-in user must hold one of the roles the route names. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!roles || roles.length === 0) return true;
    const user = context.switchToHttp().getRequest<Request & { user?: AuthUser }>().user;
    if (user && roles.some((role) => user.roles.includes(role))) return true;
    throw new ForbiddenException({ message: `This needs the ${roles.join(' or ')} role.` });
  }
}
