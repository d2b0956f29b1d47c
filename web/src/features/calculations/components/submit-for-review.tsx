import { App, Button, Form, Modal, Select, Typography } from 'antd';
import { useState } from 'react';
import { useReviewers, useSubmitVersion } from '../api/calculations-api';

const ANY_REVIEWER = '';

/**
 * Submitting is deliberate: the button opens a confirmation that names the version and who will
 * review it (one reviewer chosen by name, or any reviewer), and says what follows.
 */
export function SubmitForReview({
  calculationId,
  versionNumber,
}: {
  calculationId: string;
  versionNumber: number;
}) {
  const { message } = App.useApp();
  const [open, setOpen] = useState(false);
  const [reviewerId, setReviewerId] = useState(ANY_REVIEWER);
  const reviewers = useReviewers(open);
  const submit = useSubmitVersion(calculationId);
  const chosen = reviewers.data?.find((reviewer) => reviewer.id === reviewerId);
  const who = chosen ? chosen.displayName : 'any reviewer';
  return (
    <>
      <Button onClick={() => setOpen(true)}>Submit version {versionNumber} for review</Button>
      <Modal
        open={open}
        title={`Submit version ${versionNumber} for review?`}
        okText={`Submit to ${who}`}
        confirmLoading={submit.isPending}
        onCancel={() => setOpen(false)}
        onOk={() =>
          submit.mutate(
            { number: versionNumber, ...(reviewerId ? { reviewerId } : {}) },
            {
              onSuccess: () => {
                setOpen(false);
                void message.success(`Version ${versionNumber} submitted to ${who}.`);
              },
              onError: (error) => void message.error(error.message),
            },
          )
        }
      >
        <Form layout="vertical">
          <Form.Item label="Reviewer" htmlFor="submit-reviewer">
            <Select
              id="submit-reviewer"
              value={reviewerId}
              loading={reviewers.isPending}
              onChange={setReviewerId}
              options={[
                { value: ANY_REVIEWER, label: 'Any reviewer' },
                ...(reviewers.data ?? []).map((reviewer) => ({
                  value: reviewer.id,
                  label: reviewer.displayName,
                })),
              ]}
            />
          </Form.Item>
        </Form>
        <Typography.Paragraph>
          Version {versionNumber} goes to {who} as it is now. The reviewer approves it, which locks
          it as the signed record, or sends it back with a comment. You can keep saving new versions
          meanwhile; they are not part of this review.
        </Typography.Paragraph>
      </Modal>
    </>
  );
}
