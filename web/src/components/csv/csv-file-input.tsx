import { Typography } from 'antd';
import { useState } from 'react';
import { parseCsv, type ParsedCsv } from '@/lib/parse-csv';

/** Chooses a CSV file and hands it over parsed (header row, lines numbered as in the file). */
export function CsvFileInput({
  label,
  onParsed,
}: {
  label: string;
  onParsed: (parsed: ParsedCsv) => void;
}) {
  const [fileName, setFileName] = useState<string>();
  return (
    <>
      <input
        type="file"
        accept=".csv,text/csv,text/plain"
        aria-label={label}
        onChange={(event) => {
          const file = event.target.files?.[0];
          if (!file) return;
          setFileName(file.name);
          void file.text().then((text) => onParsed(parseCsv(text)));
        }}
      />
      {fileName ? <Typography.Text type="secondary"> {fileName}</Typography.Text> : null}
    </>
  );
}
