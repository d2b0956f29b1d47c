import { FullscreenOutlined, LeftOutlined, RightOutlined } from '@ant-design/icons';
import { Button, Progress, Space, Tag, theme, Typography } from 'antd';
import type { NumberFormat } from '@loftwright/buoyancy';
import { type ReactNode, useEffect, useRef, useState } from 'react';
import { stepNumber } from '@/components/results/step-number';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { ExampleStep } from '../api/classroom-api';
import {
  actionForKey,
  moveWalk,
  STAGES,
  type WalkAction,
  type WalkPosition,
  walkProgressPercent,
} from '../lib/walk-through-state';

const shown = (value: number | null, unit: string, numberFormat: NumberFormat) =>
  value === null ? '?' : `${stepNumber(value, numberFormat)}${unit ? ` ${unit}` : ''}`;

function StepBody({
  step,
  stageIndex,
  note,
  fontSize,
}: {
  step: ExampleStep;
  /** How much of the step is shown: 0 formula, 1 values too, 2 result too. */
  stageIndex: number;
  note: string | undefined;
  fontSize: number;
}) {
  const { numberFormat } = useReadingPreferences();
  return (
    <>
      <div className="lw-mono" style={{ fontSize }} data-part="formula">
        {step.formula}
      </div>
      {stageIndex >= 1 && step.values.length > 0 ? (
        <div className="lw-mono" style={{ fontSize: fontSize * 0.8 }} data-part="values">
          {step.values
            .map((value) => `${value.symbol} = ${shown(value.value, value.unit, numberFormat)}`)
            .join(', ')}
        </div>
      ) : null}
      {stageIndex >= 2 ? (
        <div className="lw-mono" style={{ fontSize, fontWeight: 600 }} data-part="result">
          → {step.result.symbol} ={' '}
          {step.hidden ? '?' : shown(step.result.value, step.result.unit, numberFormat)}
          {step.hidden ? (
            <Typography.Text type="secondary" style={{ fontSize: fontSize * 0.6, marginLeft: 12 }}>
              your turn: work this out in the exercise
            </Typography.Text>
          ) : null}
        </div>
      ) : null}
      {note && stageIndex >= 0 ? (
        <Typography.Paragraph
          style={{ fontSize: fontSize * 0.7, margin: '6px 0 0' }}
          data-part="note"
        >
          {note}
        </Typography.Paragraph>
      ) : null}
      {stageIndex >= 2 ? (
        <Typography.Text type="secondary" style={{ fontSize: Math.max(12, fontSize * 0.5) }}>
          {step.source}
        </Typography.Text>
      ) : null}
    </>
  );
}

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
  const [position, setPosition] = useState<WalkPosition>({ step: 0, stage: 'formula' });
  const [projector, setProjector] = useState(false);
  const frame = useRef<HTMLElement>(null);
  const act = (action: WalkAction) => setPosition((now) => moveWalk(now, action, steps.length));
  const fontSize = projector ? 34 : 20;
  const stageIndex = STAGES.indexOf(position.stage);
  const chartIndex = chartStepId
    ? steps.findIndex((step) => step.id === chartStepId)
    : steps.length - 1;
  const chartShown =
    chart !== undefined &&
    chartIndex >= 0 &&
    (position.step > chartIndex || (position.step === chartIndex && stageIndex === 2));
  const current = steps[position.step];
  const atEnd = position.step === steps.length - 1 && stageIndex === 2;

  const present = async () => {
    const element = frame.current;
    if (!element) return;
    if (projector) {
      setProjector(false);
      if (document.fullscreenElement) await document.exitFullscreen().catch(() => undefined);
      return;
    }
    setProjector(true);
    element.focus();
    await element.requestFullscreen?.().catch(() => undefined);
  };

  // The current step stays in view as the walk-through grows below the fold.
  useEffect(() => {
    frame.current
      ?.querySelector('[aria-current="step"]')
      ?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  }, [position]);

  useEffect(() => {
    const left = () => {
      if (!document.fullscreenElement) setProjector(false);
    };
    document.addEventListener('fullscreenchange', left);
    return () => document.removeEventListener('fullscreenchange', left);
  }, []);

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
      <Space wrap style={{ width: '100%', justifyContent: 'space-between', marginBottom: 12 }}>
        <Typography.Text strong style={{ fontSize: fontSize * 0.7 }} aria-live="polite">
          Step {Math.min(position.step + 1, steps.length)} of {steps.length}
          {current ? `: ${current.label}` : ''}
        </Typography.Text>
        <Space>
          <Button icon={<LeftOutlined />} onClick={() => act('back')} aria-label="Back one stage">
            Back
          </Button>
          <Button
            type="primary"
            icon={<RightOutlined />}
            onClick={() => act('next')}
            disabled={atEnd}
            aria-label="Next stage"
          >
            Next
          </Button>
          <Button onClick={() => act('reveal-all')} disabled={atEnd}>
            Reveal all
          </Button>
          <Button onClick={() => act('restart')}>Start again</Button>
          <Button
            icon={<FullscreenOutlined />}
            onClick={() => void present()}
            aria-pressed={projector}
            aria-label={projector ? 'Leave the projector view' : 'Present full screen'}
          >
            {projector ? 'Leave' : 'Present'}
          </Button>
        </Space>
      </Space>
      <Progress
        percent={walkProgressPercent(position, steps.length)}
        showInfo={false}
        aria-label="Progress through the walk-through"
        strokeColor={token.colorWarning}
        style={{ marginBottom: 16 }}
      />
      <ol style={{ paddingLeft: 0, listStyle: 'none', margin: 0 }} aria-label="Steps shown so far">
        {steps.slice(0, position.step + 1).map((step, index) => {
          const isCurrent = index === position.step;
          const wrong = step.id === wrongStepId;
          const edge = wrong
            ? token.colorError
            : isCurrent
              ? token.colorWarning
              : token.colorBorder;
          return (
            <li
              key={step.id}
              data-step={step.id}
              aria-current={isCurrent ? 'step' : undefined}
              style={{
                borderLeft: `6px solid ${edge}`,
                padding: '8px 16px',
                marginBottom: 12,
                background: isCurrent ? token.colorWarningBg : undefined,
                opacity: isCurrent ? 1 : 0.85,
              }}
            >
              <Space size={8} wrap>
                <Typography.Text
                  strong
                  style={{
                    fontSize: isCurrent ? fontSize : fontSize * 0.75,
                    color: isCurrent ? token.colorWarningText : undefined,
                  }}
                >
                  {index + 1}. {step.label}
                </Typography.Text>
                {wrong ? <Tag color="error">Your answer went wrong here</Tag> : null}
              </Space>
              <StepBody
                step={step}
                stageIndex={isCurrent ? stageIndex : 2}
                note={notes[step.id]}
                fontSize={isCurrent ? fontSize : fontSize * 0.75}
              />
            </li>
          );
        })}
      </ol>
      {chartShown ? <div aria-label="Chart for this step">{chart}</div> : null}
      <Typography.Text type="secondary" style={{ fontSize: 12 }}>
        Keys: → or space for next, ← for back, A to reveal all, Home to start again.
      </Typography.Text>
    </section>
  );
}
