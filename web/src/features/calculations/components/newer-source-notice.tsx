import { Alert, Button } from 'antd';
import { inputLabel } from '@loftwright/buoyancy';
import type { CalculationSource } from '../api/calculations-api';
import type { SourceVersionState } from '../hooks/use-source-version';

/**
 * Says when the source has a newer version than the one this calculation was built from, and
 * offers to take it into the form; once taken, which fields it changed, until the save.
 */
export function NewerSourceNotice({
  source,
  schema,
  link,
  editable,
}: {
  source: CalculationSource;
  schema: Record<string, unknown>;
  link: SourceVersionState;
  editable: boolean;
}) {
  const newest = source.newestVersionNumber;
  if (link.taken) {
    const changed = link.taken.changed.map((path) => inputLabel(schema, path));
    return (
      <Alert
        type="info"
        showIcon
        role="status"
        title={`Version ${link.taken.number} of “${source.title}” is in the form, not saved yet.`}
        description={
          changed.length > 0
            ? `Changed: ${changed.join(', ')}. Check them, then save a version to record it.`
            : 'It changes none of the fields taken from it. Save a version to record it.'
        }
        style={{ marginBottom: 8 }}
      />
    );
  }
  if (newest === null || newest <= source.versionNumber) return null;
  return (
    <Alert
      type="warning"
      showIcon
      role="status"
      title={`“${source.title}” has a newer version: ${newest}. This was built from version ${source.versionNumber}.`}
      description={link.problem}
      action={
        editable ? (
          <Button size="small" loading={link.taking} onClick={() => link.take(newest)}>
            Take version {newest}
          </Button>
        ) : undefined
      }
      style={{ marginBottom: 8 }}
    />
  );
}
