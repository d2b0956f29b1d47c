import { Collapse, Empty, Typography } from 'antd';
import { useOutbox } from '../api/admin-api';

/** Mail the built-in mail server received (when no SMTP_URL is set), newest first. */
export function OutboxList() {
  const outbox = useOutbox({ page: 1, pageSize: 50 });
  if (outbox.data && outbox.data.items.length === 0) return <Empty description="No mail yet." />;
  return (
    <Collapse
      aria-label="Mail outbox"
      items={(outbox.data?.items ?? []).map((mail) => ({
        key: mail.id,
        label: `${mail.subject} — to ${mail.to.join(', ')} — ${new Date(mail.receivedAt).toLocaleString()}${mail.attachments.length > 0 ? ` — ${mail.attachments.length} attached` : ''}`,
        children: (
          <>
            <Typography.Paragraph style={{ whiteSpace: 'pre-wrap' }} className="lw-mono">
              {mail.text}
            </Typography.Paragraph>
            {mail.attachments.map((file) => (
              <Typography.Paragraph key={file.filename} type="secondary">
                Attached: {file.filename} ({file.contentType}, {(file.sizeBytes / 1024).toFixed(1)}{' '}
                kB)
              </Typography.Paragraph>
            ))}
          </>
        ),
      }))}
    />
  );
}
