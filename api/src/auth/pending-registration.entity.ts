import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import type { NumberFormat } from '../users/preferences';
import { DATETIME } from '../database/column-types';

/**
 * A registration waiting for its owner to open the mailed link. The account is created only then,
 * so registering answers the same whether or not the address already has an account. Only the
 * SHA-256 of the mailed token and the password's hash are stored.
 */
@Entity('pending_registration')
export class PendingRegistration {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar')
  email: string;

  @Column('varchar', { name: 'display_name' })
  displayName: string;

  @Column('varchar', { name: 'password_hash' })
  passwordHash: string;

  @Column('varchar', { name: 'number_format', nullable: true })
  numberFormat: NumberFormat | null;

  @Column('varchar', { name: 'join_code', nullable: true })
  joinCode: string | null;

  @Column('varchar', { name: 'token_hash', unique: true })
  tokenHash: string;

  @Column(DATETIME, { name: 'expires_at' })
  expiresAt: Date;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
