import { Typography } from 'antd';
import type { NumberFormat } from '@loftwright/buoyancy';
import { stepNumber } from '@/components/results/step-number';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { ExampleStep } from '../api/classroom-api';

const shown = (value: number | null, unit: string, numberFormat: NumberFormat) =>
  value === null ? '?' : `${stepNumber(value, numberFormat)}${unit ? ` ${unit}` : ''}`;

/** One step as far as it is shown: formula, then values, then result, with its note and source. */
export function StepBody({
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
