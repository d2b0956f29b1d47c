import { Alert, Space, Spin, Tabs, Tag, Typography } from 'antd';
import type { CalculationResult, DerivationStep } from '@loftwright/buoyancy';
import { lazy, Suspense, useState } from 'react';
import { PanelBoundary } from '@/components/errors/panel-boundary';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';
import { type ExampleDetail, useExample } from '@/features/classroom/api/classroom-api';
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

const SEVERITY = { caution: 'error', warning: 'warning', note: 'info' } as const;

/** The result as the charts take it; only for a fully revealed example. */
function chartResult(example: ExampleDetail): CalculationResult {
  return {
    outputs: example.outputs,
    steps: example.steps as unknown as DerivationStep[],
    warnings: example.warnings,
    ...(example.series ? { series: example.series } : {}),
  };
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
  const teaching = data.standing !== 'student';
  const wrongStepId = data.mySubmissions[0]?.check.firstWrongStepId ?? null;
  const chart = data.revealed ? (
    <PanelBoundary what="the chart">
      <Suspense fallback={<Spin description="Loading the chart…" />}>
        <CalculationCharts
          kind={data.kind}
          inputs={data.inputs}
          result={chartResult(data)}
          unitSystem={unitSystem}
        />
      </Suspense>
    </PanelBoundary>
  ) : undefined;

  const items = [
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
            wrongStepId={wrongStepId}
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

  return (
    <>
      <Typography.Text type="secondary">
        <Link to={paths.classroom.href(data.classroomId)}>{data.classroomTitle}</Link>
      </Typography.Text>
      <Typography.Title level={2} style={{ marginTop: 4 }}>
        {data.title}{' '}
        {data.exercise ? (
          <Tag color="warning">exercise, ±{data.exercise.tolerancePercent} %</Tag>
        ) : null}
      </Typography.Title>
      <Space orientation="vertical" size="middle" style={{ width: '100%', maxWidth: 1100 }}>
        {data.intro ? (
          <Typography.Paragraph style={{ fontSize: 16, margin: 0, whiteSpace: 'pre-line' }}>
            {data.intro}
          </Typography.Paragraph>
        ) : null}
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          Published by {data.teacher.displayName} from version {data.versionNumber} of the
          calculation (fingerprint <span className="lw-mono">{data.fingerprint.slice(0, 12)}</span>,
          engine {data.engineVersion}). This copy does not change when the calculation does.
        </Typography.Text>
        {data.warnings
          .filter((warning) => warning.severity !== 'note')
          .map((warning) => (
            <Alert
              key={warning.code}
              type={SEVERITY[warning.severity]}
              showIcon
              title={warning.severity === 'caution' ? 'Caution' : 'Check this'}
              description={warning.message}
              data-warning={warning.code}
            />
          ))}
        <Tabs activeKey={tab} onChange={setTab} items={items} />
      </Space>
    </>
  );
}
