import type { Plan, SavePlanBody } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/**
 * A gas and cost plan for an event or a launch campaign: envelopes times counts, the supply and
 * the prices, and the server's computation of what it all takes.
 */
@Entity('gas_plan')
export class GasPlanRecord {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'owner_id', length: 36 })
  ownerId: string;

  @Column('varchar')
  title: string;

  /** The day of the event, as the planner entered it (ISO date), or empty. */
  @Column('varchar', { name: 'event_date', default: '' })
  eventDate: string;

  /** What the planner entered: lines (calculation versions or volumes) and supply settings. */
  @Column('simple-json')
  inputs: SavePlanBody;

  /** Lines with their volumes resolved, totals, and the gas-supply result. */
  @Column('simple-json')
  result: Plan['result'];

  @Column('varchar', { name: 'engine_version' })
  engineVersion: string;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: DATETIME })
  updatedAt: Date;
}
