import { App, Button, Input, Popconfirm, Select, Space, Table, Tag, Typography } from 'antd';
import type { TablePaginationConfig } from 'antd';
import type { SorterResult } from 'antd/es/table/interface';
import { KINDS } from '@loftwright/buoyancy';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import {
  type CalculationListItem,
  type CalculationSummary,
  type ListParams,
  useArchiveCalculation,
  useCalculations,
  useDuplicateCalculation,
} from '../api/calculations-api';
import { ExportButton } from '@/components/export/export-button';
import { StatusTag } from './status-tag';

const KIND_TITLES = new Map(KINDS.map((kind) => [kind.id, kind.title]));
const STATUS_OPTIONS = [
  { value: 'draft', label: 'Draft' },
  { value: 'in_review', label: 'In review' },
  { value: 'approved', label: 'Approved' },
  { value: 'changes_requested', label: 'Changes requested' },
];

/** Server-side paged, sorted and filtered list of the calculations the user may see. */
export function CalculationsTable({
  calculationHref,
  sheetHref,
  mayDuplicate,
  onDuplicated,
}: {
  calculationHref: (id: string) => string;
  sheetHref: (id: string, version: number) => string;
  /** Whether the signed-in user may archive this one (its owner, or an admin). */
  mayDuplicate: boolean;
  onDuplicated: (id: string) => void;
}) {
  const { message } = App.useApp();
  const archive = useArchiveCalculation();
  const duplicate = useDuplicateCalculation();
  const [params, setParams] = useState<ListParams>({ page: 1, pageSize: 20, sort: '-updatedAt' });
  const { data, isFetching, error } = useCalculations(params);
  const set = (changes: Partial<ListParams>) =>
    setParams((current) => ({ ...current, page: 1, ...changes }));

  const onTableChange = (
    pagination: TablePaginationConfig,
    _filters: unknown,
    sorter: SorterResult<CalculationListItem> | SorterResult<CalculationListItem>[],
  ) => {
    const single = Array.isArray(sorter) ? sorter[0] : sorter;
    const field = typeof single?.field === 'string' ? single.field : undefined;
    const sort =
      field && single?.order ? `${single.order === 'descend' ? '-' : ''}${field}` : '-updatedAt';
    setParams((current) => ({
      ...current,
      page: pagination.current ?? 1,
      pageSize: pagination.pageSize ?? 20,
      sort,
    }));
  };

  return (
    <>
      <Space wrap style={{ marginBottom: 12 }}>
        <Input.Search
          aria-label="Search titles and tags"
          placeholder="Search titles and tags"
          allowClear
          onSearch={(q) => set({ q: q || undefined })}
          style={{ width: 260 }}
        />
        <Select
          aria-label="Kind"
          placeholder="Any kind"
          allowClear
          style={{ width: 200 }}
          options={KINDS.map((kind) => ({ value: kind.id, label: kind.title }))}
          onChange={(kind?: string) => set({ kind })}
        />
        <Select
          aria-label="Status"
          placeholder="Any status"
          allowClear
          style={{ width: 180 }}
          options={STATUS_OPTIONS}
          onChange={(status?: string) => set({ status })}
        />
        <Select
          aria-label="Owner"
          style={{ width: 150 }}
          value={params.owner ?? 'anyone'}
          options={[
            { value: 'anyone', label: 'Anyone' },
            { value: 'me', label: 'Mine' },
          ]}
          onChange={(owner: string) => set({ owner: owner === 'anyone' ? undefined : owner })}
        />
        <Input
          aria-label="Tag"
          placeholder="Tag"
          allowClear
          style={{ width: 140 }}
          onPressEnter={(event) =>
            set({ tag: (event.target as HTMLInputElement).value || undefined })
          }
          onChange={(event) => (event.target.value === '' ? set({ tag: undefined }) : undefined)}
        />
        <ExportButton path="/calculations/export" params={{ ...params }} what="the calculations" />
      </Space>
      {error ? <Typography.Text type="danger">{error.message}</Typography.Text> : null}
      <Table<CalculationListItem>
        rowKey="id"
        size="middle"
        loading={isFetching}
        dataSource={data?.items ?? []}
        onChange={onTableChange}
        pagination={{
          current: params.page,
          pageSize: params.pageSize,
          total: data?.total ?? 0,
          showSizeChanger: true,
          showTotal: (total) => `${total} calculations`,
        }}
        columns={[
          {
            title: 'Title',
            dataIndex: 'title',
            sorter: true,
            render: (title: string, row) => <Link to={calculationHref(row.id)}>{title}</Link>,
          },
          {
            title: 'Kind',
            dataIndex: 'kind',
            sorter: true,
            render: (kind: string) => KIND_TITLES.get(kind) ?? kind,
          },
          {
            title: 'Status',
            dataIndex: 'status',
            sorter: true,
            render: (status: CalculationSummary['status']) => <StatusTag status={status} />,
          },
          {
            title: 'Version',
            dataIndex: 'latestVersion',
            render: (version: number) => <span className="lw-mono">v{version}</span>,
          },
          {
            title: 'Owner',
            dataIndex: 'owner',
            render: (owner: CalculationSummary['owner']) => owner?.displayName ?? '',
          },
          {
            title: 'Tags',
            dataIndex: 'tags',
            render: (tags: string[]) => tags.map((tag) => <Tag key={tag}>{tag}</Tag>),
          },
          {
            title: 'Updated',
            dataIndex: 'updatedAt',
            sorter: true,
            defaultSortOrder: 'descend',
            render: (at: string) => new Date(at).toLocaleString(),
          },
          {
            title: 'Actions',
            key: 'actions',
            render: (_: unknown, row) => (
              <Space size={0} wrap>
                <Link
                  to={sheetHref(row.id, row.latestVersion)}
                  aria-label={`Sign-off sheet of ${row.title}`}
                >
                  Sheet
                </Link>
                {mayDuplicate ? (
                  <Button
                    type="link"
                    size="small"
                    aria-label={`Duplicate ${row.title}`}
                    loading={duplicate.isPending && duplicate.variables === row.id}
                    onClick={() =>
                      duplicate.mutate(row.id, {
                        onSuccess: (copy) => onDuplicated(copy.id),
                        onError: (failure) => void message.error(failure.message),
                      })
                    }
                  >
                    Duplicate
                  </Button>
                ) : null}
                {row.permissions.archive ? (
                  <Popconfirm
                    title={`Archive “${row.title}”?`}
                    description="It leaves the lists; its versions and sign-offs stay verifiable."
                    okText="Archive"
                    cancelText="Keep"
                    onConfirm={() =>
                      archive.mutateAsync(row.id).then(
                        () => void message.success(`Archived “${row.title}”.`),
                        (failure: Error) => void message.error(failure.message),
                      )
                    }
                  >
                    <Button type="link" size="small" danger aria-label={`Archive ${row.title}`}>
                      Archive
                    </Button>
                  </Popconfirm>
                ) : null}
              </Space>
            ),
          },
        ]}
      />
    </>
  );
}
