import { InboxOutlined } from '@ant-design/icons';
import { Progress, Typography, Upload } from 'antd';
import { useAttachmentUpload } from '../hooks/use-attachment-upload';

/** Where files are dropped or chosen, and the progress of the one uploading. */
export function AttachmentUpload({
  calculationId,
  fillLogId,
  canUpload,
}: {
  calculationId: string;
  fillLogId?: string;
  canUpload: boolean;
}) {
  const { progress, customRequest } = useAttachmentUpload(calculationId, fillLogId);
  return (
    <>
      {canUpload ? (
        <Upload.Dragger
          multiple
          showUploadList={false}
          aria-label="Add files"
          customRequest={customRequest}
        >
          <p className="ant-upload-drag-icon">
            <InboxOutlined />
          </p>
          <p className="ant-upload-text">Drop files here or click to choose</p>
          <p className="ant-upload-hint">
            Photos of the set-up and the scale, PDFs, data-logger CSV or text files, up to 20 MB
            each. The type is checked from the content.
          </p>
        </Upload.Dragger>
      ) : null}
      {progress ? (
        <div role="status" aria-label="Upload progress" style={{ marginTop: 8 }}>
          <Typography.Text>Uploading {progress.name}</Typography.Text>
          <Progress percent={progress.percent} size="small" />
        </div>
      ) : null}
    </>
  );
}
