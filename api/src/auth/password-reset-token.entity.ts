import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** A single-use, expiring password reset. Only the SHA-256 of the mailed token is stored. */
@Entity('password_reset_token')
export class PasswordResetToken {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'user_id', length: 36 })
  userId: string;

  @Column('varchar', { name: 'token_hash', unique: true })
  tokenHash: string;

  @Column(DATETIME, { name: 'expires_at' })
  expiresAt: Date;

  @Column(DATETIME, { name: 'used_at', nullable: true })
  usedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
