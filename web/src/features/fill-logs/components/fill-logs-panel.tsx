import { Button, Card, Space, Table, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { type ReactNode, useState } from 'react';
import { ExportButton } from '@/components/export/export-button';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { type FillLog, useFillLogs } from '../api/fill-logs-api';
import { useCalculationVersion } from '../api/get-calculation-version';
import { FillLogDetail } from './fill-log-detail';
import { FillLogForm, type FillLogVersion } from './fill-log-form';

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
  const display = useNumberDisplay(unitSystem);
  const mass = (value: number | undefined) =>
    value === undefined ? '—' : display.quantity(value, 'mass').text;
  // The version a new fill is logged against, fixed when the dialog opens: a version saved
  // meanwhile neither moves the log nor resets what has been typed.
  const [loggingVersion, setLoggingVersion] = useState<number>();
  const logging = loggingVersion !== undefined;
  const versionNumber = loggingVersion ?? latestVersion;
  // Read ahead for those who may log, so the dialog opens on the version's air.
  const version = useCalculationVersion(calculationId, versionNumber, canEdit);
  const versionForForm: FillLogVersion =
    version.status === 'success'
      ? { status: 'success', inputs: version.data.inputs }
      : version.status === 'error'
        ? { status: 'error', message: version.error.message }
        : { status: 'pending' };
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
            <Button type="primary" onClick={() => setLoggingVersion(latestVersion)}>
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
      <Table<FillLog>
        size="small"
        rowKey="id"
        aria-label="Fill logs"
        loading={logs.isPending}
        dataSource={logs.data ?? []}
        pagination={{ pageSize: 10, hideOnSinglePage: true }}
        locale={{ emptyText: 'No fills logged yet' }}
        expandable={{
          expandedRowKeys: expanded,
          onExpandedRowsChange: (keys) => setExpanded(keys.map(String)),
          expandRowByClick: true,
          expandedRowRender: (log) => (
            <FillLogDetail
              log={log}
              unitSystem={unitSystem}
              canEdit={canEdit}
              files={filesFor?.(log)}
            />
          ),
        }}
        columns={[
          {
            title: 'Filled at',
            dataIndex: 'filledAt',
            render: (at: string) => new Date(at).toLocaleString(),
          },
          { title: 'Place', dataIndex: 'place' },
          { title: 'Envelope', dataIndex: 'envelopeLabel' },
          {
            title: 'Version',
            dataIndex: 'versionNumber',
            render: (n: number) => <span className="lw-mono">v{n}</span>,
          },
          { title: 'Readings', key: 'readings', render: (_: unknown, log) => log.readings.length },
          {
            title: 'Measured net lift',
            key: 'measured',
            render: (_: unknown, log) => mass(log.outputs.measuredNetLift?.value),
          },
          {
            title: 'Predicted',
            key: 'predicted',
            render: (_: unknown, log) => mass(log.outputs.predictedNetLift?.value),
          },
          {
            title: 'Difference',
            key: 'difference',
            render: (_: unknown, log) =>
              log.outputs.differencePercent
                ? `${display.fixed(log.outputs.differencePercent.value, 1)} %`
                : '—',
          },
        ]}
      />
      {logging ? (
        <FillLogForm
          calculationId={calculationId}
          versionNumber={versionNumber}
          version={versionForForm}
          unitSystem={unitSystem}
          open={logging}
          onClose={() => setLoggingVersion(undefined)}
          onCreated={(id) => setExpanded((current) => [...current, id])}
        />
      ) : null}
    </Card>
  );
}
