import { Button, Card, List, Space, Tag, Typography } from 'antd';
import { localMoment } from '@/lib/local-moment';
import { type ReviewComment, useMarkAddressed, useReviewComments } from '../api/reviews-api';

/**
 * Every review comment on a calculation: open ones first, each with who, when, the version and
 * what it is about; the owner marks one addressed by the latest version.
 */
export function ReviewCommentsPanel({
  calculationId,
  latestVersion,
  canMarkAddressed,
}: {
  calculationId: string;
  latestVersion: number;
  canMarkAddressed: boolean;
}) {
  const comments = useReviewComments(calculationId);
  const mark = useMarkAddressed(calculationId);
  const items = comments.data ?? [];
  if (items.length === 0) return null;
  const ordered = [
    ...items.filter((comment) => comment.addressed === null),
    ...items.filter((comment) => comment.addressed !== null),
  ];
  const open = items.filter((comment) => comment.addressed === null).length;
  return (
    <Card
      size="small"
      style={{ marginBottom: 16 }}
      title={`Review comments: ${open} open of ${items.length}`}
    >
      <List<ReviewComment>
        aria-label="Review comments"
        dataSource={ordered}
        renderItem={(comment) => (
          <List.Item
            actions={
              canMarkAddressed &&
              comment.addressed === null &&
              latestVersion > comment.versionNumber
                ? [
                    <Button
                      key="addressed"
                      size="small"
                      loading={mark.isPending}
                      onClick={() =>
                        mark.mutate({ commentId: comment.id, versionNumber: latestVersion })
                      }
                    >
                      Addressed in version {latestVersion}
                    </Button>,
                  ]
                : []
            }
          >
            <Space orientation="vertical" size={2}>
              <Typography.Text>
                <strong>{comment.anchor ? comment.anchor.label : 'Whole version'}</strong> ·{' '}
                {comment.author?.displayName ?? 'A reviewer'} on version {comment.versionNumber},{' '}
                {localMoment(comment.createdAt)}
              </Typography.Text>
              <Typography.Text>“{comment.body}”</Typography.Text>
              {comment.addressed ? (
                <Tag color="green">Addressed in version {comment.addressed.versionNumber}</Tag>
              ) : (
                <Tag color="orange">Open</Tag>
              )}
            </Space>
          </List.Item>
        )}
      />
    </Card>
  );
}
