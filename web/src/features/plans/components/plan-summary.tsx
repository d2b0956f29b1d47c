import { Alert, Card, Table, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { SupplyCostChart } from '@/components/charts/supply-cost-chart';
import { ExportButton } from '@/components/export/export-button';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { ResultsPanel } from '@/components/results/results-panel';
import type { Plan, PlanLineResult } from '../api/plans-api';

/**
 * The server's figures for the plan as last saved: the gas per line and in all, the cost by
 * source and the supply for the whole plan.
 */
export function PlanSummary({
  planId,
  result,
  currency,
  justSaved,
  unitSystem,
}: {
  planId: string;
  result: Plan['result'];
  /** The currency of the saved prices. */
  currency: string;
  justSaved: boolean;
  unitSystem: UnitSystem;
}) {
  const display = useNumberDisplay(unitSystem);
  const volume = (m3: number) => display.quantity(m3, 'volume').text;
  return (
    <>
      <Card
        title="Gas for the plan"
        size="small"
        extra={<ExportButton path={`/plans/${planId}/export`} what="the plan lines" />}
      >
        <Table<PlanLineResult>
          size="small"
          rowKey={(line) => `${line.label}-${line.calculationId ?? ''}-${line.count}`}
          aria-label="Plan lines"
          pagination={false}
          dataSource={result.lines}
          columns={[
            { title: 'Envelope', dataIndex: 'label' },
            { title: 'Gas each', dataIndex: 'volumeM3', render: volume },
            { title: 'Count', dataIndex: 'count', render: (n: number) => display.number(n) },
            { title: 'Gas in all', dataIndex: 'totalM3', render: volume },
          ]}
          summary={() => (
            <Table.Summary.Row>
              <Table.Summary.Cell index={0} colSpan={3}>
                <Typography.Text strong>Total, at filling conditions</Typography.Text>
              </Table.Summary.Cell>
              <Table.Summary.Cell index={1}>
                <Typography.Text strong data-total>
                  {volume(result.totalM3)}
                </Typography.Text>
              </Table.Summary.Cell>
            </Table.Summary.Row>
          )}
        />
      </Card>
      {justSaved ? (
        <Alert
          type="success"
          showIcon
          title="Saved; the figures below are the server's."
          style={{ marginTop: 12 }}
        />
      ) : null}
      <SupplyCostChart
        result={{ outputs: result.outputs, steps: result.steps, warnings: result.warnings }}
        inputs={{ fill: { count: 1 }, prices: { currency } }}
        title="Cost of the plan by source"
        axisLabel="Cost"
      />
      <div style={{ marginTop: 16 }}>
        <ResultsPanel
          result={{ outputs: result.outputs, steps: result.steps, warnings: result.warnings }}
          unitSystem={unitSystem}
          title="Supply for the whole plan"
        />
      </div>
    </>
  );
}
