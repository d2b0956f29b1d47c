import { Table } from 'antd';
import type { ParsedCsv } from '@/lib/parse-csv';

/** The first rows of a parsed CSV with the line each came from, to map its columns against. */
export function CsvPreviewTable({ parsed, label }: { parsed: ParsedCsv; label: string }) {
  return (
    <Table
      size="small"
      aria-label={label}
      pagination={false}
      scroll={{ x: true }}
      dataSource={parsed.rows
        .slice(0, 5)
        .map((row) => ({ key: row.line, line: row.line, ...row.cells }))}
      columns={[
        { title: 'Line', dataIndex: 'line' },
        ...parsed.columns.map((column) => ({ title: column, dataIndex: column, key: column })),
      ]}
    />
  );
}
