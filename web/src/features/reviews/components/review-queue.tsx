import { Empty, Table, Typography } from 'antd';
import { KINDS } from '@loftwright/buoyancy';
import { Link } from 'react-router-dom';
import { type ReviewQueueItem, useReviewQueue } from '../api/reviews-api';

const KIND_TITLES = new Map(KINDS.map((kind) => [kind.id, kind.title]));

/** Versions waiting for this reviewer, oldest submission first. */
export function ReviewQueue({ calculationHref }: { calculationHref: (id: string) => string }) {
  const queue = useReviewQueue();
  if (queue.error) return <Typography.Text type="danger">{queue.error.message}</Typography.Text>;
  return (
    <Table<ReviewQueueItem>
      rowKey={(item) => `${item.calculationId}-${item.number}`}
      loading={queue.isPending}
      dataSource={queue.data ?? []}
      locale={{ emptyText: <Empty description="Nothing waits for your review." /> }}
      pagination={false}
      columns={[
        {
          title: 'Calculation',
          dataIndex: 'title',
          render: (title: string, item) => (
            <Link to={calculationHref(item.calculationId)}>{title}</Link>
          ),
        },
        {
          title: 'Version',
          dataIndex: 'number',
          render: (number: number) => <span className="lw-mono">v{number}</span>,
        },
        {
          title: 'Kind',
          dataIndex: 'kind',
          render: (kind: string) => KIND_TITLES.get(kind) ?? kind,
        },
        {
          title: 'Author',
          dataIndex: 'author',
          render: (author: ReviewQueueItem['author']) => author?.displayName ?? '',
        },
        {
          title: 'Asked of',
          dataIndex: 'reviewer',
          render: (reviewer: ReviewQueueItem['reviewer']) =>
            reviewer?.displayName ?? 'any reviewer',
        },
        {
          title: 'Submitted',
          dataIndex: 'submittedAt',
          render: (at: string | null) => (at ? new Date(at).toLocaleString() : ''),
        },
      ]}
    />
  );
}
