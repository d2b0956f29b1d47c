import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { In, Repository } from 'typeorm';
import { type AuditRecord, AuditService } from '../audit/audit.service';
import { fieldIssuesException } from '../common/errors/field-issues';
import { WriteLock } from '../persistence/write-lock';
import { claimFirstAccount } from './first-account-claim';
import { PasswordHasher } from './password-hasher.service';
import {
  DEFAULT_CURRENCY,
  DEFAULT_NUMBER_FORMAT,
  type NumberFormat,
  PREFERENCE_FIELDS,
  type Preferences,
} from './preferences';
import type { Role } from './roles';
import { User } from './user.entity';
import type { NameLookup } from './user-ref';
import { jsonArrayContains } from '../database/sql-dialect';

export interface NewAccount {
  email: string;
  /** The password, or its hash when it was hashed earlier (a registration waiting for its mail). */
  password: string | { hash: string };
  displayName: string;
  /**
   * The account's roles, or how to choose them once it is known whether this is the first
   * account (decided in the insert's transaction by the database's first-account claim).
   */
  roles: Role[] | ((isFirstAccount: boolean) => Role[]);
  /** As the browser guessed it at registration; the default when not known. */
  numberFormat?: NumberFormat;
  /** Records `auth.register` with the account, in its transaction (not for seeded accounts). */
  recordRegistration?: boolean;
}

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly hasher: PasswordHasher,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  count(): Promise<number> {
    return this.users.count();
  }

  /** Display names for a set of user ids, fetched in one query, as a lookup for views. */
  async names(ids: readonly (string | null | undefined)[]): Promise<NameLookup> {
    const wanted = [...new Set(ids.filter((id): id is string => typeof id === 'string'))];
    const found = wanted.length ? await this.users.findBy({ id: In(wanted) }) : [];
    const byId = new Map(
      found.map((user) => [user.id, { id: user.id, displayName: user.displayName }]),
    );
    return (id) => (id ? (byId.get(id) ?? { id, displayName: 'unknown user' }) : null);
  }

  findById(id: string): Promise<User | null> {
    return this.users.findOneBy({ id });
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOneBy({ email: email.trim().toLowerCase() });
  }

  /** Creates an account; 409 naming `email` when the address already has one. */
  async create(input: NewAccount): Promise<User> {
    return (await this.insertAccount(input, false)) as User;
  }

  /**
   * Creates the account only when the database has had none yet, else nothing (null). Decided by
   * the first-account claim in the database (first-account-claim.ts) in the insert's transaction,
   * so of registrations racing on an empty database, on one instance or several, exactly one is
   * the first.
   */
  createFirstAccount(input: NewAccount): Promise<User | null> {
    return this.insertAccount(input, true);
  }

  private async insertAccount(input: NewAccount, onlyIfFirst: boolean): Promise<User | null> {
    const email = input.email.trim().toLowerCase();
    const taken = () =>
      new ConflictException({
        message: 'An account with this e-mail already exists.',
        field: 'email',
      });
    if (!onlyIfFirst && (await this.findByEmail(email))) throw taken();
    const user = this.users.create({
      id: randomUUID(),
      email,
      displayName: input.displayName.trim(),
      passwordHash:
        typeof input.password === 'string'
          ? await this.hasher.hash(input.password)
          : input.password.hash,
      roles: [],
      unitSystem: 'si',
      numberFormat: input.numberFormat ?? DEFAULT_NUMBER_FORMAT,
      currency: DEFAULT_CURRENCY,
      tokenVersion: 0,
    });
    return this.writeLock.transaction(async (manager) => {
      const users = manager.getRepository(User);
      // Decided by the database, not this process, so it holds across API instances too.
      const isFirstAccount = await claimFirstAccount(manager, user.id);
      if (onlyIfFirst && !isFirstAccount) return null;
      // Checked again under the lock: two registrations of one address at once get one account.
      if (await users.findOneBy({ email })) throw taken();
      const roles = typeof input.roles === 'function' ? input.roles(isFirstAccount) : input.roles;
      user.roles = [...new Set(roles)];
      const saved = await users.save(user);
      if (input.recordRegistration) {
        await this.audit.record(
          { actorId: saved.id, action: 'auth.register', targetType: 'user', targetId: saved.id },
          manager,
        );
      }
      return saved;
    });
  }

  list(): Promise<User[]> {
    return this.users.find({ order: { createdAt: 'ASC' } });
  }

  listByRole(role: Role): Promise<User[]> {
    return this.users
      .createQueryBuilder('user')
      .where(jsonArrayContains('user.roles', 'role'), { role })
      .getMany();
  }

  async updateRoles(actorId: string, id: string, roles: Role[]): Promise<User> {
    const user = await this.findById(id);
    if (!user) throw new NotFoundException({ message: 'No such user.', field: 'id' });
    const unique = [...new Set(roles)];
    if (user.roles.includes('admin') && !unique.includes('admin')) {
      const admins = await this.listByRole('admin');
      if (admins.length <= 1) {
        throw new ConflictException({
          message: 'The last admin cannot lose the admin role.',
          field: 'roles',
        });
      }
    }
    const before = user.roles;
    user.roles = unique;
    // Tokens carry roles: make the user sign in again so the change takes effect everywhere.
    user.tokenVersion += 1;
    return this.writeLock.transaction(async (manager) => {
      const saved = await manager.getRepository(User).save(user);
      await this.audit.record(
        {
          actorId,
          action: 'user.roles-change',
          targetType: 'user',
          targetId: id,
          detail: { before, after: unique },
        },
        manager,
      );
      return saved;
    });
  }

  /** A new password (every session ends), recorded as `record` in the same transaction. */
  async setPassword(user: User, password: string, record: AuditRecord): Promise<void> {
    const passwordHash = await this.hasher.hash(password);
    await this.writeLock.transaction(async (manager) => {
      await manager
        .getRepository(User)
        .update({ id: user.id }, { passwordHash, tokenVersion: user.tokenVersion + 1 });
      await this.audit.record(record, manager);
    });
  }

  /**
   * Stores a new hash of the same password (an older kind or cost, upgraded at sign-in); sessions
   * stay valid, as the password has not changed.
   */
  async rehashPassword(id: string, password: string): Promise<void> {
    const passwordHash = await this.hasher.hash(password);
    await this.writeLock.run(() => this.users.update({ id }, { passwordHash }));
  }

  /** Ends every session of the account, recorded as `record` in the same transaction. */
  async bumpTokenVersion(id: string, record: AuditRecord): Promise<void> {
    await this.writeLock.transaction(async (manager) => {
      await manager.getRepository(User).increment({ id }, 'tokenVersion', 1);
      await this.audit.record(record, manager);
    });
  }

  /** Changes the preferences sent and leaves the others; sending none is a 400 naming them. */
  async setPreferences(id: string, changes: Partial<Preferences>): Promise<void> {
    const sent = Object.fromEntries(
      PREFERENCE_FIELDS.flatMap((field) =>
        changes[field] === undefined ? [] : [[field, changes[field]]],
      ),
    ) as Partial<Preferences>;
    if (Object.keys(sent).length === 0) {
      throw fieldIssuesException(
        PREFERENCE_FIELDS.map((field) => ({ field, reason: 'not sent' })),
        `Send at least one preference to change: ${PREFERENCE_FIELDS.join(', ')}.`,
      );
    }
    await this.writeLock.run(() => this.users.update({ id }, sent));
  }
}
