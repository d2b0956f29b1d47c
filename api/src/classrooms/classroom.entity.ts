import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** A class a teacher runs: students join it with a code and see what is published to it. */
@Entity('classroom')
export class Classroom {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'teacher_id', length: 36 })
  teacherId: string;

  @Column('varchar')
  title: string;

  /** Eight characters from an alphabet without look-alikes (join-code.ts); unique. */
  @Column('varchar', { name: 'join_code', length: 8, unique: true })
  joinCode: string;

  /** After this moment the code no longer admits anyone; a new code can be issued. */
  @Column(DATETIME, { name: 'join_code_expires_at' })
  joinCodeExpiresAt: Date;

  /** A closed class admits no one and takes no submissions; its students can still read it. */
  @Column(DATETIME, { name: 'closed_at', nullable: true })
  closedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
