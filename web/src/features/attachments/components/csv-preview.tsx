import { Alert, Table } from 'antd';
import Papa from 'papaparse';
import { useMemo } from 'react';

const PREVIEW_ROWS = 200;

/** The first rows of a CSV file as a table, header row as column titles. */
export function CsvPreview({ text }: { text: string }) {
  const parsed = useMemo(
    () => Papa.parse<string[]>(text.trim(), { skipEmptyLines: true, preview: PREVIEW_ROWS + 1 }),
    [text],
  );
  const [header = [], ...rows] = parsed.data;
  const columns = header.map((title, index) => ({
    title: title || `Column ${index + 1}`,
    dataIndex: String(index),
    key: String(index),
  }));
  const data = rows.map((row, rowIndex) => ({
    key: rowIndex,
    ...Object.fromEntries(row.map((cell, index) => [String(index), cell])),
  }));
  return (
    <>
      {parsed.errors.length > 0 ? (
        <Alert
          type="warning"
          showIcon
          title={`Line ${(parsed.errors[0]?.row ?? 0) + 1}: ${parsed.errors[0]?.message ?? ''}`}
          style={{ marginBottom: 8 }}
        />
      ) : null}
      <Table
        size="small"
        columns={columns}
        dataSource={data}
        pagination={{ pageSize: 20 }}
        scroll={{ x: true }}
        aria-label="File contents"
      />
    </>
  );
}
