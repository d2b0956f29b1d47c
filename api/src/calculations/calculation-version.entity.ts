import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';

export const VERSION_STATUSES = ['draft', 'in_review', 'approved', 'changes_requested'] as const;
export type VersionStatus = (typeof VERSION_STATUSES)[number];

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
  inputs: unknown;

  @Column('simple-json')
  outputs: unknown;

  @Column('simple-json')
  steps: unknown;

  @Column('simple-json')
  warnings: unknown;

  @Column('simple-json', { nullable: true })
  series: unknown;

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

  @Column('datetime', { name: 'submitted_at', nullable: true })
  submittedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime' })
  createdAt: Date;
}
