import { Form, Input, InputNumber, Select, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { dimensionForField } from '@/components/quantity/dimension-for-field';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { ArrayRowsField } from './array-rows-field';

type Schema = Record<string, unknown>;
type Value = Record<string, unknown>;

const asSchema = (value: unknown): Schema =>
  value && typeof value === 'object' ? (value as Schema) : {};

const humanise = (key: string) =>
  key
    .replace(/(M3|M2|Kg|K|Pa|M|S|A|V|J|W|N|KgM2|KgM3|MS)$/, '')
    .replace(/([A-Z])/g, ' $1')
    .replace(/^./, (first) => first.toUpperCase())
    .trim();

const capitalise = (text: string) => text.replace(/^./, (first) => first.toUpperCase());

function labelOf(key: string, schema: Schema): string {
  return typeof schema.description === 'string' ? capitalise(schema.description) : humanise(key);
}

/** The discriminator of a union: the property that is a constant in every variant. */
function discriminatorOf(variants: Schema[]): string | undefined {
  const first = asSchema(variants[0]?.properties);
  return Object.keys(first).find((key) =>
    variants.every((variant) => asSchema(asSchema(variant.properties)[key]).const !== undefined),
  );
}

/** Defaults of a schema's properties, for a freshly chosen variant. */
function defaultsOf(schema: Schema): Value {
  const result: Value = {};
  for (const [key, property] of Object.entries(asSchema(schema.properties))) {
    const child = asSchema(property);
    if (child.const !== undefined) result[key] = child.const;
    else if (child.default !== undefined) result[key] = child.default;
  }
  return result;
}

export interface SchemaFieldProps {
  name: string;
  path: string;
  schema: Schema;
  value: unknown;
  onChange: (value: unknown) => void;
  unitSystem: UnitSystem;
  /** Messages by field path, from the engine's live check or the server. */
  errors: Record<string, string>;
  required?: boolean;
  disabled?: boolean;
}

/** One input of a kind, rendered from its JSON Schema: objects, variants, quantities, choices. */
export function SchemaField({
  name,
  path,
  schema,
  value,
  onChange,
  unitSystem,
  errors,
  required = true,
  disabled,
}: SchemaFieldProps) {
  const variants = (schema.oneOf ?? schema.anyOf) as Schema[] | undefined;
  const fieldId = `field-${path.replace(/[^\w]+/g, '-')}`;
  const help = errors[path];
  if (Array.isArray(variants)) {
    const key = discriminatorOf(variants);
    const current = (value ?? {}) as Value;
    const selected =
      variants.find(
        (variant) => asSchema(asSchema(variant.properties)[key ?? '']).const === current[key ?? ''],
      ) ?? variants[0];
    if (!key || !selected) return null;
    return (
      <fieldset style={{ border: 'none', padding: 0, margin: 0 }}>
        <Form.Item
          label={labelOf(name, schema)}
          htmlFor={fieldId}
          validateStatus={help ? 'error' : undefined}
          help={help}
        >
          <Select
            id={fieldId}
            value={current[key] as string}
            disabled={disabled}
            options={variants.map((variant) => {
              const constValue = String(asSchema(asSchema(variant.properties)[key]).const);
              return {
                value: constValue,
                label: humanise(
                  constValue.replace(/-/g, ' ').replace(/^\w/, (c) => c.toUpperCase()),
                ),
              };
            })}
            onChange={(next) => {
              const variant = variants.find(
                (candidate) => asSchema(asSchema(candidate.properties)[key]).const === next,
              );
              onChange(variant ? defaultsOf(variant) : { [key]: next });
            }}
          />
        </Form.Item>
        <ObjectFields
          schema={selected}
          path={path}
          value={current}
          onChange={onChange}
          unitSystem={unitSystem}
          errors={errors}
          disabled={disabled}
        />
      </fieldset>
    );
  }
  if (schema.type === 'object') {
    return (
      <fieldset style={{ border: 'none', padding: 0, margin: 0 }}>
        {path.includes('.') || name === '' ? null : (
          <Typography.Title level={5}>{labelOf(name, schema)}</Typography.Title>
        )}
        <ObjectFields
          schema={schema}
          path={path}
          value={(value ?? {}) as Value}
          onChange={onChange}
          unitSystem={unitSystem}
          errors={errors}
          disabled={disabled}
        />
      </fieldset>
    );
  }
  const label = `${labelOf(name, schema)}${required ? '' : ' (optional)'}`;
  const common = {
    validateStatus: help ? ('error' as const) : undefined,
    help,
    label,
    htmlFor: fieldId,
  };
  if (schema.type === 'number' || schema.type === 'integer') {
    const dimension =
      typeof schema.unit === 'string' ? dimensionForField(name, schema.unit) : undefined;
    if (dimension && schema.type === 'number') {
      return (
        <Form.Item {...common}>
          <QuantityInput
            id={fieldId}
            label={label}
            dimension={dimension}
            value={typeof value === 'number' ? value : undefined}
            onChange={onChange}
            unitSystem={unitSystem}
            disabled={disabled}
          />
        </Form.Item>
      );
    }
    return (
      <Form.Item {...common}>
        <InputNumber
          id={fieldId}
          value={typeof value === 'number' ? value : null}
          onChange={(next) => onChange(next ?? undefined)}
          disabled={disabled}
          style={{ width: '100%' }}
        />
      </Form.Item>
    );
  }
  if (Array.isArray(schema.enum)) {
    const titles = asSchema(schema.enumTitles);
    return (
      <Form.Item {...common}>
        <Select
          id={fieldId}
          value={value as string}
          disabled={disabled}
          options={schema.enum.map((option) => {
            const title = titles[String(option)];
            return {
              value: option,
              label:
                typeof title === 'string' ? title : humanise(String(option).replace(/-/g, ' ')),
            };
          })}
          onChange={onChange}
        />
      </Form.Item>
    );
  }
  if (schema.type === 'array') {
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
  return (
    <Form.Item {...common}>
      <Input
        id={fieldId}
        value={typeof value === 'string' ? value : ''}
        onChange={(event) => onChange(event.target.value)}
        disabled={disabled}
      />
    </Form.Item>
  );
}

function ObjectFields({
  schema,
  path,
  value,
  onChange,
  unitSystem,
  errors,
  disabled,
}: Omit<SchemaFieldProps, 'name' | 'required'> & { value: Value }) {
  const required = new Set((schema.required as string[] | undefined) ?? []);
  return (
    <>
      {Object.entries(asSchema(schema.properties)).map(([key, property]) => {
        const child = asSchema(property);
        if (child.const !== undefined) return null;
        return (
          <SchemaField
            key={key}
            name={key}
            path={path ? `${path}.${key}` : key}
            schema={child}
            value={value[key]}
            onChange={(next) => onChange({ ...value, [key]: next })}
            unitSystem={unitSystem}
            errors={errors}
            required={required.has(key) || child.default !== undefined}
            disabled={disabled}
          />
        );
      })}
    </>
  );
}
