import { Button, Col, Collapse, Descriptions, Popconfirm, Row, Space, Table } from 'antd';
import { INSTRUMENT_DEFAULTS } from '@loftwright/buoyancy';
import type { FillReading, UnitSystem } from '@loftwright/buoyancy';
import { type ReactNode, useState } from 'react';
import { DerivationPanel } from '@/components/results/derivation-panel';
import { ResultsPanel } from '@/components/results/results-panel';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { type FillLog, GAS_SOURCES, useRemoveFillLog } from '../api/fill-logs-api';
import { FillLogChart } from './fill-log-chart';
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
  const display = useNumberDisplay(unitSystem);
  const show = (
    value: number | undefined,
    dimension: 'mass' | 'time' | 'temperature' | 'pressure',
  ) => (value === undefined ? '—' : display.quantity(value, dimension).text);
  const remove = useRemoveFillLog(log.calculationId);
  return (
    <section aria-label={`Fill log of ${new Date(log.filledAt).toLocaleString()}`}>
      <Descriptions
        size="small"
        column={{ xs: 1, md: 3 }}
        items={[
          { key: 'at', label: 'Filled at', children: new Date(log.filledAt).toLocaleString() },
          { key: 'place', label: 'Place', children: log.place || '—' },
          { key: 'envelope', label: 'Envelope', children: log.envelopeLabel || '—' },
          {
            key: 'gas',
            label: 'Gas source',
            children:
              GAS_SOURCES.find((source) => source.value === log.gasSource)?.label ?? log.gasSource,
          },
          {
            key: 'air',
            label: 'Air',
            children: `${show(log.ambient.temperatureK, 'temperature')}, ${show(log.ambient.pressurePa, 'pressure')}${log.ambient.relativeHumidity === undefined ? ', dry' : `, ${display.fixed(log.ambient.relativeHumidity * 100, 0)} % RH`}`,
          },
          {
            key: 'instrument',
            label: 'Instruments',
            children: log.instrument
              ? `scale shows ${show(log.instrument.scaleResolutionKg, 'mass')} steps, ballast ± ${show(log.instrument.ballastToleranceKg, 'mass')}`
              : `defaults: scale shows ${show(INSTRUMENT_DEFAULTS.scaleResolutionKg, 'mass')} steps, ballast ± ${show(INSTRUMENT_DEFAULTS.ballastToleranceKg, 'mass')}`,
          },
          { key: 'version', label: 'Against version', children: `v${log.versionNumber}` },
        ]}
      />
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
          <Table<FillReading & { key: number }>
            size="small"
            style={{ marginTop: 12 }}
            aria-label="Lift readings"
            pagination={{ pageSize: 10, hideOnSinglePage: true }}
            dataSource={log.readings.map((reading, index) => ({ ...reading, key: index }))}
            columns={[
              { title: '#', key: 'n', render: (_: unknown, row) => row.key + 1 },
              {
                title: 'Time since filling',
                dataIndex: 'timeS',
                render: (t: number) => show(t, 'time'),
              },
              {
                title: 'Ballast − scale',
                key: 'lift',
                render: (_: unknown, row) =>
                  row.kind === 'ballast'
                    ? `${show(row.ballastMassKg, 'mass')} − ${show(row.scaleReadingKg, 'mass')}`
                    : `${show(row.netLiftKg, 'mass')} (direct)`,
              },
              {
                title: 'Air',
                key: 'air',
                render: (_: unknown, row) =>
                  row.airTemperatureK === undefined && row.pressurePa === undefined
                    ? 'as logged'
                    : [
                        row.airTemperatureK === undefined
                          ? ''
                          : show(row.airTemperatureK, 'temperature'),
                        row.pressurePa === undefined ? '' : show(row.pressurePa, 'pressure'),
                      ]
                        .filter(Boolean)
                        .join(', '),
              },
            ]}
          />
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
