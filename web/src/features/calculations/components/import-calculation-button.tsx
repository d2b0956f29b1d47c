import { UploadOutlined } from '@ant-design/icons';
import { App, Button } from 'antd';
import { useRef } from 'react';
import { ApiError } from '@/lib/api-client';
import { useImportCalculation } from '../api/calculations-api';

/** Reads a Loftwright file chosen by the user and makes a new calculation of it. */
export function ImportCalculationButton({ onImported }: { onImported: (id: string) => void }) {
  const { message } = App.useApp();
  const input = useRef<HTMLInputElement>(null);
  const importFile = useImportCalculation();
  return (
    <>
      <input
        ref={input}
        type="file"
        accept=".json,application/json"
        aria-label="Loftwright file to import"
        style={{ display: 'none' }}
        onChange={(event) => {
          const file = event.target.files?.[0];
          event.target.value = '';
          if (!file) return;
          importFile.mutate(file, {
            onSuccess: (created) => {
              void message.success(
                `Imported “${created.title}” with ${created.latestVersion} versions.`,
              );
              onImported(created.id);
            },
            onError: (error) => {
              const where =
                error instanceof ApiError && error.issues[0] ? ` (${error.issues[0].field})` : '';
              void message.error(`${file.name} could not be imported${where}: ${error.message}`, 8);
            },
          });
        }}
      />
      <Button
        icon={<UploadOutlined />}
        loading={importFile.isPending}
        onClick={() => input.current?.click()}
      >
        Import a file
      </Button>
    </>
  );
}
