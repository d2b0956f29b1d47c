import { Card, Typography } from 'antd';
import type { DerivationStep } from '@loftwright/buoyancy';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { stepNumber } from './step-number';

/** Every step: what is computed, the formula, the numbers put in, the result, and its source. */
export function DerivationPanel({ steps }: { steps: readonly DerivationStep[] }) {
  const { numberFormat } = useReadingPreferences();
  const number = (value: number) => stepNumber(value, numberFormat);
  return (
    <Card title="Derivation" size="small">
      <ol style={{ paddingLeft: 20, margin: 0 }} aria-label="Derivation steps">
        {steps.map((step) => (
          <li key={step.id} style={{ marginBottom: 12 }} data-step={step.id}>
            <Typography.Text strong>{step.label}</Typography.Text>
            <div className="lw-mono">{step.formula}</div>
            {step.values.length > 0 ? (
              <div className="lw-mono" style={{ fontSize: 12 }}>
                {step.values
                  .map(
                    (value) =>
                      `${value.symbol} = ${number(value.value)}${value.unit ? ` ${value.unit}` : ''}`,
                  )
                  .join(', ')}
              </div>
            ) : null}
            <div className="lw-mono">
              → {step.result.symbol} = {number(step.result.value)} {step.result.unit}
            </div>
            <Typography.Text type="secondary" style={{ fontSize: 12 }}>
              {step.source}
            </Typography.Text>
          </li>
        ))}
      </ol>
    </Card>
  );
}
