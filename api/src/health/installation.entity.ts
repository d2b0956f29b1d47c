import { Column, Entity, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/** The single row that says when this database was created. */
@Entity('installation')
export class Installation {
  @PrimaryColumn()
  id: number;

  @Column({ name: 'created_at', type: DATETIME })
  createdAt: string;
}
