import { Space, Tag, theme, Typography } from 'antd';
import type { ExampleStep } from '../api/classroom-api';
import { StepBody } from './walk-step-body';

/**
 * One step shown so far: the current one in the accent colour, one the student's answer went
 * wrong at in the caution colour.
 */
export function WalkStepItem({
  step,
  index,
  isCurrent,
  wrong,
  stageIndex,
  note,
  fontSize,
}: {
  step: ExampleStep;
  index: number;
  isCurrent: boolean;
  wrong: boolean;
  stageIndex: number;
  note: string | undefined;
  fontSize: number;
}) {
  const { token } = theme.useToken();
  const edge = wrong ? token.colorError : isCurrent ? token.colorWarning : token.colorBorder;
  const size = isCurrent ? fontSize : fontSize * 0.75;
  return (
    <li
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
          style={{ fontSize: size, color: isCurrent ? token.colorWarningText : undefined }}
        >
          {index + 1}. {step.label}
        </Typography.Text>
        {wrong ? <Tag color="error">Your answer went wrong here</Tag> : null}
      </Space>
      <StepBody step={step} stageIndex={isCurrent ? stageIndex : 2} note={note} fontSize={size} />
    </li>
  );
}
