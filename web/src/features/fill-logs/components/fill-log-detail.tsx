import { Button, Col, Collapse, Popconfirm, Row, Space } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { type ReactNode, useState } from 'react';
import { DerivationPanel } from '@/components/results/derivation-panel';
import { ResultsPanel } from '@/components/results/results-panel';
import { type FillLog, useRemoveFillLog } from '../api/fill-logs-api';
import { FillLogChart } from './fill-log-chart';
import { FillLogSummary } from './fill-log-summary';
import { LiftReadingsTable } from './lift-readings-table';
import { ReadingsImport } from './readings-import';

/** One fill: what was logged, the server's reduction, the chart, the readings and their files. */
export function FillLogDetail({
  log,
  unitSystem,
  canEdit,
  files,
}: {
  log: FillLog;
  unitSystem: UnitSystem;
  canEdit: boolean;
  files?: ReactNode;
}) {
  const [importing, setImporting] = useState(false);
  const remove = useRemoveFillLog(log.calculationId);
  return (
    <section aria-label={`Fill log of ${new Date(log.filledAt).toLocaleString()}`}>
      <FillLogSummary log={log} unitSystem={unitSystem} />
      <Row gutter={[16, 16]} style={{ marginTop: 8 }}>
        <Col xs={24} lg={10}>
          <ResultsPanel
            result={{ outputs: log.outputs, steps: log.steps, warnings: log.warnings }}
            unitSystem={unitSystem}
            title="Reduction (computed by the server)"
          />
        </Col>
        <Col xs={24} lg={14}>
          <FillLogChart log={log} unitSystem={unitSystem} />
          <LiftReadingsTable log={log} unitSystem={unitSystem} />
          {canEdit ? (
            <Space style={{ marginTop: 8 }}>
              <Button onClick={() => setImporting(true)}>Import readings from CSV</Button>
              <Popconfirm
                title="Remove this fill log and its files?"
                okText="Remove"
                cancelText="Keep"
                onConfirm={() => remove.mutateAsync(log.id)}
              >
                <Button danger>Remove fill log</Button>
              </Popconfirm>
            </Space>
          ) : null}
        </Col>
      </Row>
      {files}
      <Collapse
        style={{ marginTop: 12 }}
        items={[
          {
            key: 'steps',
            label: 'Derivation of the reduction',
            children: <DerivationPanel steps={log.steps} />,
          },
        ]}
      />
      {importing ? (
        <ReadingsImport
          log={log}
          unitSystem={unitSystem}
          open={importing}
          onClose={() => setImporting(false)}
        />
      ) : null}
    </section>
  );
}
