import {
  ForbiddenException,
  Injectable,
  NotFoundException,
  UnsupportedMediaTypeException,
  BadRequestException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { Repository } from 'typeorm';
import { type AuditRecord, AuditService } from '../audit/audit.service';
import type { AuthUser } from '../auth/auth-user';
import { canAddFiles } from '../calculations/calculation-access';
import { CalculationsService } from '../calculations/calculations.service';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { FillLog } from '../fill-logs/fill-log.entity';
import { StoredObjectMissing } from '../storage/object-store';
import { UsersService } from '../users/users.service';
import { Attachment } from './attachment.entity';
import { attachmentView, type AttachmentView, canRemoveAttachment } from './attachment-views';
import { cleanFileName } from './file-name';
import { sniffMediaType } from './media-type';
import type { StagedFile } from './staging-storage';
import { type StagedUpload, UploadStore } from './upload-store';

@Injectable()
export class AttachmentsService {
  constructor(
    @InjectRepository(Attachment) private readonly attachments: Repository<Attachment>,
    private readonly users: UsersService,
    @InjectRepository(FillLog) private readonly fillLogs: Repository<FillLog>,
    private readonly calculations: CalculationsService,
    private readonly store: UploadStore,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  /** Attachments as answered, each with what `viewer` may do with it (nothing when unknown). */
  private async views(rows: Attachment[], viewer: AuthUser | null): Promise<AttachmentView[]> {
    const names = await this.users.names(rows.map((row) => row.uploadedBy));
    return rows.map((row) =>
      attachmentView(row, names(row.uploadedBy), {
        remove: viewer !== null && canRemoveAttachment(viewer, row),
      }),
    );
  }

  /**
   * Records an upload the upload route has streamed to a temporary file. Access was checked before
   * the body was read (UploadAccessGuard); it is checked again here, as the service's own rule. A
   * refused upload's temporary file is removed.
   */
  async upload(
    user: AuthUser,
    calculationId: string,
    file: StagedFile | undefined,
    fillLogId: string | null = null,
  ): Promise<AttachmentView> {
    try {
      const calculation = await this.calculations.findReadable(user, calculationId);
      if (!canAddFiles(user, calculation)) {
        throw new ForbiddenException({
          message: 'Only the calculation’s owner or an admin adds files to it.',
        });
      }
      if (!file || file.size === 0) {
        throw new BadRequestException({
          message: 'file is required: send it as multipart/form-data in the field "file".',
          field: 'file',
        });
      }
      if (fillLogId && !(await this.fillLogs.existsBy({ id: fillLogId, calculationId }))) {
        throw new NotFoundException({
          message: 'fillLogId is not a fill log of this calculation.',
          field: 'fillLogId',
        });
      }
      const sniffed = await sniffMediaType(file.staged.head, () =>
        this.store.readStaged(file.staged),
      );
      if (!sniffed.ok) {
        throw new UnsupportedMediaTypeException({
          message: `file ${sniffed.reason}.`,
          field: 'file',
        });
      }
      return await this.record(user, calculationId, file.staged, file.size, {
        fileName: cleanFileName(file.originalname),
        mediaType: sniffed.mediaType,
        fillLogId,
        versionNumber: null,
      });
    } finally {
      if (file) await this.store.discard(file.staged);
    }
  }

  /** Stores bytes the server made itself (the archived sign-off PDF). */
  async storeGenerated(
    actorId: string | null,
    calculationId: string,
    bytes: Buffer,
    meta: { fileName: string; mediaType: string; versionNumber: number },
  ): Promise<AttachmentView> {
    const staged = await this.store.stage(bytes);
    try {
      return await this.record(
        actorId ? ({ id: actorId } as AuthUser) : null,
        calculationId,
        staged,
        bytes.length,
        { ...meta, fillLogId: null },
      );
    } finally {
      await this.store.discard(staged);
    }
  }

  /**
   * Puts staged bytes in the object store under their hash, then inserts the record under the
   * write lock, as one decision against removals (which delete, count and remove under the same
   * lock): a removal of the same content that took the bytes away between the put and this
   * turn is seen here, and the bytes are put again. The bytes are stored (synced, or acknowledged
   * by S3) before the record, so a crash in between leaves an unreferenced object, never a row
   * pointing at nothing. The put itself, a network upload with S3, holds no lock.
   */
  private async record(
    user: Pick<AuthUser, 'id'> | null,
    calculationId: string,
    staged: StagedUpload,
    sizeBytes: number,
    meta: {
      fileName: string;
      mediaType: string;
      fillLogId: string | null;
      versionNumber: number | null;
    },
  ): Promise<AttachmentView> {
    const { sha256 } = staged;
    const id = randomUUID();
    await this.store.commit(staged);
    await this.writeLock.transaction(async (manager) => {
      if (!(await this.store.exists(sha256))) await this.store.commit(staged);
      await insertRow(manager.getRepository(Attachment), {
        id,
        calculationId,
        fillLogId: meta.fillLogId,
        versionNumber: meta.versionNumber,
        sha256,
        sizeBytes,
        mediaType: meta.mediaType,
        fileName: meta.fileName,
        uploadedBy: user?.id ?? null,
      });
      await this.audit.record(
        {
          actorId: user?.id ?? null,
          action: 'attachment.add',
          targetType: 'calculation',
          targetId: calculationId,
          detail: { attachmentId: id, fileName: meta.fileName, mediaType: meta.mediaType, sha256 },
        },
        manager,
      );
    });
    const found = await this.attachments.findOneByOrFail({ id });
    const viewer = user && 'roles' in user ? (user as AuthUser) : null;
    return (await this.views([found], viewer))[0] as AttachmentView;
  }

  async list(user: AuthUser, calculationId: string, fillLogId?: string): Promise<AttachmentView[]> {
    await this.calculations.findReadable(user, calculationId);
    const rows = await this.attachments.find({
      where: { calculationId, ...(fillLogId ? { fillLogId } : {}) },
      order: { createdAt: 'ASC' },
    });
    return this.views(rows, user);
  }

  /** The attachment if its calculation is readable by the user; otherwise 404. */
  async findReadable(user: AuthUser, id: string): Promise<Attachment> {
    const attachment = await this.attachments.findOneBy({ id });
    if (!attachment) throw new NotFoundException({ message: 'No such file.', field: 'id' });
    try {
      await this.calculations.findReadable(user, attachment.calculationId);
    } catch {
      throw new NotFoundException({ message: 'No such file.', field: 'id' });
    }
    return attachment;
  }

  async content(user: AuthUser, id: string): Promise<{ attachment: Attachment; stream: Readable }> {
    const attachment = await this.findReadable(user, id);
    try {
      return { attachment, stream: await this.store.read(attachment.sha256) };
    } catch (error) {
      if (!(error instanceof StoredObjectMissing)) throw error;
      throw new NotFoundException({ message: 'The stored file is missing.', field: 'id' });
    }
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    const attachment = await this.findReadable(user, id);
    if (!canRemoveAttachment(user, attachment)) {
      throw new ForbiddenException({
        message:
          attachment.versionNumber !== null
            ? 'The archived sign-off of an approved version stays; only an admin removes it.'
            : 'Only the uploader or an admin removes a file.',
      });
    }
    await this.removeRecord(attachment, {
      actorId: user.id,
      action: 'attachment.remove',
      targetType: 'calculation',
      targetId: attachment.calculationId,
      detail: { attachmentId: id, fileName: attachment.fileName },
    });
  }

  /** A fill log's files go with it; stored bytes stay while another record uses them. */
  async removeForFillLog(fillLogId: string): Promise<void> {
    const rows = await this.attachments.findBy({ fillLogId });
    for (const row of rows) await this.removeRecord(row);
  }

  /**
   * Deletes a record and, when it was the last to use them, its bytes, in one step under the
   * write lock, so an upload of the same content (which commits its bytes and inserts its record
   * under the same lock) comes wholly before or wholly after.
   */
  private async removeRecord(row: Attachment, record?: AuditRecord): Promise<void> {
    await this.writeLock.transaction(
      async (manager) => {
        const attachments = manager.getRepository(Attachment);
        await attachments.delete({ id: row.id });
        if (record) await this.audit.record(record, manager);
        return (await attachments.countBy({ sha256: row.sha256 })) === 0;
      },
      // The bytes go once the deletion is committed, and before any other write's turn.
      async (lastUse) => {
        if (lastUse) await this.store.remove(row.sha256);
      },
    );
  }
}
