import { Form, Space, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import type { FillLogFields } from '../hooks/use-fill-log-fields';
import { FILL_LOG_RANGES } from '../lib/fill-log-ranges';

/** How lift is read, and how fine the scale and the ballast are. */
export function FillLogInstrumentFields({
  fields,
  unitSystem,
  idPrefix,
}: {
  fields: FillLogFields;
  unitSystem: UnitSystem;
  idPrefix: string;
}) {
  return (
    <>
      <Typography.Title level={5}>Lift readings</Typography.Title>
      <Typography.Paragraph type="secondary">
        Tie the envelope to a known ballast standing on a scale: the net lift is the ballast less
        what the scale shows. Or enter a net lift read directly from a spring balance or load cell.
      </Typography.Paragraph>
      <Space wrap align="start" role="group" aria-label="Instruments">
        <Form.Item
          label="Scale resolution"
          htmlFor={`${idPrefix}-resolution`}
          extra="The smallest step the scale, spring or load cell shows."
        >
          <QuantityInput
            id={`${idPrefix}-resolution`}
            label="Scale resolution"
            dimension="mass"
            value={fields.scaleResolutionKg}
            onChange={fields.setScaleResolutionKg}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.scaleResolutionKg}
          />
        </Form.Item>
        <Form.Item
          label="Ballast tolerance (±)"
          htmlFor={`${idPrefix}-tolerance`}
          extra="How far the ballast may be off its stated mass."
        >
          <QuantityInput
            id={`${idPrefix}-tolerance`}
            label="Ballast tolerance (±)"
            dimension="mass"
            value={fields.ballastToleranceKg}
            onChange={fields.setBallastToleranceKg}
            unitSystem={unitSystem}
            range={FILL_LOG_RANGES.ballastToleranceKg}
          />
        </Form.Item>
      </Space>
    </>
  );
}
