import { Alert } from 'antd';
import { type DescribeIssue, type FieldLabels, readableApiError } from '@/lib/readable-api-error';

/**
 * The error a form's request failed with, announced to screen readers; nothing when there is
 * none. Fields the API names are called by `labels` (the form's own labels); `describe` words an
 * issue with its range (see FieldFormError), else label and reason.
 */
export function FormError({
  error,
  labels,
  describe,
}: {
  error: Error | null;
  labels?: FieldLabels;
  describe?: DescribeIssue;
}) {
  if (!error) return null;
  const sentences = readableApiError(error, labels, describe);
  return (
    <Alert
      type="error"
      showIcon
      title={sentences.length === 1 ? sentences[0] : 'The server refused these:'}
      description={
        sentences.length > 1 ? (
          <ul style={{ margin: 0, paddingLeft: 20 }}>
            {sentences.map((sentence) => (
              <li key={sentence}>{sentence}</li>
            ))}
          </ul>
        ) : undefined
      }
      style={{ marginBottom: 16 }}
      role="alert"
    />
  );
}
