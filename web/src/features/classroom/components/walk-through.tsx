import { Progress, theme, Typography } from 'antd';
import { type ReactNode, useRef } from 'react';
import type { ExampleStep } from '../api/classroom-api';
import { useProjector } from '../hooks/use-projector';
import { useWalkPosition } from '../hooks/use-walk-position';
import { actionForKey, STAGES, walkProgressPercent } from '../lib/walk-through-state';
import { WalkControls } from './walk-controls';
import { WalkStepItem } from './walk-step-item';

/**
 * A derivation for the projector, one step at a time: the formula, then the numbers substituted,
 * then the result. Earlier steps stay in view; the current one is set in the accent colour.
 * Keys: → / space / page down for next, ← / page up for back, A or End to reveal all, Home to
 * start again.
 */
export function WalkThrough({
  steps,
  notes,
  chart,
  chartStepId,
  wrongStepId,
  title,
}: {
  steps: readonly ExampleStep[];
  notes: Readonly<Record<string, string>>;
  /** The example's chart, shown once the walk-through reaches its step. */
  chart?: ReactNode;
  /** The step the chart belongs to; null shows it with the last step. */
  chartStepId: string | null;
  /** A step the student's answer went wrong at, marked in the caution colour. */
  wrongStepId?: string | null;
  title: string;
}) {
  const { token } = theme.useToken();
  const frame = useRef<HTMLElement>(null);
  const { position, act } = useWalkPosition(steps.length, frame);
  const { projector, present } = useProjector(frame);
  const fontSize = projector ? 34 : 20;
  const stageIndex = STAGES.indexOf(position.stage);
  const chartIndex = chartStepId
    ? steps.findIndex((step) => step.id === chartStepId)
    : steps.length - 1;
  const chartShown =
    chart !== undefined &&
    chartIndex >= 0 &&
    (position.step > chartIndex || (position.step === chartIndex && stageIndex === 2));
  const atEnd = position.step === steps.length - 1 && stageIndex === 2;

  return (
    <section
      ref={frame}
      tabIndex={0}
      aria-label={`Walk-through: ${title}`}
      aria-roledescription="step-by-step presentation"
      aria-keyshortcuts="ArrowRight ArrowLeft Space PageDown PageUp A End Home"
      className="lw-walk-through"
      onKeyDown={(event) => {
        const action = actionForKey(event.key);
        // On a focused button, space and Enter press the button; arrows still move the walk.
        const onChild = event.target !== event.currentTarget;
        if (!action || (onChild && (event.key === ' ' || event.key === 'Enter'))) return;
        event.preventDefault();
        act(action);
      }}
      style={{
        background: token.colorBgContainer,
        padding: projector ? 48 : 16,
        border: `1px solid ${token.colorBorder}`,
        borderRadius: token.borderRadius,
        outlineColor: token.colorPrimary,
        overflowY: 'auto',
      }}
    >
      <WalkControls
        stepNumber={Math.min(position.step + 1, steps.length)}
        stepCount={steps.length}
        stepLabel={steps[position.step]?.label}
        fontSize={fontSize}
        atEnd={atEnd}
        onAct={act}
        projector={projector}
        onPresent={() => void present()}
      />
      <Progress
        percent={walkProgressPercent(position, steps.length)}
        showInfo={false}
        aria-label="Progress through the walk-through"
        strokeColor={token.colorWarning}
        style={{ marginBottom: 16 }}
      />
      <ol style={{ paddingLeft: 0, listStyle: 'none', margin: 0 }} aria-label="Steps shown so far">
        {steps.slice(0, position.step + 1).map((step, index) => (
          <WalkStepItem
            key={step.id}
            step={step}
            index={index}
            isCurrent={index === position.step}
            wrong={step.id === wrongStepId}
            stageIndex={stageIndex}
            note={notes[step.id]}
            fontSize={fontSize}
          />
        ))}
      </ol>
      {chartShown ? <div aria-label="Chart for this step">{chart}</div> : null}
      <Typography.Text type="secondary" style={{ fontSize: 12 }}>
        Keys: → or space for next, ← for back, A to reveal all, Home to start again.
      </Typography.Text>
    </section>
  );
}
