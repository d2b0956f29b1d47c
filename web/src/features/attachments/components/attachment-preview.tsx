import { Alert, Image, Spin, Typography } from 'antd';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo } from 'react';
import { type Attachment, useAttachmentBlob } from '../api/attachments-api';
import { CsvPreview } from './csv-preview';

/** An object URL for a blob, revoked when the blob changes or the view goes away. */
function useObjectUrl(blob: Blob | undefined): string | undefined {
  const url = useMemo(() => (blob ? URL.createObjectURL(blob) : undefined), [blob]);
  useEffect(
    () => () => {
      if (url) URL.revokeObjectURL(url);
    },
    [url],
  );
  return url;
}

/** Images inline, CSV and text as they read; other files are opened or downloaded instead. */
export function AttachmentPreview({ attachment }: { attachment: Attachment }) {
  const { data: blob, error, isPending } = useAttachmentBlob(attachment, true);
  const url = useObjectUrl(attachment.mediaType.startsWith('image/') ? blob : undefined);
  const { data: text } = useQuery({
    queryKey: ['attachments', 'text', attachment.id],
    queryFn: () => (blob ? blob.text() : ''),
    enabled: blob !== undefined && attachment.mediaType.startsWith('text/'),
  });

  if (error) return <Alert type="error" showIcon title={error.message} />;
  if (isPending) return <Spin description="Loading the file…" />;
  if (attachment.mediaType.startsWith('image/'))
    return url ? <Image src={url} alt={attachment.fileName} style={{ maxWidth: '100%' }} /> : null;
  if (attachment.mediaType === 'text/csv')
    return text === undefined ? null : <CsvPreview text={text} />;
  if (attachment.mediaType === 'text/plain')
    return (
      <Typography.Paragraph
        className="lw-mono"
        style={{ whiteSpace: 'pre-wrap', maxHeight: 480, overflow: 'auto' }}
      >
        {text}
      </Typography.Paragraph>
    );
  return null;
}
