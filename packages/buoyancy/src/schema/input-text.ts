// One way to print a calculation's inputs for people: the label and section the editor shows,
// values in the reader's unit system and number format with their unit, choices by their titles.
// The sign-off sheet, its PDF, the compare view and the conflict dialog all print through here.
import type { Dimension } from '../units/dimensions.js';
import { DIMENSIONS } from '../units/dimensions.js';
import { formatNumber } from '../units/number-format.js';
import { formatQuantity } from '../units/quantity-text.js';
import { fieldLabel, humaniseKey, inputFieldInfo, type ReadableOptions } from './field-info.js';

type JsonSchema = Record<string, unknown>;

const asSchema = (value: unknown): JsonSchema =>
  value && typeof value === 'object' ? (value as JsonSchema) : {};

/** One input as a person reads it. */
export interface InputLine {
  /** Dotted path, for programs (anchoring comments, tests); never shown. */
  readonly path: string;
  readonly label: string;
  readonly text: string;
}

/** The inputs of one editor section ("Envelope"), or the kind's loose fields (title null). */
export interface InputSection {
  readonly title: string | null;
  readonly lines: InputLine[];
}

export interface InputTextOptions extends ReadableOptions {
  /** ISO 4217 code shown with money when the inputs name none. */
  readonly currency?: string;
  /** Significant digits of numbers (default 4, as results show them). */
  readonly significantDigits?: number;
}

/** A variant's name as the editor's choice shows it: "sphere-circumference" -> "Sphere circumference". */
export function choiceTitle(value: string): string {
  return humaniseKey(value.replace(/-/g, ' ').replace(/^\w/, (first) => first.toUpperCase()));
}

/** The discriminator of a union: the property that is a constant in every variant. */
function discriminatorOf(variants: JsonSchema[]): string | undefined {
  const first = asSchema(variants[0]?.properties);
  return Object.keys(first).find((key) =>
    variants.every((variant) => asSchema(asSchema(variant.properties)[key]).const !== undefined),
  );
}

const isPhysical = (dimension: unknown): dimension is Dimension =>
  typeof dimension === 'string' && dimension in DIMENSIONS;

/**
 * A single value as text, read through the schema of its field: a quantity with its unit (in
 * `unit` when given, so two values can share one), a choice by its title, yes or no.
 */
export function inputValueText(
  fieldSchema: unknown,
  value: unknown,
  options: InputTextOptions & { unit?: string },
): string {
  const schema = asSchema(fieldSchema);
  if (value === null || value === undefined) return '—';
  if (typeof value === 'number') {
    const digits = options.significantDigits ?? 4;
    if (isPhysical(schema.dimension)) {
      return formatQuantity(value, schema.dimension, options.unitSystem, {
        numberFormat: options.numberFormat,
        significantDigits: digits,
        trimZeros: true,
        ...(options.unit ? { unit: options.unit } : {}),
      }).text;
    }
    const number = formatNumber(value, options.numberFormat, {
      significantDigits: schema.type === 'integer' || schema.dimension === 'count' ? 15 : digits,
      trimZeros: true,
    });
    return schema.dimension === 'money' && options.currency
      ? `${number} ${options.currency}`
      : number;
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') {
    const title = asSchema(schema.enumTitles)[value];
    if (typeof title === 'string') return title;
    if (Array.isArray(schema.enum) || schema.const !== undefined) return choiceTitle(value);
    return value;
  }
  // A whole object or list where one value was expected (a variant changed): name its kind.
  return Array.isArray(value) ? `${value.length} items` : 'a different set of values';
}

/**
 * The unit both sides of a comparison are shown in: the one the larger of the two would pick,
 * so a row never reads "2.130 h" against "108.7 min".
 */
export function sharedUnit(
  fieldSchema: unknown,
  values: readonly unknown[],
  options: ReadableOptions,
): string | undefined {
  const dimension = asSchema(fieldSchema).dimension;
  const numbers = values.filter((value): value is number => typeof value === 'number');
  if (!isPhysical(dimension) || numbers.length === 0) return undefined;
  const largest = numbers.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a));
  return formatQuantity(largest, dimension, options.unitSystem).unitName;
}

/**
 * The schema of the field at a dotted input path, through objects, variants and lists. The
 * variant of a union is the one the inputs take when given, else the one that has the field.
 */
export function fieldSchemaAt(schema: unknown, path: string, inputs?: unknown): unknown {
  let current = asSchema(schema);
  let value: unknown = inputs;
  for (const key of path.split('.').filter((part) => part !== '')) {
    if (current.type === 'array') {
      current = asSchema(current.items);
    }
    const variants = (current.oneOf ?? current.anyOf) as JsonSchema[] | undefined;
    if (Array.isArray(variants)) {
      const byValue = value === undefined ? undefined : selectVariant(current, value);
      current =
        (byValue && byValue !== current ? byValue : undefined) ??
        variants.find((variant) => key in asSchema(asSchema(variant).properties)) ??
        current;
    }
    if (current.type !== 'array') current = asSchema(asSchema(current.properties)[key]);
    value =
      value && typeof value === 'object' ? (value as Record<string, unknown>)[key] : undefined;
  }
  return current;
}

/** The variant of a union that a value takes (by its discriminator), or the schema itself. */
function selectVariant(schema: JsonSchema, value: unknown): JsonSchema {
  const variants = (schema.oneOf ?? schema.anyOf) as JsonSchema[] | undefined;
  if (!Array.isArray(variants)) return schema;
  const key = discriminatorOf(variants);
  const chosen =
    value && typeof value === 'object' && key
      ? variants.find(
          (variant) =>
            asSchema(asSchema(variant.properties)[key]).const ===
            (value as Record<string, unknown>)[key],
        )
      : undefined;
  // Without a value to choose by, the first variant that has properties stands for the union.
  return chosen ?? variants[0] ?? schema;
}

/** The label of the field at a dotted path, as the editor shows it; the path in words if unknown. */
export function inputLabel(schema: unknown, path: string): string {
  return inputFieldInfo(schema, path)?.label ?? humaniseKey(path.split('.').at(-1) ?? path);
}

/** Every input of a calculation, in the editor's sections and order. */
export function describeInputs(
  schema: unknown,
  inputs: unknown,
  options: InputTextOptions,
): InputSection[] {
  const root = asSchema(schema);
  const values = asSchema(inputs);
  const sections: InputSection[] = [];
  let loose: InputLine[] = [];
  const currency = typeof values.currency === 'string' ? values.currency : options.currency;
  const context = { ...options, ...(currency ? { currency } : {}) };
  for (const [key, property] of Object.entries(asSchema(root.properties))) {
    if (!(key in values)) continue;
    const field = asSchema(property);
    const isSection = field.type === 'object' || Array.isArray(field.oneOf ?? field.anyOf);
    if (!isSection) {
      loose.push(...linesOf(key, key, field, values[key], context));
      continue;
    }
    if (loose.length) sections.push({ title: null, lines: loose });
    loose = [];
    sections.push({
      title: fieldLabel(key, field),
      lines: linesOf(key, key, field, values[key], context),
    });
  }
  if (loose.length) sections.push({ title: null, lines: loose });
  return sections;
}

function linesOf(
  key: string,
  path: string,
  schema: JsonSchema,
  value: unknown,
  options: InputTextOptions,
): InputLine[] {
  if (value === undefined) return [];
  const variants = (schema.oneOf ?? schema.anyOf) as JsonSchema[] | undefined;
  if (Array.isArray(variants)) {
    const discriminator = discriminatorOf(variants);
    const chosen = selectVariant(schema, value);
    const choice = discriminator ? (value as Record<string, unknown>)[discriminator] : undefined;
    const head: InputLine[] =
      typeof choice === 'string'
        ? [
            {
              path: `${path}.${discriminator}`,
              label: fieldLabel(key, schema),
              text: choiceTitle(choice),
            },
          ]
        : [];
    return [...head, ...objectLines(path, chosen, value, options, discriminator)];
  }
  if (schema.type === 'object') return objectLines(path, schema, value, options);
  if (schema.type === 'array' && Array.isArray(value)) {
    const noun = typeof schema.itemLabel === 'string' ? schema.itemLabel : 'item';
    const items = asSchema(schema.items);
    return value.flatMap((item, index) => {
      const itemPath = `${path}.${index}`;
      const prefix = `${noun.replace(/^./, (first) => first.toUpperCase())} ${index + 1}`;
      if (items.type === 'object' || items.oneOf || items.anyOf) {
        return linesOf('', itemPath, items, item, options).map((line) => ({
          ...line,
          label: `${prefix}: ${line.label.replace(/^./, (first) => first.toLowerCase())}`,
        }));
      }
      return [{ path: itemPath, label: prefix, text: inputValueText(items, item, options) }];
    });
  }
  return [{ path, label: fieldLabel(key, schema), text: inputValueText(schema, value, options) }];
}

function objectLines(
  path: string,
  schema: JsonSchema,
  value: unknown,
  options: InputTextOptions,
  skip?: string,
): InputLine[] {
  const values = asSchema(value);
  const sectionCurrency = typeof values.currency === 'string' ? values.currency : options.currency;
  const inner = { ...options, ...(sectionCurrency ? { currency: sectionCurrency } : {}) };
  return Object.entries(asSchema(schema.properties)).flatMap(([key, property]) =>
    key === skip || !(key in values)
      ? []
      : linesOf(key, `${path}.${key}`, asSchema(property), values[key], inner),
  );
}
