import { Table, Tag } from 'antd';
import { Link } from 'react-router-dom';
import { type ExampleSummary, useClassExamples } from '../api/classroom-api';

/** The worked examples published to a class, in the order they were published. */
export function ExamplesTable({
  classId,
  exampleHref,
  forStudent,
}: {
  classId: string;
  exampleHref: (id: string) => string;
  forStudent: boolean;
}) {
  const examples = useClassExamples(classId);
  return (
    <Table<ExampleSummary>
      rowKey="id"
      size="middle"
      aria-label="Worked examples"
      loading={examples.isPending}
      dataSource={examples.data ?? []}
      locale={{ emptyText: 'Nothing published to this class yet' }}
      pagination={{ hideOnSinglePage: true }}
      columns={[
        {
          title: 'Worked example',
          dataIndex: 'title',
          render: (title: string, row) => <Link to={exampleHref(row.id)}>{title}</Link>,
        },
        { title: 'Kind', dataIndex: 'kind' },
        {
          title: 'Exercise',
          key: 'exercise',
          render: (_: unknown, row) =>
            row.isExercise ? <Tag color="warning">exercise, ±{row.tolerancePercent} %</Tag> : '—',
        },
        ...(forStudent
          ? [
              {
                title: 'Your answers',
                key: 'mine',
                render: (_: unknown, row: ExampleSummary) => {
                  if (!row.isExercise) return '—';
                  if (!row.myAttempts) return 'not yet';
                  return row.myLatestAllCorrect ? (
                    <Tag color="success">all right</Tag>
                  ) : (
                    <Tag color="error">not all right yet</Tag>
                  );
                },
              },
            ]
          : [{ title: 'Version', dataIndex: 'versionNumber', render: (n: number) => `v${n}` }]),
        {
          title: 'Published',
          dataIndex: 'publishedAt',
          render: (at: string) => new Date(at).toLocaleDateString(),
        },
      ]}
    />
  );
}
