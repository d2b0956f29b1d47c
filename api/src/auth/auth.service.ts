import { BadRequestException, Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { IsNull, MoreThan, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { EnvironmentVariables } from '../config/env.validation';
import { WriteLock } from '../database/write-lock';
import { MailService } from '../mail/mail.service';
import { passwordResetMail } from '../mail/mail-templates';
import { PasswordHasher } from '../users/password-hasher.service';
import { type PublicUser, toPublicUser, type User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import type { LoginDto } from './dto/login.dto';
import type { RegisterDto } from './dto/register.dto';
import { ClassroomsService } from '../classrooms/classrooms.service';
import { PasswordResetToken } from './password-reset-token.entity';

/** How long a password-reset link works. */
export const RESET_TOKEN_TTL_MS = 30 * 60 * 1000;

export interface SignedIn {
  accessToken: string;
  user: PublicUser;
}

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

@Injectable()
export class AuthService {
  constructor(
    private readonly usersService: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly jwt: JwtService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly config: ConfigService<EnvironmentVariables, true>,
    @InjectRepository(PasswordResetToken)
    private readonly resetTokens: Repository<PasswordResetToken>,
    private readonly writeLock: WriteLock,
    private readonly classrooms: ClassroomsService,
  ) {}

  async register(dto: RegisterDto): Promise<SignedIn> {
    // Registering from a class's join link makes a student account; the code is checked before
    // anything is created, so a wrong code leaves no account behind.
    const joinCode = dto.joinCode?.trim() ? dto.joinCode : undefined;
    if (joinCode) await this.classrooms.findJoinable(joinCode, 'joinCode');
    const user = await this.usersService.create({
      email: dto.email,
      password: dto.password,
      displayName: dto.displayName,
      numberFormat: dto.numberFormat,
      // The first account on an empty database runs it: without an admin nobody could grant
      // roles. Decided with the insert, under the write lock, so only one account is first.
      roles: (first) => (first ? ['admin', 'designer'] : joinCode ? ['student'] : ['designer']),
    });
    await this.audit.record({
      actorId: user.id,
      action: 'auth.register',
      targetType: 'user',
      targetId: user.id,
    });
    if (joinCode && user.roles.includes('student')) {
      await this.classrooms.join(
        { id: user.id, email: user.email, displayName: user.displayName, roles: user.roles },
        joinCode,
      );
    }
    return this.signIn(user);
  }

  async login(dto: LoginDto): Promise<SignedIn> {
    const user = await this.usersService.findByEmail(dto.email);
    const { matches, needsRehash } = await this.hasher.check(dto.password, user?.passwordHash);
    if (!user || !matches) {
      await this.audit.record({
        actorId: null,
        action: 'auth.sign-in-failed',
        targetType: 'user',
        detail: { email: dto.email.trim().toLowerCase() },
      });
      // One answer for an unknown address and a wrong password.
      throw new UnauthorizedException({ message: 'The e-mail or password is not right.' });
    }
    await this.audit.record({
      actorId: user.id,
      action: 'auth.sign-in',
      targetType: 'user',
      targetId: user.id,
    });
    // An older hash (bcrypt, or a lower cost) is replaced now that the password is known.
    if (needsRehash) await this.usersService.rehashPassword(user.id, dto.password);
    return this.signIn(user);
  }

  async logout(userId: string): Promise<void> {
    await this.usersService.bumpTokenVersion(userId);
    await this.audit.record({
      actorId: userId,
      action: 'auth.sign-out',
      targetType: 'user',
      targetId: userId,
    });
  }

  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.usersService.findByEmail(email);
    await this.audit.record({
      actorId: user?.id ?? null,
      action: 'auth.password-reset-request',
      targetType: 'user',
      targetId: user?.id ?? null,
      detail: { email: email.trim().toLowerCase() },
    });
    if (!user) return;
    const token = randomBytes(32).toString('base64url');
    await this.writeLock.run(() =>
      this.resetTokens.insert({
        id: randomUUID(),
        userId: user.id,
        tokenHash: sha256(token),
        expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MS),
        usedAt: null,
      }),
    );
    const baseUrl =
      this.config.get('PUBLIC_URL', { infer: true }) ??
      `http://localhost:${this.config.get('PORT', { infer: true })}`;
    this.mail.send(
      passwordResetMail(
        user,
        `${baseUrl.replace(/\/$/, '')}/reset-password?token=${token}`,
        RESET_TOKEN_TTL_MS,
      ),
    );
  }

  async confirmPasswordReset(token: string, password: string): Promise<void> {
    const record = await this.resetTokens.findOneBy({
      tokenHash: sha256(token),
      usedAt: IsNull(),
      expiresAt: MoreThan(new Date()),
    });
    const user = record ? await this.usersService.findById(record.userId) : null;
    if (!record || !user) {
      throw new BadRequestException({
        message: 'This reset link is not valid or has expired; ask for a new one.',
        field: 'token',
      });
    }
    // Claim the token first: a second use of the same link finds it taken.
    const claimed = await this.writeLock.run(() =>
      this.resetTokens.update({ id: record.id, usedAt: IsNull() }, { usedAt: new Date() }),
    );
    if (claimed.affected !== 1) {
      throw new BadRequestException({
        message: 'This reset link has already been used.',
        field: 'token',
      });
    }
    await this.usersService.setPassword(user, password);
    await this.audit.record({
      actorId: user.id,
      action: 'auth.password-reset',
      targetType: 'user',
      targetId: user.id,
    });
  }

  private async signIn(user: User): Promise<SignedIn> {
    const accessToken = await this.jwt.signAsync({ sub: user.id, ver: user.tokenVersion });
    return { accessToken, user: toPublicUser(user) };
  }
}
