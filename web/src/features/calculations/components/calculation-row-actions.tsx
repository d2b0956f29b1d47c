import { Button, Popconfirm, Space } from 'antd';
import { Link } from 'react-router-dom';
import type { CalculationListItem } from '../api/calculations-api';
import type { CalculationRowActions as Actions } from '../hooks/use-calculation-row-actions';

/** A row's links and buttons: its sign-off sheet, and duplicate and archive where allowed. */
export function CalculationRowActions({
  row,
  sheetHref,
  mayDuplicate,
  actions,
}: {
  row: CalculationListItem;
  sheetHref: (id: string, version: number) => string;
  mayDuplicate: boolean;
  actions: Actions;
}) {
  return (
    <Space size={0} wrap>
      <Link to={sheetHref(row.id, row.latestVersion)} aria-label={`Sign-off sheet of ${row.title}`}>
        Sheet
      </Link>
      {mayDuplicate ? (
        <Button
          type="link"
          size="small"
          aria-label={`Duplicate ${row.title}`}
          loading={actions.duplicating(row)}
          onClick={() => actions.duplicate(row)}
        >
          Duplicate
        </Button>
      ) : null}
      {row.permissions.archive ? (
        <Popconfirm
          title={`Archive “${row.title}”?`}
          description="It leaves the lists; its versions and sign-offs stay verifiable."
          okText="Archive"
          cancelText="Keep"
          onConfirm={() => actions.archive(row)}
        >
          <Button type="link" size="small" danger aria-label={`Archive ${row.title}`}>
            Archive
          </Button>
        </Popconfirm>
      ) : null}
    </Space>
  );
}
