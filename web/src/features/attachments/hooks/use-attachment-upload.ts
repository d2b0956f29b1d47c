import { App, type UploadProps } from 'antd';
import { useState } from 'react';
import { useUploadAttachment } from '../api/attachments-api';

/** Uploads of files dropped or chosen, one at a time in view with its progress. */
export function useAttachmentUpload(calculationId: string, fillLogId: string | undefined) {
  const { message } = App.useApp();
  const upload = useUploadAttachment(calculationId);
  const [progress, setProgress] = useState<{ name: string; percent: number } | null>(null);

  const customRequest: UploadProps['customRequest'] = ({ file, onSuccess, onError }) => {
    const chosen = file as File;
    setProgress({ name: chosen.name, percent: 0 });
    upload.mutate(
      {
        file: chosen,
        fillLogId,
        onProgress: (percent) => setProgress({ name: chosen.name, percent }),
      },
      {
        onSuccess: (saved) => {
          setProgress(null);
          onSuccess?.(saved);
          void message.success(`Added ${saved.fileName}.`);
        },
        onError: (error) => {
          setProgress(null);
          onError?.(error);
          void message.error(`${chosen.name}: ${error.message}`);
        },
      },
    );
  };

  return {
    /** The file uploading now and how far it is. */
    progress,
    customRequest,
  };
}
