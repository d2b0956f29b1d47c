import { Table, Typography } from 'antd';
import { Link } from 'react-router-dom';
import type { VersionSummary } from '../api/calculations-api';
import { StatusTag } from './status-tag';

/** Every saved version, newest first, with its author, note, time, status and fingerprint. */
export function VersionHistory({
  versions,
  sheetHref,
}: {
  versions: readonly VersionSummary[];
  sheetHref: (number: number) => string;
}) {
  return (
    <Table<VersionSummary>
      size="small"
      rowKey="number"
      pagination={false}
      dataSource={[...versions].reverse()}
      columns={[
        {
          title: 'Sheet',
          key: 'sheet',
          dataIndex: 'number',
          render: (number: number) => <Link to={sheetHref(number)}>Sign-off sheet</Link>,
        },
        {
          title: 'Version',
          dataIndex: 'number',
          render: (number: number) => <span className="lw-mono">v{number}</span>,
        },
        {
          title: 'Status',
          dataIndex: 'status',
          render: (status: VersionSummary['status']) => <StatusTag status={status} />,
        },
        {
          title: 'Author',
          dataIndex: 'author',
          render: (author: VersionSummary['author']) => author?.displayName ?? '',
        },
        { title: 'Note', dataIndex: 'note' },
        {
          title: 'Saved',
          dataIndex: 'createdAt',
          render: (at: string) => new Date(at).toLocaleString(),
        },
        {
          title: 'Fingerprint',
          dataIndex: 'fingerprint',
          render: (fingerprint: string) => (
            <Typography.Text
              className="lw-mono"
              copyable={{ text: fingerprint }}
              title={fingerprint}
            >
              {fingerprint.slice(0, 12)}…
            </Typography.Text>
          ),
        },
      ]}
    />
  );
}
