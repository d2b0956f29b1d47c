import { Tag, theme } from 'antd';
import type { VersionStatus } from '../api/calculations-api';

const WORDS: Record<VersionStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  changes_requested: 'Changes requested',
};

/** A version's status: the word first, the colour second (never colour alone). */
export function StatusTag({ status }: { status: VersionStatus }) {
  const { token } = theme.useToken();
  const colour: Record<VersionStatus, string> = {
    draft: token.colorTextSecondary,
    in_review: token.colorWarning,
    approved: token.colorSuccess,
    changes_requested: token.colorError,
  };
  return (
    <Tag color={colour[status]} variant="outlined" style={{ color: colour[status] }}>
      {WORDS[status]}
    </Tag>
  );
}
