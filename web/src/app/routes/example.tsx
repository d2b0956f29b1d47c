import { Alert, Space, Spin, Tabs, Typography } from 'antd';
import type { CalculationResult, DerivationStep, UnitSystem } from '@loftwright/buoyancy';
import { lazy, type ReactNode, Suspense, useState } from 'react';
import { PanelBoundary } from '@/components/errors/panel-boundary';
import { useParams } from 'react-router-dom';
import { useMe } from '@/features/auth/api/auth-api';
import { type ExampleDetail, useExample } from '@/features/classroom/api/classroom-api';
import {
  ExamplePublishedNote,
  ExampleTitle,
  ExampleWarningAlert,
} from '@/features/classroom/components/example-heading';
import { ExampleSettingsForm } from '@/features/classroom/components/example-settings';
import { ExercisePanel } from '@/features/classroom/components/exercise-panel';
import { SubmissionsTable } from '@/features/classroom/components/submissions-table';
import { TryItYourself } from '@/features/classroom/components/try-it-yourself';
import { WalkThrough } from '@/features/classroom/components/walk-through';

// Charts carry recharts; they load when an example reaches the step that shows one.
const CalculationCharts = lazy(() =>
  import('@/features/calculations/charts/calculation-charts').then((m) => ({
    default: m.CalculationCharts,
  })),
);

/** The result as the charts take it; only for a fully revealed example. */
function chartResult(example: ExampleDetail): CalculationResult {
  return {
    outputs: example.outputs,
    steps: example.steps as unknown as DerivationStep[],
    warnings: example.warnings,
    ...(example.series ? { series: example.series } : {}),
  };
}

/** The example's chart, loaded when first shown. */
function ExampleChart({ example, unitSystem }: { example: ExampleDetail; unitSystem: UnitSystem }) {
  return (
    <PanelBoundary what="the chart">
      <Suspense fallback={<Spin description="Loading the chart…" />}>
        <CalculationCharts
          kind={example.kind}
          inputs={example.inputs}
          result={chartResult(example)}
          unitSystem={unitSystem}
        />
      </Suspense>
    </PanelBoundary>
  );
}

/**
 * The tabs of an example: walk through and try it for all; the exercise for students; the
 * submissions and set-up for those who teach the class.
 */
function exampleTabs(data: ExampleDetail, unitSystem: UnitSystem, chart: ReactNode) {
  const teaching = data.standing !== 'student';
  return [
    {
      key: 'walk',
      label: 'Walk through',
      children: (
        <PanelBoundary what="the walk-through">
          <WalkThrough
            key={`${data.id}-${data.revealed}`}
            title={data.title}
            steps={data.steps}
            notes={data.stepNotes}
            chart={chart}
            chartStepId={data.chartStepId}
            wrongStepId={data.mySubmissions[0]?.check.firstWrongStepId ?? null}
          />
        </PanelBoundary>
      ),
    },
    {
      key: 'try',
      label: 'Try it yourself',
      children: data.revealed ? (
        <PanelBoundary what="try it yourself">
          <TryItYourself
            kind={data.kind}
            inputs={data.inputs}
            outputs={data.outputs}
            ranges={data.tryRanges}
            unitSystem={unitSystem}
          />
        </PanelBoundary>
      ) : (
        <Alert
          type="info"
          showIcon
          title="Submit your answers to the exercise first; then you can change the inputs and watch the results move."
        />
      ),
    },
    ...(data.exercise && !teaching
      ? [
          {
            key: 'exercise',
            label: 'Exercise',
            children: (
              <PanelBoundary what="the exercise">
                <ExercisePanel example={data} unitSystem={unitSystem} />
              </PanelBoundary>
            ),
          },
        ]
      : []),
    ...(teaching && data.exercise
      ? [
          {
            key: 'submissions',
            label: 'Submissions',
            children: <SubmissionsTable example={data} />,
          },
        ]
      : []),
    ...(teaching
      ? [
          {
            key: 'settings',
            label: 'Set up',
            children: (
              <ExampleSettingsForm key={data.updatedAt} example={data} unitSystem={unitSystem} />
            ),
          },
        ]
      : []),
  ];
}

export function ExampleRoute() {
  const { id = '' } = useParams();
  const { user } = useMe();
  const example = useExample(id);
  const [tab, setTab] = useState('walk');
  if (example.isPending) return <Spin description="Loading the worked example…" />;
  if (example.error) return <Alert type="warning" showIcon title={example.error.message} />;
  const data = example.data;
  const unitSystem = user?.unitSystem ?? 'si';
  const chart = data.revealed ? <ExampleChart example={data} unitSystem={unitSystem} /> : undefined;

  return (
    <>
      <ExampleTitle example={data} />
      <Space orientation="vertical" size="middle" style={{ width: '100%', maxWidth: 1100 }}>
        {data.intro ? (
          <Typography.Paragraph style={{ fontSize: 16, margin: 0, whiteSpace: 'pre-line' }}>
            {data.intro}
          </Typography.Paragraph>
        ) : null}
        <ExamplePublishedNote example={data} />
        {data.warnings
          .filter((warning) => warning.severity !== 'note')
          .map((warning) => (
            <ExampleWarningAlert key={warning.code} warning={warning} />
          ))}
        <Tabs activeKey={tab} onChange={setTab} items={exampleTabs(data, unitSystem, chart)} />
      </Space>
    </>
  );
}
