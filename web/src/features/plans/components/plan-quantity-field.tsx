import { Form } from 'antd';
import type { Dimension, UnitSystem } from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';

/**
 * One quantity of a plan under its caption: a value that reads is applied, text that does not is
 * held as unread (under `field`) so saving waits for it.
 */
export function PlanQuantityField({
  editor,
  field,
  caption,
  label,
  dimension,
  value,
  apply,
  unitSystem,
}: {
  editor: PlanDraftEditor;
  /** Key the field is held under while its text does not read. */
  field: string;
  /** What the form shows above the field. */
  caption: string;
  /** The field's accessible name. */
  label: string;
  dimension: Dimension;
  value: number | undefined;
  apply: (value: number) => void;
  unitSystem: UnitSystem;
}) {
  return (
    <Form.Item label={caption}>
      <QuantityInput
        label={label}
        dimension={dimension}
        value={value}
        onChange={(next) => editor.readAs(field, next, apply)}
        unitSystem={unitSystem}
      />
    </Form.Item>
  );
}
