import { InboxOutlined } from '@ant-design/icons';
import {
  App,
  Button,
  Card,
  Modal,
  Popconfirm,
  Progress,
  Space,
  Table,
  Typography,
  Upload,
} from 'antd';
import { useState } from 'react';
import {
  type Attachment,
  fetchAttachmentBlob,
  useAttachments,
  useRemoveAttachment,
  useUploadAttachment,
} from '../api/attachments-api';
import { saveBlob } from '@/lib/save-blob';
import { AttachmentPreview } from './attachment-preview';
import { usePlainNumbers } from '@/components/reading/use-number-display';

const TYPE_NAMES: Record<string, string> = {
  'image/jpeg': 'JPEG image',
  'image/png': 'PNG image',
  'image/webp': 'WebP image',
  'image/gif': 'GIF image',
  'application/pdf': 'PDF',
  'text/csv': 'CSV',
  'text/plain': 'Text',
};

const sizeText = (bytes: number, fixed: (value: number, decimals: number) => string) =>
  bytes < 1024
    ? `${bytes} B`
    : bytes < 1024 * 1024
      ? `${fixed(bytes / 1024, 1)} kB`
      : `${fixed(bytes / (1024 * 1024), 1)} MB`;

const previewable = (attachment: Attachment) =>
  attachment.mediaType.startsWith('image/') || attachment.mediaType.startsWith('text/');

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
  const { message } = App.useApp();
  const plain = usePlainNumbers();
  const attachments = useAttachments(calculationId);
  const upload = useUploadAttachment(calculationId);
  const remove = useRemoveAttachment(calculationId);
  const [progress, setProgress] = useState<{ name: string; percent: number } | null>(null);
  const [previewing, setPreviewing] = useState<Attachment | null>(null);
  const rows = (attachments.data ?? []).filter((item) =>
    fillLogId ? item.fillLogId === fillLogId : item.fillLogId === null,
  );

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

  return (
    <Card title={title} size="small" style={{ marginTop: 16 }}>
      {canUpload ? (
        <Upload.Dragger
          multiple
          showUploadList={false}
          aria-label="Add files"
          customRequest={({ file, onSuccess, onError }) => {
            const chosen = file as File;
            setProgress({ name: chosen.name, percent: 0 });
            upload.mutate(
              {
                file: chosen,
                fillLogId,
                onProgress: (percent) => setProgress({ name: chosen.name, percent }),
              },
              {
                onSuccess: (saved) => {
                  setProgress(null);
                  onSuccess?.(saved);
                  void message.success(`Added ${saved.fileName}.`);
                },
                onError: (error) => {
                  setProgress(null);
                  onError?.(error);
                  void message.error(`${chosen.name}: ${error.message}`);
                },
              },
            );
          }}
        >
          <p className="ant-upload-drag-icon">
            <InboxOutlined />
          </p>
          <p className="ant-upload-text">Drop files here or click to choose</p>
          <p className="ant-upload-hint">
            Photos of the set-up and the scale, PDFs, data-logger CSV or text files, up to 20 MB
            each. The type is checked from the content.
          </p>
        </Upload.Dragger>
      ) : null}
      {progress ? (
        <div role="status" aria-label="Upload progress" style={{ marginTop: 8 }}>
          <Typography.Text>Uploading {progress.name}</Typography.Text>
          <Progress percent={progress.percent} size="small" />
        </div>
      ) : null}
      <Table<Attachment>
        size="small"
        rowKey="id"
        style={{ marginTop: 12 }}
        loading={attachments.isPending}
        dataSource={rows}
        pagination={false}
        aria-label={title}
        locale={{ emptyText: 'No files yet' }}
        columns={[
          {
            title: 'File',
            dataIndex: 'fileName',
            render: (name: string, row) => (
              <Button type="link" size="small" style={{ padding: 0 }} onClick={() => open(row)}>
                {name}
              </Button>
            ),
          },
          {
            title: 'Type',
            dataIndex: 'mediaType',
            render: (type: string, row) =>
              row.versionNumber === null
                ? (TYPE_NAMES[type] ?? type)
                : `Sign-off sheet of version ${row.versionNumber}`,
          },
          {
            title: 'Size',
            dataIndex: 'sizeBytes',
            render: (bytes: number) => sizeText(bytes, plain.fixed),
          },
          {
            title: 'Added by',
            dataIndex: 'uploadedBy',
            render: (who: Attachment['uploadedBy']) => who?.displayName ?? 'Loftwright',
          },
          {
            title: 'When',
            dataIndex: 'createdAt',
            render: (at: string) => new Date(at).toLocaleString(),
          },
          {
            title: 'Actions',
            key: 'actions',
            render: (_: unknown, row) => (
              <Space size={0}>
                <Button
                  type="link"
                  size="small"
                  aria-label={`Download ${row.fileName}`}
                  onClick={() =>
                    void fetchAttachmentBlob(row).then(
                      (blob) => saveBlob(blob, row.fileName),
                      (error: Error) => void message.error(error.message),
                    )
                  }
                >
                  Download
                </Button>
                {canRemove(row) ? (
                  <Popconfirm
                    title={`Remove ${row.fileName}?`}
                    okText="Remove"
                    cancelText="Keep"
                    onConfirm={() =>
                      remove.mutateAsync(row.id).then(
                        () => void message.success(`Removed ${row.fileName}.`),
                        (error: Error) => void message.error(error.message),
                      )
                    }
                  >
                    <Button type="link" size="small" danger aria-label={`Remove ${row.fileName}`}>
                      Remove
                    </Button>
                  </Popconfirm>
                ) : null}
              </Space>
            ),
          },
        ]}
      />
      <Modal
        open={previewing !== null}
        title={previewing?.fileName}
        width={900}
        footer={null}
        onCancel={() => setPreviewing(null)}
        destroyOnHidden
      >
        {previewing ? <AttachmentPreview attachment={previewing} /> : null}
      </Modal>
    </Card>
  );
}
