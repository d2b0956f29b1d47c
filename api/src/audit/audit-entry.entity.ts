import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** Who did what to which thing, and when. Rows are only ever inserted. */
@Entity('audit_entry')
export class AuditEntry {
  @PrimaryGeneratedColumn()
  id: number;

  @Column('varchar', { name: 'actor_id', length: 36, nullable: true })
  actorId: string | null;

  @Index()
  @Column('varchar')
  action: string;

  @Column('varchar', { name: 'target_type' })
  targetType: string;

  @Column('varchar', { name: 'target_id', nullable: true })
  targetId: string | null;

  @Column('simple-json', { nullable: true })
  detail: Record<string, unknown> | null;

  @Index()
  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
