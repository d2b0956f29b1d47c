import { Alert, Descriptions, Spin, Table, Typography } from 'antd';
import { KINDS } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { localMoment } from '@/lib/local-moment';
import { useVerification } from '../api/sign-off-api';

const kindTitle = (kind: string) => KINDS.find((candidate) => candidate.id === kind)?.title ?? kind;

/** What the API says of a fingerprint: approved or not, by whom and when, and reproduced today. */
export function VerifyResult({ fingerprint }: { fingerprint: string }) {
  const verification = useVerification(fingerprint);
  // Anyone may verify, signed in or not: values in SI, in the reader's number format if known.
  const show = useNumberDisplay('si');
  if (verification.isPending) return <Spin description="Checking the fingerprint…" />;
  if (verification.error) return <Alert type="error" showIcon title={verification.error.message} />;
  const answer = verification.data;
  if (!answer.match) {
    return (
      <Alert
        type="warning"
        showIcon
        title="No approved version has this fingerprint"
        description="The sheet may be of a draft, altered, or from another installation."
      />
    );
  }
  return (
    <>
      <Alert
        type={answer.reproduces ? 'success' : 'warning'}
        showIcon
        title={
          answer.reproduces
            ? 'Approved, and today’s engine gives the same results'
            : 'Approved, but today’s engine gives different results'
        }
        style={{ marginBottom: 16 }}
      />
      <Descriptions column={1} bordered size="small">
        <Descriptions.Item label="Calculation">
          {answer.calculation.title ??
            `A ${kindTitle(answer.calculation.kind).toLowerCase()} not shared with you`}
        </Descriptions.Item>
        <Descriptions.Item label="Version">
          <span className="lw-mono">v{answer.version}</span>
        </Descriptions.Item>
        <Descriptions.Item label="Approved by">
          {answer.approvedBy?.displayName ?? 'unknown'}
        </Descriptions.Item>
        <Descriptions.Item label="Approved at">{localMoment(answer.approvedAt)}</Descriptions.Item>
        {answer.comment === null ? null : (
          <Descriptions.Item label="Comment">{answer.comment || '—'}</Descriptions.Item>
        )}
        <Descriptions.Item label="Engine at approval / now">
          <span className="lw-mono">
            {answer.engineVersionAtApproval} / {answer.currentEngineVersion}
          </span>
        </Descriptions.Item>
      </Descriptions>
      {answer.differences.length > 0 ? (
        <Table
          style={{ marginTop: 16 }}
          size="small"
          rowKey="name"
          pagination={false}
          aria-label="Results that moved"
          dataSource={answer.differences}
          columns={[
            { title: 'Result', dataIndex: 'label' },
            {
              title: 'Approved',
              dataIndex: 'approved',
              render: (value: number | null, row) =>
                value === null ? '—' : show.outputText(value, row.unit),
            },
            {
              title: 'Recomputed now',
              dataIndex: 'recomputed',
              render: (value: number | null, row) =>
                value === null ? '—' : show.outputText(value, row.unit),
            },
            {
              title: 'Moved by',
              dataIndex: 'relativeChange',
              render: (change: number | null) =>
                change === null
                  ? '—'
                  : `${change > 0 ? '+' : '−'}${show.number(Math.abs(change) * 100, { significantDigits: 2 })} %`,
            },
          ]}
        />
      ) : null}
      {answer.approvals.length > 1 ? (
        <Typography.Paragraph style={{ marginTop: 16 }}>
          The same content was approved {answer.approvals.length} times:{' '}
          {answer.approvals
            .map(
              (approval) =>
                `${approval.calculation?.title ?? 'a calculation not shared with you'} v${approval.version}`,
            )
            .join('; ')}
          .
        </Typography.Paragraph>
      ) : null}
    </>
  );
}
