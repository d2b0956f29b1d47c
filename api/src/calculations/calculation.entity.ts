import type { VersionStatus, Visibility } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

export { VISIBILITIES, type Visibility } from '@loftwright/contract';

@Entity('calculation')
export class Calculation {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar')
  title: string;

  @Column('varchar')
  kind: string;

  @Column('varchar', { name: 'owner_id', length: 36 })
  ownerId: string;

  @Column('varchar', { default: 'private' })
  visibility: Visibility;

  @Column('simple-json')
  tags: string[];

  /** Number of the newest version; a save must name it as its base. */
  @Column('integer', { name: 'latest_version' })
  latestVersion: number;

  /** Status of the newest version, kept here so lists can filter and sort on it. */
  @Column('varchar', { name: 'latest_status' })
  latestStatus: VersionStatus;

  /** Set once any version has been submitted: reviewers may then read it. */
  @Column('boolean', { name: 'ever_submitted', default: false })
  everSubmitted: boolean;

  /** The calculation this one was continued from (the design chain), if any. */
  @Column('varchar', { name: 'source_calculation_id', length: 36, nullable: true })
  sourceCalculationId: string | null;

  /** The source version the inputs were last taken from. */
  @Column('integer', { name: 'source_version_number', nullable: true })
  sourceVersionNumber: number | null;

  /** Input paths that still hold the kind's example value, to be filled by the person. */
  @Column('simple-json', { name: 'source_needs', nullable: true })
  sourceNeeds: string[] | null;

  @Column(DATETIME, { name: 'archived_at', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: DATETIME })
  updatedAt: Date;
}
