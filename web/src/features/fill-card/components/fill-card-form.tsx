import { type Dimension, FILL_CARD_RANGES, type UnitSystem } from '@loftwright/buoyancy';
import { Form, Space, Typography } from 'antd';
import { CountInput } from '@/components/quantity/count-input';
import { QuantityInput } from '@/components/quantity/quantity-input';

/** What the crew types on the card, in SI; undefined while a field is empty or unreadable. */
export interface FillCardFormValues {
  fillerMassKg?: number;
  freeLiftKg?: number;
  cylinder: {
    waterVolumeM3?: number;
    fillPressurePa?: number;
    temperatureK?: number;
    count?: number;
  };
}

/** The engine's field names and the labels the form shows them by (errors name the label). */
export const FILL_CARD_LABELS: Record<string, string> = {
  fillerMassKg: 'Filler mass',
  freeLiftKg: 'Target free lift',
  'cylinder.waterVolumeM3': 'Cylinder water volume',
  'cylinder.fillPressurePa': 'Full cylinder pressure (gauge)',
  'cylinder.temperatureK': 'Cylinder temperature',
  'cylinder.count': 'Full cylinders the team has',
};

type CylinderKey = Exclude<keyof FillCardFormValues['cylinder'], 'count'>;

const CYLINDER_FIELDS: {
  key: CylinderKey;
  dimension: Dimension;
  range: { min: number; max: number };
}[] = [
  { key: 'waterVolumeM3', dimension: 'volume', range: FILL_CARD_RANGES.waterVolumeM3 },
  {
    key: 'fillPressurePa',
    dimension: 'pressureDifference',
    range: FILL_CARD_RANGES.fillPressurePa,
  },
  { key: 'temperatureK', dimension: 'temperature', range: FILL_CARD_RANGES.temperatureK },
];

/**
 * The card's inputs: filler mass and target free lift, and optionally the team's cylinders. A
 * problem the engine finds is shown beside the field it names.
 */
export function FillCardForm({
  values,
  onChange,
  unitSystem,
  problems,
}: {
  values: FillCardFormValues;
  onChange: (values: FillCardFormValues) => void;
  unitSystem: UnitSystem;
  /** Engine field name → what is wrong with it. */
  problems: Record<string, string>;
}) {
  const setCylinder = (patch: Partial<FillCardFormValues['cylinder']>) =>
    onChange({ ...values, cylinder: { ...values.cylinder, ...patch } });
  const massField = (key: 'fillerMassKg' | 'freeLiftKg') => (
    <Form.Item label={FILL_CARD_LABELS[key]} htmlFor={`fill-card-${key}`}>
      <QuantityInput
        id={`fill-card-${key}`}
        label={FILL_CARD_LABELS[key] ?? key}
        dimension="mass"
        value={values[key]}
        onChange={(value) => onChange({ ...values, [key]: value })}
        unitSystem={unitSystem}
        range={FILL_CARD_RANGES[key]}
        externalProblem={problems[key]}
      />
    </Form.Item>
  );
  return (
    <Form layout="vertical" className="lw-fill-card-form" component="div">
      <Space wrap align="start">
        {massField('fillerMassKg')}
        {massField('freeLiftKg')}
      </Space>
      <Typography.Paragraph type="secondary">
        Cylinders (optional): the card then says how far their gauges fall.
      </Typography.Paragraph>
      <Space wrap align="start">
        {CYLINDER_FIELDS.map(({ key, dimension, range }) => (
          <Form.Item
            key={key}
            label={FILL_CARD_LABELS[`cylinder.${key}`]}
            htmlFor={`fill-card-${key}`}
          >
            <QuantityInput
              id={`fill-card-${key}`}
              label={FILL_CARD_LABELS[`cylinder.${key}`] ?? key}
              dimension={dimension}
              value={values.cylinder[key]}
              onChange={(value) => setCylinder({ [key]: value })}
              unitSystem={unitSystem}
              range={range}
              externalProblem={problems[`cylinder.${key}`]}
            />
          </Form.Item>
        ))}
        <Form.Item label={FILL_CARD_LABELS['cylinder.count']} htmlFor="fill-card-count">
          <CountInput
            id="fill-card-count"
            label={FILL_CARD_LABELS['cylinder.count'] ?? 'count'}
            value={values.cylinder.count}
            onChange={(count) => setCylinder({ count })}
            min={FILL_CARD_RANGES.count.min}
            max={FILL_CARD_RANGES.count.max}
            externalProblem={problems['cylinder.count']}
          />
        </Form.Item>
      </Space>
    </Form>
  );
}
