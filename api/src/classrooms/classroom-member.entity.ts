import { CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** A student on a class's roster. Removing a student deletes the row. */
@Entity('classroom_member')
export class ClassroomMember {
  @PrimaryColumn('varchar', { name: 'classroom_id', length: 36 })
  classroomId: string;

  @PrimaryColumn('varchar', { name: 'student_id', length: 36 })
  studentId: string;

  @CreateDateColumn({ name: 'joined_at', type: DATETIME })
  joinedAt: Date;
}
