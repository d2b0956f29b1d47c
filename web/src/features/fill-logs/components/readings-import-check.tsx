import { Alert } from 'antd';
import { BadRowsList } from '@/components/csv/bad-rows-list';

const rows = (count: number) => (count === 1 ? 'row' : 'rows');

/** How many readings the file gives and which rows cannot be read; nothing is stored yet. */
export function ReadingsImportCheck({
  count,
  bad,
}: {
  count: number;
  bad: { line: number; reason: string }[];
}) {
  return (
    <div role="status" aria-label="Import check">
      <Alert
        type={bad.length > 0 ? 'warning' : 'success'}
        showIcon
        title={`${count} readings ready${bad.length > 0 ? `, ${bad.length} ${rows(bad.length)} cannot be read` : ''}. Nothing is stored until you import.`}
      />
      {bad.length > 0 ? <BadRowsList rows={bad} label="Rows that cannot be read" /> : null}
    </div>
  );
}
