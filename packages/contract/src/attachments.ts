import type { UserRef } from './common.js';

/** GET /api/calculations/:id/attachments: a photo or document kept with a calculation. */
export interface Attachment {
  id: string;
  calculationId: string;
  fillLogId: string | null;
  /** Set for a version's archived sign-off sheet. */
  versionNumber: number | null;
  fileName: string;
  /** As found in the content, not as the uploader's browser said. */
  mediaType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: UserRef | null;
  createdAt: string;
  contentUrl: string;
  /** What the signed-in person may do with it, as the API decides. */
  permissions: { remove: boolean };
}
