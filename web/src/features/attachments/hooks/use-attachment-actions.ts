import { App } from 'antd';
import { useState } from 'react';
import { saveBlob } from '@/lib/save-blob';
import { type Attachment, fetchAttachmentBlob, useRemoveAttachment } from '../api/attachments-api';

const previewable = (attachment: Attachment) =>
  attachment.mediaType.startsWith('image/') || attachment.mediaType.startsWith('text/');

/**
 * What a reader does with a file: open it (a preview for images and text, else a new tab),
 * download it, or remove it; failures are said in a message.
 */
export function useAttachmentActions(calculationId: string) {
  const { message } = App.useApp();
  const remove = useRemoveAttachment(calculationId);
  const [previewing, setPreviewing] = useState<Attachment | null>(null);

  const open = (attachment: Attachment) => {
    if (previewable(attachment)) {
      setPreviewing(attachment);
      return;
    }
    // Opened before the bytes arrive, so the browser treats it as the user's own click.
    const tab = window.open('', '_blank');
    fetchAttachmentBlob(attachment).then(
      (blob) => {
        const url = URL.createObjectURL(blob);
        if (tab) tab.location.href = url;
        else saveBlob(blob, attachment.fileName);
      },
      (error: Error) => {
        tab?.close();
        void message.error(error.message);
      },
    );
  };

  return {
    open,
    /** The file shown in the preview, if any. */
    previewing,
    closePreview: () => setPreviewing(null),
    download: (attachment: Attachment) =>
      void fetchAttachmentBlob(attachment).then(
        (blob) => saveBlob(blob, attachment.fileName),
        (error: Error) => void message.error(error.message),
      ),
    remove: (attachment: Attachment) =>
      remove.mutateAsync(attachment.id).then(
        () => void message.success(`Removed ${attachment.fileName}.`),
        (error: Error) => void message.error(error.message),
      ),
  };
}

export type AttachmentActions = ReturnType<typeof useAttachmentActions>;
