import { Form, Input, Select } from 'antd';
import { humaniseKey } from '@loftwright/buoyancy';
import { CURRENCIES } from '@/config/currencies';
import { asSchema, constOf, defaultsOf, type Schema } from './schema-helpers';

/** What every leaf field of the schema form gets: its id, label, message and value. */
export interface LeafFieldProps {
  fieldId: string;
  label: string;
  help: string | undefined;
  value: unknown;
  onChange: (value: unknown) => void;
  disabled?: boolean;
}

const itemProps = ({ fieldId, label, help }: LeafFieldProps) => ({
  validateStatus: help ? ('error' as const) : undefined,
  help,
  label,
  htmlFor: fieldId,
});

/** The variant of a union, chosen by its discriminator; a new choice starts from its defaults. */
export function VariantSelect({
  variants,
  discriminator: key,
  ...props
}: LeafFieldProps & { variants: Schema[]; discriminator: string }) {
  const { fieldId, value, onChange, disabled } = props;
  return (
    <Form.Item {...itemProps(props)}>
      <Select
        id={fieldId}
        value={value as string}
        disabled={disabled}
        options={variants.map((variant) => {
          const constValue = String(constOf(variant, key));
          return {
            value: constValue,
            label: humaniseKey(
              constValue.replace(/-/g, ' ').replace(/^\w/, (c) => c.toUpperCase()),
            ),
          };
        })}
        onChange={(next) => {
          const variant = variants.find((candidate) => constOf(candidate, key) === next);
          onChange(variant ? defaultsOf(variant) : { [key]: next });
        }}
      />
    </Form.Item>
  );
}

/** A currency code, from the list of currencies (and the one already held, if not in it). */
export function CurrencyCodeField(props: LeafFieldProps) {
  const { fieldId, value, onChange, disabled } = props;
  const code = typeof value === 'string' ? value : '';
  const codes = code === '' || CURRENCIES.includes(code) ? CURRENCIES : [code, ...CURRENCIES];
  return (
    <Form.Item {...itemProps(props)}>
      <Select
        id={fieldId}
        value={code || undefined}
        disabled={disabled}
        options={codes.map((option) => ({ value: option, label: option }))}
        onChange={onChange}
      />
    </Form.Item>
  );
}

/** One of the schema's `enum` values, each by its title where the engine gives one. */
export function EnumField({ schema, ...props }: LeafFieldProps & { schema: Schema }) {
  const { fieldId, value, onChange, disabled } = props;
  const titles = asSchema(schema.enumTitles);
  return (
    <Form.Item {...itemProps(props)}>
      <Select
        id={fieldId}
        value={value as string}
        disabled={disabled}
        options={(schema.enum as unknown[]).map((option) => {
          const title = titles[String(option)];
          return {
            value: option,
            label:
              typeof title === 'string' ? title : humaniseKey(String(option).replace(/-/g, ' ')),
          };
        })}
        onChange={onChange}
      />
    </Form.Item>
  );
}

/** Free text. */
export function TextField(props: LeafFieldProps) {
  const { fieldId, value, onChange, disabled } = props;
  return (
    <Form.Item {...itemProps(props)}>
      <Input
        id={fieldId}
        value={typeof value === 'string' ? value : ''}
        onChange={(event) => onChange(event.target.value)}
        disabled={disabled}
      />
    </Form.Item>
  );
}
