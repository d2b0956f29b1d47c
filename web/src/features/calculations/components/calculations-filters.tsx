import { Input, Select, Space } from 'antd';
import { KINDS } from '@loftwright/buoyancy';
import { ExportButton } from '@/components/export/export-button';
import type { CalculationListQuery } from '../api/calculations-api';

const STATUS_OPTIONS = [
  { value: 'draft', label: 'Draft' },
  { value: 'in_review', label: 'In review' },
  { value: 'approved', label: 'Approved' },
  { value: 'changes_requested', label: 'Changes requested' },
];

/** Search, kind, status, owner and tag filters above the list, and its export. */
export function CalculationsFilters({
  params,
  onFilter,
}: {
  params: CalculationListQuery;
  onFilter: (changes: Partial<CalculationListQuery>) => void;
}) {
  return (
    <Space wrap style={{ marginBottom: 12 }}>
      <Input.Search
        aria-label="Search titles and tags"
        placeholder="Search titles and tags"
        allowClear
        onSearch={(q) => onFilter({ q: q || undefined })}
        style={{ width: 260 }}
      />
      <Select
        aria-label="Kind"
        placeholder="Any kind"
        allowClear
        style={{ width: 200 }}
        options={KINDS.map((kind) => ({ value: kind.id, label: kind.title }))}
        onChange={(kind?: string) => onFilter({ kind })}
      />
      <Select
        aria-label="Status"
        placeholder="Any status"
        allowClear
        style={{ width: 180 }}
        options={STATUS_OPTIONS}
        onChange={(status?: string) => onFilter({ status })}
      />
      <Select
        aria-label="Owner"
        style={{ width: 150 }}
        value={params.owner ?? 'anyone'}
        options={[
          { value: 'anyone', label: 'Anyone' },
          { value: 'me', label: 'Mine' },
        ]}
        onChange={(owner: string) => onFilter({ owner: owner === 'anyone' ? undefined : owner })}
      />
      <Input
        aria-label="Tag"
        placeholder="Tag"
        allowClear
        style={{ width: 140 }}
        onPressEnter={(event) =>
          onFilter({ tag: (event.target as HTMLInputElement).value || undefined })
        }
        onChange={(event) => (event.target.value === '' ? onFilter({ tag: undefined }) : undefined)}
      />
      <ExportButton path="/calculations/export" params={{ ...params }} what="the calculations" />
    </Space>
  );
}
