import type { CalculationResult, FillAmbient, FillReading } from '@loftwright/buoyancy';
import type { FillLogPoint, GasSource } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/**
 * A real fill of the envelope a calculation version describes: where and when, the air, the lift
 * readings, and the engine's reduction of them (computed on the server, like a version's results).
 */
@Entity('fill_log')
export class FillLog {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'calculation_id', length: 36 })
  calculationId: string;

  @Column('integer', { name: 'version_number' })
  versionNumber: number;

  @Column('varchar', { name: 'created_by', length: 36 })
  createdBy: string;

  /** When the envelope was filled (ISO 8601, as logged). */
  @Column('varchar', { name: 'filled_at' })
  filledAt: string;

  @Column('varchar', { default: '' })
  place: string;

  /** Which envelope was filled (a serial number, a colour), as the team names it. */
  @Column('varchar', { name: 'envelope_label', default: '' })
  envelopeLabel: string;

  /** The library envelope that was filled; null when the log names none. */
  @Column('varchar', { name: 'envelope_id', length: 36, nullable: true })
  envelopeId: string | null;

  @Column('varchar', { name: 'gas_source' })
  gasSource: GasSource;

  @Column('simple-json')
  ambient: FillAmbient;

  @Column('simple-json')
  readings: FillReading[];

  /** The scale's resolution and the ballast's tolerance [kg]; null: the engine's stated defaults. */
  @Column('simple-json', { nullable: true })
  instrument: { scaleResolutionKg: number; ballastToleranceKg: number } | null;

  @Column('varchar', { default: '' })
  note: string;

  @Column('simple-json')
  outputs: CalculationResult['outputs'];

  @Column('simple-json')
  steps: CalculationResult['steps'];

  @Column('simple-json')
  warnings: CalculationResult['warnings'];

  @Column('simple-json')
  points: FillLogPoint[];

  @Column('varchar', { name: 'engine_version' })
  engineVersion: string;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: DATETIME })
  updatedAt: Date;
}
