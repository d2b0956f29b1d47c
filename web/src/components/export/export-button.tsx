import { DownOutlined, DownloadOutlined } from '@ant-design/icons';
import { App, Button, Dropdown, Space } from 'antd';
import { useState } from 'react';
import { apiClient } from '@/lib/api-client';
import { dispositionFileName, saveBlob } from '@/lib/save-blob';

/**
 * "Export" for a table: the API writes the file (CSV or XLSX) from the same filters the table
 * shows, and the browser saves it.
 */
export function ExportButton({
  path,
  params = {},
  what,
}: {
  /** API path of the export, under /api. */
  path: string;
  params?: Record<string, unknown>;
  /** What is exported, for the button's accessible name. */
  what: string;
}) {
  const { message } = App.useApp();
  const [busy, setBusy] = useState(false);
  const download = async (format: 'csv' | 'xlsx') => {
    setBusy(true);
    try {
      const response = await apiClient.get<Blob>(path, {
        params: { ...params, page: undefined, pageSize: undefined, format },
        responseType: 'blob',
      });
      const header = response.headers['content-disposition'] as string | undefined;
      saveBlob(response.data, dispositionFileName(header, `loftwright-export.${format}`));
    } catch (error) {
      void message.error(error instanceof Error ? error.message : String(error));
    } finally {
      setBusy(false);
    }
  };
  return (
    <Space.Compact>
      <Button
        icon={<DownloadOutlined />}
        loading={busy}
        aria-label={`Export ${what} as CSV`}
        onClick={() => void download('csv')}
      >
        Export CSV
      </Button>
      <Dropdown
        menu={{
          items: [
            { key: 'csv', label: 'CSV (any spreadsheet or script)' },
            { key: 'xlsx', label: 'Excel workbook (XLSX)' },
          ],
          onClick: ({ key }) => void download(key as 'csv' | 'xlsx'),
        }}
      >
        <Button icon={<DownOutlined />} aria-label={`Other formats for ${what}`} />
      </Dropdown>
    </Space.Compact>
  );
}
