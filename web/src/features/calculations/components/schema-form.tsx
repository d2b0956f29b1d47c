import { Form, Input, Select, Typography } from 'antd';
import { fieldLabel, humaniseKey, type UnitSystem } from '@loftwright/buoyancy';
import { CURRENCIES } from '@/config/currencies';
import { FieldRemarks } from '@/components/reading/field-remarks';
import { NumberField } from './number-field';
import { ArrayRowsField } from './array-rows-field';

type Schema = Record<string, unknown>;
type Value = Record<string, unknown>;

const asSchema = (value: unknown): Schema =>
  value && typeof value === 'object' ? (value as Schema) : {};

const humanise = humaniseKey;
const labelOf = (key: string, schema: Schema): string => fieldLabel(key, schema);

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
function SchemaFieldControl({
  name,
  path,
  schema,
  value,
  onChange,
  unitSystem,
  errors,
  notes = NO_NOTES,
  required = true,
  disabled,
  currency,
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
          notes={notes}
          disabled={disabled}
          currency={currency}
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
          notes={notes}
          disabled={disabled}
          currency={currency}
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
          currency={currency}
          disabled={disabled}
        />
      </Form.Item>
    );
  }
  if (schema.currencyCode === true) {
    const code = typeof value === 'string' ? value : '';
    const codes = code === '' || CURRENCIES.includes(code) ? CURRENCIES : [code, ...CURRENCIES];
    return (
      <Form.Item {...common}>
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

/** Whether the engine says this field means nothing given its siblings' values (`notWhen`). */
function hiddenBy(field: Schema, siblings: Value): boolean {
  const condition = asSchema(field.notWhen);
  return Object.entries(condition).some(
    ([key, values]) => Array.isArray(values) && values.includes(siblings[key]),
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
