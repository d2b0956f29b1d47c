import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** A message the local fake mail server received, kept so an admin can read it. */
@Entity('outbox_message')
export class OutboxMessage {
  @PrimaryGeneratedColumn()
  id: number;

  @Column('varchar')
  from: string;

  @Column('simple-json')
  to: string[];

  @Column('varchar')
  subject: string;

  @Column('text')
  text: string;

  @Column('simple-json', { default: '[]' })
  attachments: { filename: string; contentType: string; sizeBytes: number }[];

  @Column('varchar', { name: 'message_id', nullable: true })
  messageId: string | null;

  @CreateDateColumn({ name: 'received_at', type: DATETIME })
  receivedAt: Date;
}
