import type { Account } from '@loftwright/contract';
import { accountPermissions } from './account-permissions';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { NumberFormat, UnitSystem } from './preferences';
import type { Role } from './roles';
import { DATETIME } from '../database/column-types';

@Entity('user')
export class User {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  /** Stored lower-cased; unique. */
  @Column('varchar', { unique: true })
  email: string;

  @Column('varchar', { name: 'display_name' })
  displayName: string;

  @Column('varchar', { name: 'password_hash' })
  passwordHash: string;

  @Column('simple-json')
  roles: Role[];

  @Column('varchar', { name: 'unit_system', default: 'si' })
  unitSystem: UnitSystem;

  @Column('varchar', { name: 'number_format', default: 'point-comma' })
  numberFormat: NumberFormat;

  /** ISO 4217 code, upper case: the default currency of new gas plans and prices. */
  @Column('varchar', { length: 3, default: 'EUR' })
  currency: string;

  /** Bumped on sign-out and password change: tokens carrying an older value stop working. */
  @Column('integer', { name: 'token_version', default: 0 })
  tokenVersion: number;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: DATETIME })
  updatedAt: Date;
}

/** A user as the API shows it: never the password hash or token version. */
export function toPublicUser(user: User): Account {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    roles: user.roles,
    permissions: accountPermissions(user.roles),
    unitSystem: user.unitSystem,
    numberFormat: user.numberFormat,
    currency: user.currency,
    createdAt: new Date(user.createdAt).toISOString(),
  };
}
