import type { InputIssue } from '../errors.js';
import type { Dimension, UnitSystem } from '../units/dimensions.js';
import { formatNumber, type NumberFormat } from '../units/number-format.js';
import { formatQuantity } from '../units/quantity-text.js';

type JsonSchema = Record<string, unknown>;

const asSchema = (value: unknown): JsonSchema =>
  value && typeof value === 'object' ? (value as JsonSchema) : {};

const capitalise = (text: string) => text.replace(/^./, (first) => first.toUpperCase());

/** "arealDensityKgM2" -> "Areal density": a key as words, its unit suffix dropped. */
export function humaniseKey(key: string): string {
  return capitalise(
    key
      .replace(/(KgM2|KgM3|M3|M2|Kg|K|Pa|M|S|A|V|J|W|N|MS)$/, '')
      .replace(/([A-Z])/g, ' $1')
      .toLowerCase()
      .trim(),
  );
}

/** The label people see for a field: its schema description, else its key in words. */
export function fieldLabel(key: string, schema: unknown): string {
  const description = asSchema(schema).description;
  return typeof description === 'string' ? capitalise(description) : humaniseKey(key);
}

/** What a form and a message need to know of one input field. */
export interface InputFieldInfo {
  /** "Package 2: mass of the package", "Diameter". */
  readonly label: string;
  /** The quantity it holds, where it holds one ("count" and "money" are not physical). */
  readonly dimension?: Dimension | 'count' | 'money';
}

/**
 * Finds the field at a dotted input path ("envelope.diameterM", "packages.1.massKg") in a kind's
 * JSON Schema, through objects, variants and lists, and gives its label and dimension. A list
 * item is named by the list's item noun and number ("Package 2"), as the form shows it.
 */
export function inputFieldInfo(schema: unknown, path: string): InputFieldInfo | undefined {
  let current = asSchema(schema);
  const labels: string[] = [];
  const keys = path.split('.').filter((key) => key !== '');
  for (const [index, key] of keys.entries()) {
    const last = index === keys.length - 1;
    if (current.type === 'array') {
      const itemNoun = typeof current.itemLabel === 'string' ? current.itemLabel : 'item';
      if (!/^\d+$/.test(key)) return undefined;
      labels.push(`${capitalise(itemNoun)} ${Number(key) + 1}`);
      current = asSchema(current.items);
      continue;
    }
    const property = propertyOf(current, key);
    if (!property) return undefined;
    // Objects (sections) contribute their name only when a field inside a list needs it.
    const section = property.type === 'object' || Boolean(property.oneOf ?? property.anyOf);
    if (last || !section) labels.push(fieldLabel(key, property));
    current = property;
    if (last) break;
  }
  if (labels.length === 0) return undefined;
  const dimension = current.dimension;
  const label =
    labels.length > 1 ? `${labels.at(-2)}: ${lowerFirst(labels.at(-1) ?? '')}` : labels[0];
  return {
    label: label ?? '',
    ...(typeof dimension === 'string'
      ? { dimension: dimension as InputFieldInfo['dimension'] }
      : {}),
  };
}

const lowerFirst = (text: string) => text.replace(/^./, (first) => first.toLowerCase());

/** A property of an object schema, looked for in every variant of a union. */
function propertyOf(schema: JsonSchema, key: string): JsonSchema | undefined {
  const direct = asSchema(schema.properties)[key];
  if (direct) return asSchema(direct);
  const variants = (schema.oneOf ?? schema.anyOf) as unknown[] | undefined;
  for (const variant of variants ?? []) {
    const found = propertyOf(asSchema(variant), key);
    if (found) return found;
  }
  return undefined;
}

export interface ReadableOptions {
  readonly unitSystem: UnitSystem;
  readonly numberFormat: NumberFormat;
}

/**
 * "between −100 °C and 150 °C": a range given in SI, in the unit the field shows and the person's
 * number format, rounded to four significant digits.
 */
export function formatRange(
  minSI: number,
  maxSI: number,
  dimension: Dimension,
  options: ReadableOptions,
): string {
  // One unit for both ends: the one the field shows for the larger end.
  const unit = formatQuantity(maxSI, dimension, options.unitSystem).unitName;
  const end = (valueSI: number) =>
    formatQuantity(valueSI, dimension, options.unitSystem, {
      unit,
      numberFormat: options.numberFormat,
      trimZeros: true,
    }).text;
  return `between ${end(minSI)} and ${end(maxSI)}`;
}

/**
 * An input issue as one sentence a person can read: the field's label, and the reason with any
 * range in the unit the field shows ("Air temperature must be between −100 °C and 150 °C").
 */
export function readableIssue(
  issue: InputIssue,
  field: InputFieldInfo | undefined,
  options: ReadableOptions,
): string {
  const label = field?.label ?? 'This input';
  const dimension = field?.dimension;
  const range = issue.range;
  if (range && range.min !== undefined && range.max !== undefined) {
    const physical = dimension && dimension !== 'count' && dimension !== 'money';
    const plain = (value: number) =>
      formatNumber(value, options.numberFormat, { significantDigits: 6, trimZeros: true });
    const between = physical
      ? formatRange(range.min, range.max, dimension, options)
      : `between ${plain(range.min)} and ${plain(range.max)}`;
    const whole = dimension === 'count' ? 'a whole number ' : '';
    return `${label} must be ${whole}${between}`;
  }
  return `${label} ${issue.reason}`;
}
