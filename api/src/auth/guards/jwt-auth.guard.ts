import { type ExecutionContext, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { IS_PUBLIC_KEY } from '../../common/decorators/public.decorator';

/** Applied to every route: a valid access token is needed unless the route is @Public(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!isPublic) return (await super.canActivate(context)) as boolean;
    // A public route still knows who is asking when a valid token comes with the request (verify
    // shows a title only to those who may read the calculation); a missing or bad token is
    // simply anonymous there.
    const request = context.switchToHttp().getRequest<{ headers: Record<string, unknown> }>();
    if (request.headers.authorization) {
      try {
        await super.canActivate(context);
      } catch {
        // anonymous
      }
    }
    return true;
  }

  override handleRequest<TUser>(error: unknown, user: TUser | false): TUser {
    if (error || !user) {
      throw error instanceof UnauthorizedException
        ? error
        : new UnauthorizedException({ message: 'Sign in to do this.' });
    }
    return user;
  }
}
