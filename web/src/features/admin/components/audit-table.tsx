import { DatePicker, Select, Space, Table } from 'antd';
import { useState } from 'react';
import { ExportButton } from '@/components/export/export-button';
import { localMoment } from '@/lib/local-moment';
import {
  type AuditQuery,
  type AuditRow,
  useAudit,
  useAuditActions,
  useUsers,
} from '../api/admin-api';

/**
 * The audit trail, newest first, in words: who by name, what as a sentence, changes as
 * "label: old → new" when a row is opened. Filters by person, action and dates.
 */
export function AuditTable() {
  const [params, setParams] = useState<AuditQuery>({ page: 1, pageSize: 50 });
  const audit = useAudit(params);
  const actions = useAuditActions();
  const users = useUsers();
  const filter = (changes: Partial<AuditQuery>) =>
    setParams((current) => ({ ...current, ...changes, page: 1 }));
  // What the export takes: the filters, not the page.
  const filters = Object.fromEntries(
    Object.entries(params).filter(
      ([key, value]) => value !== undefined && key !== 'page' && key !== 'pageSize',
    ),
  );
  return (
    <>
      <Space wrap style={{ marginBottom: 12 }}>
        <Select
          aria-label="Filter by person"
          placeholder="Anyone"
          allowClear
          showSearch={{ optionFilterProp: 'label' }}
          style={{ minWidth: 200 }}
          value={params.actorId}
          onChange={(actorId?: string) => filter({ actorId })}
          options={(users.data ?? []).map((user) => ({ value: user.id, label: user.displayName }))}
        />
        <Select
          aria-label="Filter by action"
          placeholder="Any action"
          allowClear
          showSearch={{ optionFilterProp: 'label' }}
          style={{ minWidth: 240 }}
          value={params.action}
          onChange={(action?: string) => filter({ action })}
          options={(actions.data ?? []).map((item) => ({
            value: item.action,
            label: item.words.replace(/^./, (first) => first.toUpperCase()),
          }))}
        />
        <DatePicker.RangePicker
          aria-label="Filter by date"
          allowEmpty={[true, true]}
          onChange={(range) =>
            filter({
              from: range?.[0]?.startOf('day').toISOString(),
              to: range?.[1]?.endOf('day').toISOString(),
            })
          }
        />
        <ExportButton path="/admin/audit/export" params={filters} what="the audit trail" />
      </Space>
      <Table<AuditRow>
        rowKey="id"
        size="small"
        aria-label="Audit trail"
        loading={audit.isFetching}
        dataSource={audit.data?.items ?? []}
        tableLayout="fixed"
        expandable={{
          rowExpandable: (row) => row.changes.length > 0,
          expandedRowRender: (row) => (
            <ul style={{ margin: 0 }}>
              {row.changes.map((change) => (
                <li key={change.label}>
                  {change.label}: {change.from ?? '—'} → {change.to ?? '—'}
                </li>
              ))}
            </ul>
          ),
        }}
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
            width: '14rem',
            render: (at: string) => localMoment(at),
          },
          {
            title: 'Who',
            dataIndex: 'actor',
            width: '12rem',
            ellipsis: true,
            render: (actor: AuditRow['actor']) => actor?.displayName ?? '—',
          },
          { title: 'What happened', dataIndex: 'summary' },
        ]}
      />
    </>
  );
}
