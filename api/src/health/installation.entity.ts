import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The single row that says when this database was created. */
@Entity('installation')
export class Installation {
  @PrimaryColumn()
  id: number;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: string;
}
