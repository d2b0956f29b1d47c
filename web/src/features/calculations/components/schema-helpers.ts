import { fieldLabel } from '@loftwright/buoyancy';

export type Schema = Record<string, unknown>;
export type Value = Record<string, unknown>;

export const asSchema = (value: unknown): Schema =>
  value && typeof value === 'object' ? (value as Schema) : {};

export const labelOf = (key: string, schema: Schema): string => fieldLabel(key, schema);

/** The constant a variant of a union holds at the discriminator `key`. */
export const constOf = (variant: Schema, key: string): unknown =>
  asSchema(asSchema(variant.properties)[key]).const;

/** The discriminator of a union: the property that is a constant in every variant. */
export function discriminatorOf(variants: Schema[]): string | undefined {
  const first = asSchema(variants[0]?.properties);
  return Object.keys(first).find((key) =>
    variants.every((variant) => constOf(variant, key) !== undefined),
  );
}

/** Defaults of a schema's properties, for a freshly chosen variant. */
export function defaultsOf(schema: Schema): Value {
  const result: Value = {};
  for (const [key, property] of Object.entries(asSchema(schema.properties))) {
    const child = asSchema(property);
    if (child.const !== undefined) result[key] = child.const;
    else if (child.default !== undefined) result[key] = child.default;
  }
  return result;
}

/** Whether the engine says this field means nothing given its siblings' values (`notWhen`). */
export function hiddenBy(field: Schema, siblings: Value): boolean {
  const condition = asSchema(field.notWhen);
  return Object.entries(condition).some(
    ([key, values]) => Array.isArray(values) && values.includes(siblings[key]),
  );
}
