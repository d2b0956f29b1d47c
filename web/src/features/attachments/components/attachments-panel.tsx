import { Card, Modal } from 'antd';
import { type Attachment, useAttachments } from '../api/attachments-api';
import { useAttachmentActions } from '../hooks/use-attachment-actions';
import { AttachmentPreview } from './attachment-preview';
import { AttachmentUpload } from './attachment-upload';
import { AttachmentsTable } from './attachments-table';

/**
 * Files kept with a calculation (or one fill log of it): photos of the set-up and the scale,
 * logger CSV files, PDFs. Upload with progress, preview, download, remove.
 */
export function AttachmentsPanel({
  calculationId,
  fillLogId,
  canUpload,
  canRemove,
  title = 'Files',
}: {
  calculationId: string;
  fillLogId?: string;
  canUpload: boolean;
  canRemove: (attachment: Attachment) => boolean;
  title?: string;
}) {
  const attachments = useAttachments(calculationId);
  const actions = useAttachmentActions(calculationId);
  const rows = (attachments.data ?? []).filter((item) =>
    fillLogId ? item.fillLogId === fillLogId : item.fillLogId === null,
  );

  return (
    <Card title={title} size="small" style={{ marginTop: 16 }}>
      <AttachmentUpload calculationId={calculationId} fillLogId={fillLogId} canUpload={canUpload} />
      <AttachmentsTable
        title={title}
        rows={rows}
        loading={attachments.isPending}
        canRemove={canRemove}
        actions={actions}
      />
      <Modal
        open={actions.previewing !== null}
        title={actions.previewing?.fileName}
        width={900}
        footer={null}
        onCancel={actions.closePreview}
        destroyOnHidden
      >
        {actions.previewing ? <AttachmentPreview attachment={actions.previewing} /> : null}
      </Modal>
    </Card>
  );
}
