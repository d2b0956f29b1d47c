import { type AuthUser, hasRole } from '../auth/auth-user';
import type { Attachment } from './attachment.entity';

export interface AttachmentView {
  id: string;
  calculationId: string;
  fillLogId: string | null;
  versionNumber: number | null;
  fileName: string;
  mediaType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: { id: string; displayName: string } | null;
  createdAt: string;
  contentUrl: string;
  /** What the signed-in user may do with it. */
  permissions: { remove: boolean };
}

export function attachmentView(
  attachment: Attachment,
  uploader: { id: string; displayName: string } | null,
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
