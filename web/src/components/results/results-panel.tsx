import { Alert, Card, Empty, List, Typography } from 'antd';
import type { CalculationResult, UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';

const SEVERITY = { caution: 'error', warning: 'warning', note: 'info' } as const;

/** Each result as value, unit and a line of context; then the cautions and warnings that apply. */
export function ResultsPanel({
  result,
  unitSystem,
  title = 'Results',
  problem,
}: {
  result: CalculationResult | undefined;
  unitSystem: UnitSystem;
  title?: string;
  problem?: string;
}) {
  const show = useNumberDisplay(unitSystem);
  return (
    <Card title={title} size="small">
      <div role="status" aria-live="polite" aria-label={title}>
        {problem ? (
          <Alert type="error" showIcon title={problem} style={{ marginBottom: 12 }} />
        ) : null}
        {!result ? (
          <Empty description="Complete the inputs to see results" />
        ) : (
          <List
            size="small"
            dataSource={Object.entries(result.outputs)}
            renderItem={([name, output]) => {
              const shown = show.output(output.value, output.unit);
              return (
                <List.Item key={name} data-output={name}>
                  <div style={{ width: '100%' }}>
                    <Typography.Text type="secondary">{output.label}</Typography.Text>
                    <div>
                      <Typography.Text strong className="lw-mono" style={{ fontSize: 16 }}>
                        {shown.value}
                      </Typography.Text>{' '}
                      <Typography.Text>{shown.unit}</Typography.Text>
                    </div>
                    {output.context ? (
                      <Typography.Text type="secondary" style={{ fontSize: 12 }}>
                        {output.context}
                      </Typography.Text>
                    ) : null}
                  </div>
                </List.Item>
              );
            }}
          />
        )}
      </div>
      {result?.warnings.map((warning) => (
        <Alert
          key={warning.code}
          type={SEVERITY[warning.severity]}
          showIcon
          title={
            warning.severity === 'caution'
              ? 'Caution'
              : warning.severity === 'warning'
                ? 'Check this'
                : 'Note'
          }
          description={warning.message}
          style={{ marginTop: 8 }}
          data-warning={warning.code}
        />
      ))}
    </Card>
  );
}
