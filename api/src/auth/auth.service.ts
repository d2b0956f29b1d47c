import type { RegisterOutcome, SignedIn } from '@loftwright/contract';
import { configuredBaseUrl } from '../common/public-url';
import { BadRequestException, Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { IsNull, MoreThan, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { EnvironmentVariables } from '../config/env.validation';
import { WriteLock } from '../persistence/write-lock';
import { MailService } from '../mail/mail.service';
import {
  confirmRegistrationMail,
  passwordResetMail,
  registrationAttemptMail,
} from '../mail/mail-templates';
import { PasswordHasher } from '../users/password-hasher.service';
import { toPublicUser, type User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import type { LoginDto } from './dto/login.dto';
import type { RegisterDto } from './dto/register.dto';
import { ClassroomsService } from '../classrooms/classrooms.service';
import { PasswordResetToken } from './password-reset-token.entity';
import { PendingRegistration } from './pending-registration.entity';

/** How long a password-reset link works. */
export const RESET_TOKEN_TTL_MS = 30 * 60 * 1000;

/** How long the link that finishes a registration works. */
export const REGISTRATION_TOKEN_TTL_MS = 24 * 60 * 60 * 1000;

export type { RegisterOutcome, SignedIn } from '@loftwright/contract';

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
    @InjectRepository(PendingRegistration)
    private readonly pending: Repository<PendingRegistration>,
    private readonly writeLock: WriteLock,
    private readonly classrooms: ClassroomsService,
  ) {}

  /**
   * Registers an address. The first account of an empty database is created and signed in at once
   * (there is nobody to tell apart, and nobody yet who could read a mail for it). Every later
   * registration answers the same whether or not the address has an account: a new address gets a
   * link that creates the account when opened, a taken one a mail telling its owner.
   */
  async register(dto: RegisterDto): Promise<RegisterOutcome> {
    // Registering from a class's join link makes a student account; the code is checked before
    // anything is created or mailed, so a wrong code leaves nothing behind.
    const joinCode = dto.joinCode?.trim() ? dto.joinCode : undefined;
    if (joinCode) await this.classrooms.findJoinable(joinCode, 'joinCode');
    // Hashed whatever happens next, so the answer takes as long for a taken address.
    const passwordHash = await this.hasher.hash(dto.password);
    const account = {
      email: dto.email,
      password: { hash: passwordHash },
      displayName: dto.displayName,
      numberFormat: dto.numberFormat,
    };
    const first = await this.usersService.createFirstAccount({
      ...account,
      roles: ['admin', 'designer'],
      recordRegistration: true,
    });
    if (first) {
      return { status: 'signed-in', ...(await this.signIn(first)) };
    }
    const email = dto.email.trim().toLowerCase();
    const owner = await this.usersService.findByEmail(email);
    await this.audit.recordEvent({
      actorId: null,
      action: 'auth.register-request',
      targetType: 'user',
      targetId: owner?.id ?? null,
      detail: { email },
    });
    if (owner) {
      this.mail.send(
        registrationAttemptMail(owner, this.link('/sign-in'), this.link('/forgot-password')),
      );
    } else {
      const token = randomBytes(32).toString('base64url');
      await this.writeLock.run(() =>
        this.pending.insert({
          id: randomUUID(),
          email,
          displayName: dto.displayName.trim(),
          passwordHash,
          numberFormat: dto.numberFormat ?? null,
          joinCode: joinCode ?? null,
          tokenHash: sha256(token),
          expiresAt: new Date(Date.now() + REGISTRATION_TOKEN_TTL_MS),
        }),
      );
      this.mail.send(
        confirmRegistrationMail(
          { email, displayName: dto.displayName.trim() },
          this.link(`/confirm-account?token=${token}`),
          REGISTRATION_TOKEN_TTL_MS,
        ),
      );
    }
    return {
      status: 'check-mail',
      message:
        `A message is on its way to ${email}. Open the link in it to finish creating the ` +
        `account. If the address already has an account, the message says so instead.`,
    };
  }

  /** Creates the account of a registration whose mailed link was opened, and signs it in. */
  async confirmRegistration(token: string): Promise<SignedIn> {
    const pending = await this.pending.findOneBy({
      tokenHash: sha256(token),
      expiresAt: MoreThan(new Date()),
    });
    if (!pending) {
      throw new BadRequestException({
        message: 'This link is not valid or has expired; register again.',
        field: 'token',
      });
    }
    if (pending.joinCode) await this.classrooms.findJoinable(pending.joinCode, 'joinCode');
    const user = await this.usersService.create({
      email: pending.email,
      password: { hash: pending.passwordHash },
      displayName: pending.displayName,
      numberFormat: pending.numberFormat ?? undefined,
      roles: (first) =>
        first ? ['admin', 'designer'] : pending.joinCode ? ['student'] : ['designer'],
      recordRegistration: true,
    });
    // Every waiting registration of the address is spent: the address now has its account.
    await this.writeLock.run(() => this.pending.delete({ email: pending.email }));
    if (pending.joinCode && user.roles.includes('student')) {
      await this.classrooms.join(
        { id: user.id, email: user.email, displayName: user.displayName, roles: user.roles },
        pending.joinCode,
      );
    }
    return this.signIn(user);
  }

  /** A link into the web app, on PUBLIC_URL when set. */
  private link(pathAndQuery: string): string {
    return `${configuredBaseUrl(this.config)}${pathAndQuery}`;
  }

  async login(dto: LoginDto): Promise<SignedIn> {
    const user = await this.usersService.findByEmail(dto.email);
    const { matches, needsRehash } = await this.hasher.check(dto.password, user?.passwordHash);
    if (!user || !matches) {
      await this.audit.recordEvent({
        actorId: null,
        action: 'auth.sign-in-failed',
        targetType: 'user',
        detail: { email: dto.email.trim().toLowerCase() },
      });
      // One answer for an unknown address and a wrong password.
      throw new UnauthorizedException({ message: 'The e-mail or password is not right.' });
    }
    await this.audit.recordEvent({
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
    await this.usersService.bumpTokenVersion(userId, {
      actorId: userId,
      action: 'auth.sign-out',
      targetType: 'user',
      targetId: userId,
    });
  }

  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.usersService.findByEmail(email);
    await this.audit.recordEvent({
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
    this.mail.send(
      passwordResetMail(user, this.link(`/reset-password?token=${token}`), RESET_TOKEN_TTL_MS),
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
    await this.usersService.setPassword(user, password, {
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
