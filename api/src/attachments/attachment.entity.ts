import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { DATETIME } from '../database/column-types';

/**
 * An uploaded file's record. The bytes live under DATA_DIR/uploads, named by their SHA-256, so
 * the same photo uploaded twice is stored once; this row says who uploaded what to where.
 */
@Entity('attachment')
export class Attachment {
  @PrimaryColumn('varchar', { length: 36 })
  id: string;

  @Column('varchar', { name: 'calculation_id', length: 36 })
  calculationId: string;

  /** Set when the file belongs to a fill log of the calculation rather than to the calculation. */
  @Column('varchar', { name: 'fill_log_id', length: 36, nullable: true })
  fillLogId: string | null;

  /** Set for the sign-off PDF archived with an approved version. */
  @Column('integer', { name: 'version_number', nullable: true })
  versionNumber: number | null;

  @Column('varchar', { length: 64 })
  sha256: string;

  @Column('integer', { name: 'size_bytes' })
  sizeBytes: number;

  /** Media type found from the content, never taken from the client. */
  @Column('varchar', { name: 'media_type' })
  mediaType: string;

  /** The client's file name, cleaned, for display and downloads only. */
  @Column('varchar', { name: 'file_name' })
  fileName: string;

  @Column('varchar', { name: 'uploaded_by', length: 36, nullable: true })
  uploadedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: DATETIME })
  createdAt: Date;
}
