import { Alert, Descriptions, Spin, Table, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { PanelBoundary } from '@/components/errors/panel-boundary';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { type EnvelopeFill, useEnvelope } from '../api/envelopes-api';
import { KIND_WORDS } from './envelope-field-labels';

// recharts is heavy: the chart loads after the figures and the table are on screen.
const EnvelopeFillsChart = lazy(() =>
  import('./envelope-fills-chart').then((module) => ({ default: module.EnvelopeFillsChart })),
);

/** One envelope: its figures, and every fill logged with it (those of calculations one may see). */
export function EnvelopeDetailView({
  id,
  unitSystem,
  calculationHref,
}: {
  id: string;
  unitSystem: UnitSystem;
  calculationHref: (calculationId: string) => string;
}) {
  const envelope = useEnvelope(id);
  const display = useNumberDisplay(unitSystem);
  if (envelope.isPending) return <Spin description="Loading the envelope…" />;
  if (envelope.error) return <Alert type="warning" showIcon title={envelope.error.message} />;
  const data = envelope.data;
  const mass = (kg: number | null) => (kg === null ? '—' : display.quantity(kg, 'mass').text);
  return (
    <>
      <Typography.Title level={2}>{data.name}</Typography.Title>
      <Descriptions bordered size="small" column={1} style={{ maxWidth: 640, marginBottom: 16 }}>
        <Descriptions.Item label="Kind">{KIND_WORDS[data.kind]}</Descriptions.Item>
        <Descriptions.Item label="Mass">{mass(data.massKg)}</Descriptions.Item>
        {data.burstDiameterM !== null ? (
          <Descriptions.Item label="Burst diameter">
            {display.quantity(data.burstDiameterM, 'length').text}
          </Descriptions.Item>
        ) : null}
        {data.ratedSuperpressurePa !== null ? (
          <Descriptions.Item label="Rated superpressure">
            {display.quantity(data.ratedSuperpressurePa, 'pressureDifference').text}
          </Descriptions.Item>
        ) : null}
        <Descriptions.Item label="Drag coefficient">
          {data.dragCoefficient === null ? 'none kept' : display.number(data.dragCoefficient)}
        </Descriptions.Item>
        <Descriptions.Item label="Film">{data.film || '—'}</Descriptions.Item>
        <Descriptions.Item label="Notes">{data.notes || '—'}</Descriptions.Item>
      </Descriptions>
      <Typography.Title level={4}>Fills</Typography.Title>
      <Table<EnvelopeFill>
        rowKey="fillLogId"
        size="small"
        pagination={false}
        dataSource={data.history}
        locale={{ emptyText: 'No fill log names this envelope yet.' }}
        columns={[
          { title: 'Filled at', render: (_, fill) => new Date(fill.filledAt).toLocaleString() },
          { title: 'Place', dataIndex: 'place' },
          {
            title: 'Calculation',
            render: (_, fill) => (
              <Link to={calculationHref(fill.calculationId)}>
                {fill.calculationTitle}, version {fill.versionNumber}
              </Link>
            ),
          },
          { title: 'Measured net lift', render: (_, fill) => mass(fill.measuredNetLiftKg) },
          { title: 'Predicted net lift', render: (_, fill) => mass(fill.predictedNetLiftKg) },
        ]}
      />
      {data.history.length > 0 ? (
        <PanelBoundary what="the chart of fills">
          <Suspense fallback={null}>
            <div style={{ marginTop: 16, maxWidth: 760 }}>
              <EnvelopeFillsChart fills={data.history} unitSystem={unitSystem} />
            </div>
          </Suspense>
        </PanelBoundary>
      ) : null}
    </>
  );
}
