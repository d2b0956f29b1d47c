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
}

export function attachmentView(
  attachment: Attachment,
  uploader: { id: string; displayName: string } | null,
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
  };
}
