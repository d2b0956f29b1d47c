import { Alert } from 'antd';

/** The error a form's request failed with, announced to screen readers; nothing when there is none. */
export function FormError({ error }: { error: Error | null }) {
  if (!error) return null;
  return (
    <Alert type="error" showIcon title={error.message} style={{ marginBottom: 16 }} role="alert" />
  );
}
