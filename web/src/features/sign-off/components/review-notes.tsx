import { Alert, Space } from 'antd';
import { localMoment } from '@/lib/local-moment';
import { useReviewedVersion } from '../api/sign-off-api';

/**
 * What reviewers said of one version, with who and when: an approval or a send-back and its
 * comment, so the designer reads it beside the calculation, not only in the mail.
 */
export function ReviewNotes({ calculationId, number }: { calculationId: string; number: number }) {
  const version = useReviewedVersion(calculationId, number);
  const reviews = version.data?.reviews ?? [];
  if (reviews.length === 0) return null;
  return (
    <Space orientation="vertical" style={{ width: '100%', marginBottom: 12 }}>
      {reviews.map((review) => {
        const approved = review.decision === 'approved';
        return (
          <Alert
            key={`${review.createdAt}-${review.decision}`}
            type={approved ? 'success' : 'warning'}
            showIcon
            title={`${review.reviewer?.displayName ?? 'A reviewer'} ${approved ? 'approved' : 'sent back'} version ${number} on ${localMoment(review.createdAt)}`}
            description={review.comment ? `“${review.comment}”` : 'No comment.'}
          />
        );
      })}
    </Space>
  );
}
