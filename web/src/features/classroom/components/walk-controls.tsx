import { FullscreenOutlined, LeftOutlined, RightOutlined } from '@ant-design/icons';
import { Button, Space, Typography } from 'antd';
import type { WalkAction } from '../lib/walk-through-state';

/** Where the walk-through stands, and its buttons: back, next, reveal all, start again, present. */
export function WalkControls({
  stepNumber,
  stepCount,
  stepLabel,
  fontSize,
  atEnd,
  onAct,
  projector,
  onPresent,
}: {
  /** The current step, counted from 1. */
  stepNumber: number;
  stepCount: number;
  stepLabel: string | undefined;
  fontSize: number;
  atEnd: boolean;
  onAct: (action: WalkAction) => void;
  projector: boolean;
  onPresent: () => void;
}) {
  return (
    <Space wrap style={{ width: '100%', justifyContent: 'space-between', marginBottom: 12 }}>
      <Typography.Text strong style={{ fontSize: fontSize * 0.7 }} aria-live="polite">
        Step {stepNumber} of {stepCount}
        {stepLabel !== undefined ? `: ${stepLabel}` : ''}
      </Typography.Text>
      <Space>
        <Button icon={<LeftOutlined />} onClick={() => onAct('back')} aria-label="Back one stage">
          Back
        </Button>
        <Button
          type="primary"
          icon={<RightOutlined />}
          onClick={() => onAct('next')}
          disabled={atEnd}
          aria-label="Next stage"
        >
          Next
        </Button>
        <Button onClick={() => onAct('reveal-all')} disabled={atEnd}>
          Reveal all
        </Button>
        <Button onClick={() => onAct('restart')}>Start again</Button>
        <Button
          icon={<FullscreenOutlined />}
          onClick={onPresent}
          aria-pressed={projector}
          aria-label={projector ? 'Leave the projector view' : 'Present full screen'}
        >
          {projector ? 'Leave' : 'Present'}
        </Button>
      </Space>
    </Space>
  );
}
