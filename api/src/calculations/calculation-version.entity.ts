import type { CalculationResult } from '@loftwright/buoyancy';
import type { VersionStatus } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

export { VERSION_STATUSES, type VersionStatus } from '@loftwright/contract';

/**
 * One saved version of a calculation. Its content (inputs, outputs, steps, warnings, engine
 * version, fingerprint) never changes after the insert; only its review status moves on.
 */
@Entity('calculation_version')
@Index(['calculationId', 'number'], { unique: true })
export class CalculationVersion {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'calculation_id', length: 36 })
  calculationId: string;

  @Column('integer')
  number: number;

  @Column('simple-json')
  inputs: Record<string, unknown>;

  @Column('simple-json')
  outputs: CalculationResult['outputs'];

  @Column('simple-json')
  steps: CalculationResult['steps'];

  @Column('simple-json')
  warnings: CalculationResult['warnings'];

  @Column('simple-json', { nullable: true })
  series: CalculationResult['series'] | null;

  @Column('varchar', { name: 'engine_version' })
  engineVersion: string;

  @Column('varchar', { name: 'author_id', length: 36 })
  authorId: string;

  @Column('varchar', { default: '' })
  note: string;

  /** SHA-256 of the canonical JSON of inputs, outputs and engine version. */
  @Index()
  @Column('varchar', { length: 64 })
  fingerprint: string;

  @Column('varchar', { default: 'draft' })
  status: VersionStatus;

  /** Reviewer named at submission; null leaves it open to any reviewer. */
  @Column('varchar', { name: 'reviewer_id', length: 36, nullable: true })
  reviewerId: string | null;

  @Column(DATETIME, { name: 'submitted_at', nullable: true })
  submittedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
