import type { LibraryEnvelopeKind } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { DATETIME, DOUBLE } from '../database/column-types';

/** One envelope the team keeps on its shelf, its figures in SI. */
@Entity('envelope')
export class Envelope {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar')
  name: string;

  @Column('varchar')
  kind: LibraryEnvelopeKind;

  @Column(DOUBLE, { name: 'mass_kg' })
  massKg: number;

  /** Extensible envelopes only [m]. */
  @Column(DOUBLE, { name: 'burst_diameter_m', nullable: true })
  burstDiameterM: number | null;

  /** Fixed envelopes only [Pa]. */
  @Column(DOUBLE, { name: 'rated_superpressure_pa', nullable: true })
  ratedSuperpressurePa: number | null;

  @Column(DOUBLE, { name: 'drag_coefficient', nullable: true })
  dragCoefficient: number | null;

  @Column('varchar', { default: '' })
  film: string;

  @Column('varchar', { default: '' })
  notes: string;

  /** Bumped by every change, so an edit started from an older one is refused (409). */
  @Column('integer', { default: 1 })
  version: number;

  /** Null for the starter examples the first start writes. */
  @Column('varchar', { name: 'created_by', length: 36, nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: DATETIME })
  updatedAt: Date;
}
