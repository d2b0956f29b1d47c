import { Button, Popconfirm, Space, Table } from 'antd';
import { usePlainNumbers } from '@/components/reading/use-number-display';
import type { Attachment } from '../api/attachments-api';
import type { AttachmentActions } from '../hooks/use-attachment-actions';

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

/** A file's Download button, and Remove (after asking) where the reader may remove it. */
function AttachmentRowActions({
  row,
  canRemove,
  actions,
}: {
  row: Attachment;
  canRemove: boolean;
  actions: AttachmentActions;
}) {
  return (
    <Space size={0}>
      <Button
        type="link"
        size="small"
        aria-label={`Download ${row.fileName}`}
        onClick={() => actions.download(row)}
      >
        Download
      </Button>
      {canRemove ? (
        <Popconfirm
          title={`Remove ${row.fileName}?`}
          okText="Remove"
          cancelText="Keep"
          onConfirm={() => actions.remove(row)}
        >
          <Button type="link" size="small" danger aria-label={`Remove ${row.fileName}`}>
            Remove
          </Button>
        </Popconfirm>
      ) : null}
    </Space>
  );
}

/** The files, each opened by its name, with its type, size, who added it and when. */
export function AttachmentsTable({
  title,
  rows,
  loading,
  canRemove,
  actions,
}: {
  title: string;
  rows: Attachment[];
  loading: boolean;
  canRemove: (attachment: Attachment) => boolean;
  actions: AttachmentActions;
}) {
  const plain = usePlainNumbers();
  return (
    <Table<Attachment>
      size="small"
      rowKey="id"
      style={{ marginTop: 12 }}
      loading={loading}
      dataSource={rows}
      pagination={false}
      aria-label={title}
      locale={{ emptyText: 'No files yet' }}
      columns={[
        {
          title: 'File',
          dataIndex: 'fileName',
          render: (name: string, row) => (
            <Button
              type="link"
              size="small"
              style={{ padding: 0 }}
              onClick={() => actions.open(row)}
            >
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
            <AttachmentRowActions row={row} canRemove={canRemove(row)} actions={actions} />
          ),
        },
      ]}
    />
  );
}
