import { Form, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { FieldRemarks } from '@/components/reading/field-remarks';
import { NumberField } from './number-field';
import { ArrayRowsField } from './array-rows-field';
import { CurrencyCodeField, EnumField, TextField, VariantSelect } from './schema-choice-fields';
import {
  asSchema,
  constOf,
  defaultsOf,
  discriminatorOf,
  hiddenBy,
  labelOf,
  type Schema,
  type Value,
} from './schema-helpers';

const NO_NOTES: Record<string, string> = {};

export interface SchemaFieldProps {
  name: string;
  path: string;
  schema: Schema;
  value: unknown;
  onChange: (value: unknown) => void;
  unitSystem: UnitSystem;
  /** Messages by field path, from the engine's live check or the server. */
  errors: Record<string, string>;
  /** "Check this" notes by field path, for values the engine seldom meets. */
  notes?: Record<string, string>;
  required?: boolean;
  disabled?: boolean;
  /** Currency of the money fields in this part of the form (a sibling `currency` field). */
  currency?: string;
}

/** One input of a kind from its JSON Schema, with any review remarks anchored to it beneath. */
export function SchemaField(props: SchemaFieldProps) {
  return (
    <>
      <SchemaFieldControl {...props} />
      <FieldRemarks path={props.path} />
    </>
  );
}

/** One input of a kind, rendered from its JSON Schema: objects, variants, quantities, choices. */
function SchemaFieldControl(props: SchemaFieldProps) {
  const { name, path, schema, value, onChange, unitSystem, required = true, disabled } = props;
  const notes = props.notes ?? NO_NOTES;
  const variants = (schema.oneOf ?? schema.anyOf) as Schema[] | undefined;
  const fieldId = `field-${path.replace(/[^\w]+/g, '-')}`;
  const help = props.errors[path];
  if (Array.isArray(variants))
    return <VariantFields {...props} notes={notes} variants={variants} />;
  if (schema.type === 'object') {
    return (
      <fieldset style={{ border: 'none', padding: 0, margin: 0 }}>
        {path.includes('.') || name === '' ? null : (
          <Typography.Title level={5}>{labelOf(name, schema)}</Typography.Title>
        )}
        <ObjectFields {...props} notes={notes} value={(value ?? {}) as Value} />
      </fieldset>
    );
  }
  const label = `${labelOf(name, schema)}${required ? '' : ' (optional)'}`;
  if (schema.type === 'number' || schema.type === 'integer') {
    return (
      <Form.Item label={label} htmlFor={fieldId}>
        <NumberField
          id={fieldId}
          label={label}
          schema={schema}
          value={typeof value === 'number' ? value : undefined}
          onChange={onChange}
          unitSystem={unitSystem}
          problem={help}
          note={notes[path]}
          currency={props.currency}
          disabled={disabled}
        />
      </Form.Item>
    );
  }
  const leaf = { fieldId, label, help, value, onChange, disabled };
  if (schema.currencyCode === true) return <CurrencyCodeField {...leaf} />;
  if (Array.isArray(schema.enum)) return <EnumField {...leaf} schema={schema} />;
  if (schema.type === 'array') {
    return <ArraySchemaField {...props} notes={notes} fieldId={fieldId} label={label} />;
  }
  return <TextField {...leaf} />;
}

/** A union: the variant chosen by its discriminator, then that variant's fields. */
function VariantFields({ variants, ...props }: SchemaFieldProps & { variants: Schema[] }) {
  const { name, path, schema, value, onChange, disabled } = props;
  const fieldId = `field-${path.replace(/[^\w]+/g, '-')}`;
  const key = discriminatorOf(variants);
  const current = (value ?? {}) as Value;
  const selected =
    variants.find((variant) => constOf(variant, key ?? '') === current[key ?? '']) ?? variants[0];
  if (!key || !selected) return null;
  return (
    <fieldset style={{ border: 'none', padding: 0, margin: 0 }}>
      <VariantSelect
        fieldId={fieldId}
        label={labelOf(name, schema)}
        help={props.errors[path]}
        value={current[key]}
        onChange={onChange}
        disabled={disabled}
        variants={variants}
        discriminator={key}
      />
      <ObjectFields {...props} schema={selected} value={current} />
    </fieldset>
  );
}

/** A list from its item schema: rows of items, each item's fields from the schema. */
function ArraySchemaField({
  fieldId,
  label,
  ...props
}: SchemaFieldProps & { fieldId: string; label: string }) {
  const { path, schema, value, onChange, unitSystem, errors, notes, disabled } = props;
  const items = asSchema(schema.items);
  const itemVariants = (items.oneOf ?? items.anyOf) as Schema[] | undefined;
  return (
    <ArrayRowsField
      id={fieldId}
      path={path}
      label={label}
      itemLabel={typeof schema.itemLabel === 'string' ? schema.itemLabel : 'item'}
      value={value}
      onChange={onChange}
      newItem={() =>
        Array.isArray(itemVariants)
          ? defaultsOf(asSchema(itemVariants[0]))
          : items.type === 'object'
            ? defaultsOf(items)
            : items.default
      }
      renderItem={(item, index, onItemChange) => (
        <SchemaField
          name=""
          path={`${path}.${index}`}
          schema={items}
          value={item}
          onChange={onItemChange}
          unitSystem={unitSystem}
          errors={errors}
          notes={notes}
          disabled={disabled}
        />
      )}
      minItems={typeof schema.minItems === 'number' ? schema.minItems : undefined}
      maxItems={typeof schema.maxItems === 'number' ? schema.maxItems : undefined}
      errors={errors}
      disabled={disabled}
    />
  );
}

function ObjectFields({
  schema,
  path,
  value,
  onChange,
  unitSystem,
  errors,
  notes,
  disabled,
  currency,
}: Omit<SchemaFieldProps, 'name' | 'required'> & { value: Value }) {
  const required = new Set((schema.required as string[] | undefined) ?? []);
  const sectionCurrency = typeof value.currency === 'string' ? value.currency : currency;
  const properties = asSchema(schema.properties);
  // A change that makes a field meaningless (purity once the gas is heated air) drops its value,
  // so the engine's default stands and nothing hidden is refused.
  const withoutHidden = (next: Value): Value =>
    Object.fromEntries(
      Object.entries(next).filter(([key]) => !hiddenBy(asSchema(properties[key]), next)),
    );
  return (
    <>
      {Object.entries(properties).map(([key, property]) => {
        const child = asSchema(property);
        if (child.const !== undefined || hiddenBy(child, value)) return null;
        return (
          <SchemaField
            key={key}
            name={key}
            path={path ? `${path}.${key}` : key}
            schema={child}
            value={value[key]}
            onChange={(next) => onChange(withoutHidden({ ...value, [key]: next }))}
            unitSystem={unitSystem}
            errors={errors}
            notes={notes}
            required={required.has(key) || child.default !== undefined}
            disabled={disabled}
            currency={sectionCurrency}
          />
        );
      })}
    </>
  );
}
