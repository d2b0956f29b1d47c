import { useMemo, useState } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import {
  cellCount,
  defaultWindSettings,
  readWindFile,
  type WindImportSettings,
} from './wind-import-settings';

/**
 * A wind file's text (chosen or pasted), how it is laid out, and the levels the engine reads
 * from it; recomputed as the settings change, so the preview always matches what "Use" takes.
 */
export function useWindImport() {
  const { numberFormat } = useReadingPreferences();
  const [text, setText] = useState('');
  const [fileName, setFileName] = useState<string>();
  const [settings, setSettings] = useState<WindImportSettings>(() =>
    defaultWindSettings(numberFormat),
  );
  const read = useMemo(
    () => (text.trim() === '' ? undefined : readWindFile(text, settings)),
    [text, settings],
  );
  const cells = useMemo(() => cellCount(text, settings), [text, settings]);
  return {
    text,
    fileName,
    /** Text typed or pasted; the file name is forgotten. */
    paste: (next: string) => {
      setText(next);
      setFileName(undefined);
    },
    choose: (name: string, next: string) => {
      setText(next);
      setFileName(name);
    },
    settings,
    change: (patch: Partial<WindImportSettings>) =>
      setSettings((current) => ({ ...current, ...patch })),
    /** Column names of the header line, when there is one and it was read. */
    columnNames: read?.ok ? read.reading.columns : [],
    /** Positions to offer: at least as many as the first line has cells. */
    columnCount: Math.max(cells, read?.ok ? read.reading.columns.length : 0, 3),
    read,
  };
}

export type WindImport = ReturnType<typeof useWindImport>;
