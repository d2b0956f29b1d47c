import { Input, Space, Table } from 'antd';
import { ExportButton } from '@/components/export/export-button';
import { useState } from 'react';
import { type AuditRow, useAudit } from '../api/admin-api';

/** The audit trail, newest first, filterable by action. */
export function AuditTable() {
  const [params, setParams] = useState<{ page: number; pageSize: number; action?: string }>({
    page: 1,
    pageSize: 50,
  });
  const audit = useAudit(params);
  return (
    <>
      <Space wrap style={{ marginBottom: 12 }}>
        <Input.Search
          aria-label="Filter by action"
          placeholder="Action, e.g. version.approve"
          allowClear
          style={{ width: 300 }}
          onSearch={(action) =>
            setParams({ page: 1, pageSize: params.pageSize, ...(action ? { action } : {}) })
          }
        />
        <ExportButton
          path="/admin/audit/export"
          params={params.action ? { action: params.action } : {}}
          what="the audit trail"
        />
      </Space>
      <Table<AuditRow>
        rowKey="id"
        size="small"
        loading={audit.isFetching}
        dataSource={audit.data?.items ?? []}
        onChange={(pagination) =>
          setParams((current) => ({
            ...current,
            page: pagination.current ?? 1,
            pageSize: pagination.pageSize ?? 50,
          }))
        }
        pagination={{
          current: params.page,
          pageSize: params.pageSize,
          total: audit.data?.total ?? 0,
        }}
        columns={[
          {
            title: 'When',
            dataIndex: 'createdAt',
            render: (at: string) => new Date(at).toLocaleString(),
          },
          {
            title: 'Action',
            dataIndex: 'action',
            render: (action: string) => <span className="lw-mono">{action}</span>,
          },
          {
            title: 'Who',
            dataIndex: 'actorId',
            render: (actor: string | null) => (
              <span className="lw-mono">{actor?.slice(0, 8) ?? '—'}</span>
            ),
          },
          {
            title: 'Target',
            dataIndex: 'targetType',
            render: (type: string, row) => `${type} ${row.targetId?.slice(0, 8) ?? ''}`,
          },
          {
            title: 'Details',
            dataIndex: 'detail',
            render: (detail: AuditRow['detail']) => (
              <span className="lw-mono">{detail ? JSON.stringify(detail) : ''}</span>
            ),
          },
        ]}
      />
    </>
  );
}
