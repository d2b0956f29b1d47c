import { DownloadOutlined } from '@ant-design/icons';
import { App, Button, Space } from 'antd';
import { useState } from 'react';
import { apiClient } from '@/lib/api-client';
import { dispositionFileName, saveBlob } from '@/lib/save-blob';

export interface FileDownload {
  /** API path of the file, under /api. */
  readonly path: string;
  /** What the button says: the format in words ("Track as GPX"). */
  readonly label: string;
  /** Name to save under when the API offers none. */
  readonly fallbackName: string;
}

/**
 * A row of download buttons for files the API writes (a flight's track as GeoJSON, KML or GPX);
 * the request carries the session, which a plain link would not.
 */
export function FileDownloads({
  files,
  label,
}: {
  files: readonly FileDownload[];
  /** The group's accessible name ("Downloads of version 3"). */
  label: string;
}) {
  const { message } = App.useApp();
  const [busyPath, setBusyPath] = useState<string | null>(null);
  const download = async (file: FileDownload) => {
    setBusyPath(file.path);
    try {
      const response = await apiClient.get<Blob>(file.path, { responseType: 'blob' });
      const header = response.headers['content-disposition'] as string | undefined;
      saveBlob(response.data, dispositionFileName(header, file.fallbackName));
    } catch (error) {
      void message.error(error instanceof Error ? error.message : String(error));
    } finally {
      setBusyPath(null);
    }
  };
  return (
    <Space wrap role="group" aria-label={label}>
      {files.map((file) => (
        <Button
          key={file.path}
          icon={<DownloadOutlined />}
          loading={busyPath === file.path}
          onClick={() => void download(file)}
        >
          {file.label}
        </Button>
      ))}
    </Space>
  );
}
