import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { UsersService } from '../../users/users.service';
import type { AuthUser } from '../auth-user';
import { JWT_SECRET } from '../auth.constants';

interface TokenPayload {
  sub: string;
  ver: number;
}

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(JWT_SECRET) secret: string,
    private readonly usersService: UsersService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A KeyObject, not the string: given a string, the verifier first tries to read it as a
      // PEM public key on every request, which costs more than the rest of the request.
      secretOrKey: createSecretKey(Buffer.from(secret, 'utf8')) as unknown as string,
      algorithms: ['HS256'],
    });
  }

  /** Loads the user on every request, so role changes and sign-outs take effect at once. */
  async validate(payload: TokenPayload): Promise<AuthUser> {
    const user = await this.usersService.findById(payload.sub);
    if (!user || user.tokenVersion !== payload.ver) {
      throw new UnauthorizedException({ message: 'Your session has ended; sign in again.' });
    }
    return { id: user.id, email: user.email, displayName: user.displayName, roles: user.roles };
  }
}
