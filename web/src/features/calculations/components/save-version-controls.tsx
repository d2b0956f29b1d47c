import { Button, Input, Space } from 'antd';
import { SubmitForReview } from './submit-for-review';

/** The change note, "Save as version n+1" and, for a saved version, its submission for review. */
export function SaveVersionControls({
  calculationId,
  latestVersion,
  note,
  onNoteChange,
  canSave,
  saving,
  onSave,
  canSubmit,
}: {
  calculationId: string;
  latestVersion: number;
  note: string;
  onNoteChange: (note: string) => void;
  canSave: boolean;
  saving: boolean;
  onSave: () => void;
  /** Whether the latest version, as saved, may be submitted for review now. */
  canSubmit: boolean;
}) {
  return (
    <Space orientation="vertical" style={{ width: '100%' }}>
      <Input
        aria-label="Change note"
        placeholder="What changed (change note)"
        value={note}
        onChange={(event) => onNoteChange(event.target.value)}
        maxLength={2000}
      />
      <Space wrap>
        <Button type="primary" disabled={!canSave} loading={saving} onClick={onSave}>
          Save as version {latestVersion + 1}
        </Button>
        {canSubmit ? (
          <SubmitForReview calculationId={calculationId} versionNumber={latestVersion} />
        ) : null}
      </Space>
    </Space>
  );
}
