import type { Submission } from '@loftwright/contract';
import { Column, CreateDateColumn, Entity, Index, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** One attempt by a student at an exercise, with the engine's check of every answer. */
@Entity('exercise_submission')
@Index(['exampleId', 'studentId'])
export class ExerciseSubmission {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'example_id', length: 36 })
  exampleId: string;

  @Column('varchar', { name: 'student_id', length: 36 })
  studentId: string;

  /** 1 for a student's first attempt at this exercise, 2 for the next… */
  @Column('integer')
  attempt: number;

  /** Answers as given, in each output's unit, by output name. */
  @Column('simple-json')
  answers: Record<string, number | null>;

  /** The engine's check (checkExerciseAnswers), with the tolerance it was checked at. */
  @Column('simple-json')
  check: Submission['check'];

  @Column('integer', { name: 'correct_count' })
  correctCount: number;

  @Column('integer', { name: 'answer_count' })
  answerCount: number;

  @Column('boolean', { name: 'all_correct' })
  allCorrect: boolean;

  @CreateDateColumn({ name: 'submitted_at', type: DATETIME })
  submittedAt: Date;
}
