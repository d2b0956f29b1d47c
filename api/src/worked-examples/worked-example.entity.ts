import type {
  CalculationWarning,
  DataSeries,
  DerivationStep,
  OutputQuantity,
} from '@loftwright/buoyancy';
import type { ExerciseSettings, TryRanges } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';

export {
  REVEAL_RULES,
  type ExerciseSettings,
  type RevealRule,
  type TryRanges,
} from '@loftwright/contract';
import { DATETIME } from '../database/column-types';

/**
 * A calculation version published to a class. The calculation content (inputs, outputs, steps,
 * warnings, series, engine version, fingerprint) is a copy of that exact version, so later
 * versions of the calculation never change what the class was shown; the teacher's words and
 * settings around it may change.
 */
@Entity('worked_example')
@Index(['classroomId'])
export class WorkedExample {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'classroom_id', length: 36 })
  classroomId: string;

  @Column('varchar', { name: 'teacher_id', length: 36 })
  teacherId: string;

  @Column('varchar')
  title: string;

  @Column('text', { default: '' })
  intro: string;

  @Column('varchar', { name: 'calculation_id', length: 36 })
  calculationId: string;

  @Column('integer', { name: 'version_number' })
  versionNumber: number;

  @Column('varchar')
  kind: string;

  @Column('simple-json')
  inputs: Record<string, unknown>;

  @Column('simple-json')
  outputs: Record<string, OutputQuantity>;

  @Column('simple-json')
  steps: readonly DerivationStep[];

  @Column('simple-json')
  warnings: readonly CalculationWarning[];

  @Column('simple-json', { nullable: true })
  series: Record<string, DataSeries> | null;

  @Column('varchar', { name: 'engine_version' })
  engineVersion: string;

  @Column('varchar', { length: 64 })
  fingerprint: string;

  /** The teacher's note on a step, by step id. */
  @Column('simple-json', { name: 'step_notes' })
  stepNotes: Record<string, string>;

  @Column('simple-json', { name: 'try_ranges' })
  tryRanges: TryRanges;

  /** The step at which the walk-through shows the chart; null puts it after the last step. */
  @Column('varchar', { name: 'chart_step_id', nullable: true })
  chartStepId: string | null;

  @Column('simple-json', { nullable: true })
  exercise: ExerciseSettings | null;

  @CreateDateColumn({ name: 'published_at', type: DATETIME })
  publishedAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: DATETIME })
  updatedAt: Date;
}
