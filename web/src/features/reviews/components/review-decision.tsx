import { Alert, App, Button, Card, Divider, Input, Space } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { useDecide } from '../api/reviews-api';
import { ReviewCommentForm } from './review-comment-form';

/** Approve, or send back with a comment (required), one version waiting for review. */
export function ReviewDecision({
  calculationId,
  number,
  kind,
  inputs,
  outputs,
  unitSystem,
}: {
  calculationId: string;
  number: number;
  /** The version under review, for comments anchored to its inputs and results. */
  kind: string;
  inputs: unknown;
  outputs: Record<string, { label: string }>;
  unitSystem: UnitSystem;
}) {
  const { message } = App.useApp();
  const decide = useDecide(calculationId);
  const [comment, setComment] = useState('');
  const [missingComment, setMissingComment] = useState(false);
  const run = (decision: 'approve' | 'send-back') => {
    if (decision === 'send-back' && comment.trim() === '') {
      setMissingComment(true);
      return;
    }
    decide.mutate(
      { number, decision, comment },
      {
        onSuccess: () =>
          void message.success(
            decision === 'approve' ? `Version ${number} approved.` : `Version ${number} sent back.`,
          ),
        onError: (error) => void message.error(error.message),
      },
    );
  };
  return (
    <Card title={`Review version ${number}`} size="small" style={{ marginBottom: 16 }}>
      <Space orientation="vertical" style={{ width: '100%' }}>
        <ReviewCommentForm
          calculationId={calculationId}
          number={number}
          kind={kind}
          inputs={inputs}
          outputs={outputs}
          unitSystem={unitSystem}
        />
        <Divider style={{ margin: '8px 0' }} />
        <Input.TextArea
          aria-label="Review comment"
          placeholder="Comment (required when sending back)"
          value={comment}
          status={missingComment ? 'error' : undefined}
          onChange={(event) => {
            setComment(event.target.value);
            setMissingComment(false);
          }}
          maxLength={4000}
          autoSize={{ minRows: 2 }}
        />
        {missingComment ? (
          <Alert type="error" showIcon title="Say what needs to change before sending it back." />
        ) : null}
        <Space>
          <Button type="primary" loading={decide.isPending} onClick={() => run('approve')}>
            Approve
          </Button>
          <Button danger loading={decide.isPending} onClick={() => run('send-back')}>
            Send back
          </Button>
        </Space>
      </Space>
    </Card>
  );
}
