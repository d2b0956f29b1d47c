import type { Attachment as AttachmentShape, UserRef } from '@loftwright/contract';
import { type AuthUser, hasRole } from '../auth/auth-user';
import type { Attachment } from './attachment.entity';

/** A file as the API shows it (the contract's Attachment). */
export type AttachmentView = AttachmentShape;

export function attachmentView(
  attachment: Attachment,
  uploader: UserRef | null,
  permissions: { remove: boolean },
): AttachmentView {
  return {
    id: attachment.id,
    calculationId: attachment.calculationId,
    fillLogId: attachment.fillLogId,
    versionNumber: attachment.versionNumber,
    fileName: attachment.fileName,
    mediaType: attachment.mediaType,
    sizeBytes: attachment.sizeBytes,
    sha256: attachment.sha256,
    uploadedBy: uploader,
    createdAt: attachment.createdAt.toISOString(),
    contentUrl: `/api/attachments/${attachment.id}/content`,
    permissions,
  };
}

/**
 * The uploader or an admin removes a file; an archived sign-off (a file of a version) only an
 * admin removes.
 */
export function canRemoveAttachment(
  user: AuthUser,
  attachment: Pick<Attachment, 'uploadedBy' | 'versionNumber'>,
): boolean {
  if (hasRole(user, 'admin')) return true;
  return attachment.uploadedBy === user.id && attachment.versionNumber === null;
}
