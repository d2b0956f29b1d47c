import { Table, Tag, Typography } from 'antd';
import type { TableColumnsType } from 'antd';
import { KINDS } from '@loftwright/buoyancy';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import {
  type CalculationListItem,
  type CalculationSummary,
  useCalculations,
} from '../api/calculations-api';
import { useCalculationListParams } from '../hooks/use-calculation-list-params';
import { useCalculationRowActions } from '../hooks/use-calculation-row-actions';
import { CalculationRowActions } from './calculation-row-actions';
import { CalculationsFilters } from './calculations-filters';
import { StatusTag } from './status-tag';

const KIND_TITLES = new Map(KINDS.map((kind) => [kind.id, kind.title]));

/** The list's columns; the sortable ones are sorted by the server. */
const calculationColumns = (
  calculationHref: (id: string) => string,
  actions: (row: CalculationListItem) => ReactNode,
): TableColumnsType<CalculationListItem> => [
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
  { title: 'Actions', key: 'actions', render: (_: unknown, row) => actions(row) },
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
  const { params, filter, onTableChange } = useCalculationListParams();
  const { data, isFetching, error } = useCalculations(params);
  const actions = useCalculationRowActions(onDuplicated);

  return (
    <>
      <CalculationsFilters params={params} onFilter={filter} />
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
        columns={calculationColumns(calculationHref, (row) => (
          <CalculationRowActions
            row={row}
            sheetHref={sheetHref}
            mayDuplicate={mayDuplicate}
            actions={actions}
          />
        ))}
      />
    </>
  );
}
