import { DIMENSIONS, type Dimension, type UnitSystem } from '@loftwright/buoyancy';
import { CountInput } from '@/components/quantity/count-input';
import { MoneyInput } from '@/components/quantity/money-input';
import { QuantityInput } from '@/components/quantity/quantity-input';

const isDimension = (value: unknown): value is Dimension =>
  typeof value === 'string' && value in DIMENSIONS;

export interface NumberFieldProps {
  id: string;
  label: string;
  /** The field's JSON Schema: `dimension`, `minimum`, `maximum` and `moneyPer` come from the engine. */
  schema: Record<string, unknown>;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  unitSystem: UnitSystem;
  problem?: string;
  /** A "check this" note from the engine for a value it seldom meets. */
  note?: string;
  /** Currency of money fields here. */
  currency?: string;
  disabled?: boolean;
}

/** A numeric input of a kind, as the engine's schema says it is: a quantity, a count or money. */
export function NumberField({
  id,
  label,
  schema,
  value,
  onChange,
  unitSystem,
  problem,
  note,
  currency,
  disabled,
}: NumberFieldProps) {
  const min = typeof schema.minimum === 'number' ? schema.minimum : -Infinity;
  const max = typeof schema.maximum === 'number' ? schema.maximum : Infinity;
  const common = { id, label, value, onChange, disabled, externalProblem: problem, note };
  if (schema.dimension === 'money') {
    const per = schema.moneyPer === 'kWh' || schema.moneyPer === 'm³' ? schema.moneyPer : undefined;
    return <MoneyInput {...common} currency={currency ?? ''} per={per} max={max} />;
  }
  if (isDimension(schema.dimension)) {
    return (
      <QuantityInput
        {...common}
        dimension={schema.dimension}
        unitSystem={unitSystem}
        range={{ min, max }}
      />
    );
  }
  return <CountInput {...common} min={min} max={max} />;
}
