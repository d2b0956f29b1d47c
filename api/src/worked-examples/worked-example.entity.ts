import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** Limits a teacher sets on one input for "try it yourself", in the input's SI unit. */
export type TryRanges = Record<string, { min: number; max: number }>;

/**
 * When a student who has answered may see the engine's values: after a right answer, after a
 * right answer or a number of attempts, or only once the class is closed. A closed class shows
 * them under every rule.
 */
export const REVEAL_RULES = ['after-correct', 'after-attempts', 'when-closed'] as const;
export type RevealRule = (typeof REVEAL_RULES)[number];

/** What makes an example an exercise: the outputs students must work out, and how close counts. */
export interface ExerciseSettings {
  hiddenOutputs: string[];
  tolerancePercent: number;
  /** Absent on exercises set before the rule existed: they reveal after a right answer. */
  reveal?: RevealRule;
  /** With 'after-attempts': how many attempts reveal the values. */
  revealAfterAttempts?: number;
}

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

  @CreateDateColumn({ name: 'published_at', type: 'datetime' })
  publishedAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime' })
  updatedAt: Date;
}
