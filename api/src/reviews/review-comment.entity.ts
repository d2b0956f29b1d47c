import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** Where a review comment points: one input (by its dotted path) or one result (by its name). */
export type CommentAnchorKind = 'input' | 'result';

/**
 * A reviewer's comment on one version, anchored to an input or a result or to the whole version.
 * The owner marks it addressed by a later version. Comments sit beside versions and never change
 * one, approved or not.
 */
@Entity('review_comment')
@Index(['calculationId'])
export class ReviewComment {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'calculation_id', length: 36 })
  calculationId: string;

  @Column('integer', { name: 'version_number' })
  versionNumber: number;

  @Column('varchar', { name: 'author_id', length: 36 })
  authorId: string;

  @Column('varchar', { name: 'anchor_kind', nullable: true })
  anchorKind: CommentAnchorKind | null;

  @Column('varchar', { name: 'anchor_path', nullable: true })
  anchorPath: string | null;

  @Column('text')
  body: string;

  @Column('integer', { name: 'addressed_in_version', nullable: true })
  addressedInVersion: number | null;

  @Column('varchar', { name: 'addressed_by', length: 36, nullable: true })
  addressedBy: string | null;

  @Column(DATETIME, { name: 'addressed_at', nullable: true })
  addressedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
