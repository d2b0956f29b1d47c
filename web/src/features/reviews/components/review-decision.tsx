import { Alert, App, Button, Card, Input, Space } from 'antd';
import { useState } from 'react';
import { useDecide } from '../api/reviews-api';

/** Approve, or send back with a comment (required), one version waiting for review. */
export function ReviewDecision({
  calculationId,
  number,
}: {
  calculationId: string;
  number: number;
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
