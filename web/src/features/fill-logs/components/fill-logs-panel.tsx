import { Button, Card, Space, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { type ReactNode, useState } from 'react';
import { ExportButton } from '@/components/export/export-button';
import { type FillLog, useFillLogs } from '../api/fill-logs-api';
import { useLoggingVersion } from '../hooks/use-logging-version';
import { FillLogDetail } from './fill-log-detail';
import { FillLogForm } from './fill-log-form';
import { FillLogsTable } from './fill-logs-table';

/**
 * The fills logged against a calculation's versions, newest first; each opens to its reduction,
 * its measured-against-predicted chart, its readings and files.
 */
export function FillLogsPanel({
  calculationId,
  latestVersion,
  predicts,
  canEdit,
  unitSystem,
  filesFor,
}: {
  calculationId: string;
  latestVersion: number;
  /** Whether the kind has a design to predict from (lift checks do). */
  predicts: boolean;
  canEdit: boolean;
  unitSystem: UnitSystem;
  filesFor?: (log: FillLog) => ReactNode;
}) {
  const logs = useFillLogs(calculationId);
  const logging = useLoggingVersion(calculationId, latestVersion, canEdit);
  const [expanded, setExpanded] = useState<string[]>([]);
  return (
    <Card
      title="Fill logs"
      size="small"
      style={{ marginTop: 16 }}
      extra={
        <Space>
          <ExportButton
            path={`/calculations/${calculationId}/fill-logs/export`}
            what="the fill logs"
          />
          {canEdit ? (
            <Button type="primary" onClick={logging.start}>
              Log a fill
            </Button>
          ) : null}
        </Space>
      }
    >
      {!predicts ? (
        <Typography.Paragraph type="secondary">
          Fills of this kind record measured lift only; a lift check also predicts it at the logged
          air.
        </Typography.Paragraph>
      ) : null}
      <FillLogsTable
        logs={logs.data ?? []}
        loading={logs.isPending}
        expanded={expanded}
        onExpandedChange={setExpanded}
        detail={(log) => (
          <FillLogDetail
            log={log}
            unitSystem={unitSystem}
            canEdit={canEdit}
            files={filesFor?.(log)}
          />
        )}
        unitSystem={unitSystem}
      />
      {logging.logging ? (
        <FillLogForm
          calculationId={calculationId}
          versionNumber={logging.versionNumber}
          version={logging.version}
          unitSystem={unitSystem}
          open={logging.logging}
          onClose={logging.stop}
          onCreated={(id) => setExpanded((current) => [...current, id])}
        />
      ) : null}
    </Card>
  );
}
