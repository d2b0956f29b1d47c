import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

export type ReviewDecision = 'approved' | 'changes_requested';

/** A reviewer's decision on one version, with the fingerprint it was made on. Never changed. */
@Entity('review')
export class Review {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'version_id', length: 36 })
  versionId: string;

  @Column('varchar', { name: 'reviewer_id', length: 36 })
  reviewerId: string;

  @Column('varchar')
  decision: ReviewDecision;

  @Column('varchar')
  comment: string;

  @Column('varchar', { length: 64 })
  fingerprint: string;

  /**
   * The calculation's title when the decision was made: what verify and the sign-off sheet say
   * was approved, whatever the calculation is called later.
   */
  @Column('varchar', { name: 'calculation_title', nullable: true })
  calculationTitle: string | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
