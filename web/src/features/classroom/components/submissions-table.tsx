import { Table, Tag, Typography } from 'antd';
import { ExportButton } from '@/components/export/export-button';
import { type ExampleDetail, type Submission, useSubmissions } from '../api/classroom-api';

/** Every attempt at the exercise, one row each: who, when, and each answer right or wrong. */
export function SubmissionsTable({ example }: { example: ExampleDetail }) {
  const submissions = useSubmissions(example.id);
  const hidden = example.exercise?.hiddenOutputs ?? [];
  const stepNumber = (stepId: string | null) =>
    example.steps.findIndex((step) => step.id === stepId) + 1;
  return (
    <>
      <div style={{ marginBottom: 12 }}>
        <ExportButton
          path={`/examples/${example.id}/submissions/export`}
          what="the exercise submissions"
        />
      </div>
      <Table<Submission>
        rowKey="id"
        size="small"
        aria-label="Submissions"
        loading={submissions.isPending}
        dataSource={submissions.data ?? []}
        locale={{ emptyText: 'No answers submitted yet' }}
        pagination={{ pageSize: 50, hideOnSinglePage: true }}
        columns={[
          {
            title: 'Student',
            key: 'student',
            render: (_: unknown, row) => row.student.displayName,
          },
          { title: 'Attempt', dataIndex: 'attempt', width: 90 },
          {
            title: 'Submitted',
            dataIndex: 'submittedAt',
            render: (at: string) => new Date(at).toLocaleString(),
          },
          {
            title: 'Right',
            key: 'score',
            render: (_: unknown, row) => (
              <Tag color={row.allCorrect ? 'success' : 'error'}>
                {row.correctCount} of {row.answerCount}{' '}
                {row.allCorrect ? 'right' : 'right, not all'}
              </Tag>
            ),
          },
          ...hidden.map((name) => ({
            title: example.outputs[name]?.label ?? name,
            key: name,
            render: (_: unknown, row: Submission) => {
              const answer = row.check.answers.find((item) => item.output === name);
              if (!answer) return '—';
              return (
                <span>
                  <Tag color={answer.correct ? 'success' : 'error'}>
                    {answer.correct ? 'right' : 'wrong'}
                  </Tag>
                  <Typography.Text className="lw-mono">
                    {answer.given === null ? 'no answer' : `${answer.given} ${answer.unit}`}
                  </Typography.Text>
                </span>
              );
            },
          })),
          {
            title: 'First step gone wrong',
            key: 'step',
            render: (_: unknown, row) => {
              const number = stepNumber(row.check.firstWrongStepId);
              return number > 0 ? `${number}. ${example.steps[number - 1]?.label ?? ''}` : '—';
            },
          },
        ]}
      />
    </>
  );
}
