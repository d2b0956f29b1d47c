import { List } from 'antd';

/** Rows of a file that cannot be read, by their line in the file and the reason. */
export function BadRowsList({
  rows,
  label,
}: {
  rows: readonly { line: number; reason: string }[];
  label: string;
}) {
  return (
    <List
      size="small"
      aria-label={label}
      dataSource={[...rows]}
      renderItem={(row) => (
        <List.Item>
          Line {row.line}: {row.reason}
        </List.Item>
      )}
    />
  );
}
