import type { CalculationWarning } from '../derivation.js';
import type { Dimension } from '../units/dimensions.js';
import { formatNumber } from '../units/number-format.js';
import { formatQuantity } from '../units/quantity-text.js';
import { fieldLabel, inputFieldInfo, type ReadableOptions } from './field-info.js';

type JsonSchema = Record<string, unknown>;

const asSchema = (value: unknown): JsonSchema =>
  value && typeof value === 'object' ? (value as JsonSchema) : {};

/** Code of every plausibility note, so forms can show it beside its field. */
export const CHECK_THIS = 'check-this';

/** How stored notes are written when nobody's preferences apply (the server's record). */
const RECORD_DISPLAY: ReadableOptions = { unitSystem: 'si', numberFormat: 'point-comma' };

/**
 * The variant of a union an object value belongs to: the one whose constant properties
 * (the discriminator, "shape": "sphere") all match the value.
 */
function variantOf(schema: JsonSchema, value: Record<string, unknown>): JsonSchema | undefined {
  const variants = (schema.oneOf ?? schema.anyOf) as unknown[] | undefined;
  if (!variants) return schema;
  for (const candidate of variants.map(asSchema)) {
    const properties = asSchema(candidate.properties);
    const constants = Object.entries(properties).filter(
      ([, property]) => asSchema(property).const !== undefined,
    );
    if (constants.every(([key, property]) => asSchema(property).const === value[key])) {
      return variantOf(candidate, value);
    }
  }
  return undefined;
}

function display(valueSI: number, field: JsonSchema, options: ReadableOptions): string {
  const dimension = field.dimension;
  if (typeof dimension !== 'string' || dimension === 'count' || dimension === 'money') {
    return formatNumber(valueSI, options.numberFormat, { significantDigits: 4, trimZeros: true });
  }
  return formatQuantity(valueSI, dimension as Dimension, options.unitSystem, {
    numberFormat: options.numberFormat,
    significantDigits: 4,
    trimZeros: true,
  }).text;
}

function noteFor(
  root: unknown,
  path: string,
  key: string,
  field: JsonSchema,
  valueSI: number,
  options: ReadableOptions,
): CalculationWarning | undefined {
  const { usualMinimum: min, usualMaximum: max, usualWhy: why } = field;
  const below = typeof min === 'number' && valueSI < min;
  const above = typeof max === 'number' && valueSI > max;
  if (!below && !above) return undefined;
  const limit = display(below ? (min as number) : (max as number), field, options);
  // Inside a list the label names the row too: "Package 2: mass of the package".
  const label = inputFieldInfo(root, path)?.label ?? fieldLabel(key, field);
  return {
    code: CHECK_THIS,
    severity: 'note',
    field: path,
    message:
      `Check this: ${label} is ${display(valueSI, field, options)}, ` +
      `${below ? 'below' : 'above'} the usual ${limit} (${String(why)}). It is kept as typed.`,
  };
}

/**
 * Every value in a kind's inputs that lies inside its allowed range but outside what the trade
 * usually meets, as a "check this" note naming the field by its label, in the reader's units.
 * The inputs are the engine's parsed ones (SI, defaults filled in).
 */
export function plausibilityNotes(
  schema: unknown,
  inputs: unknown,
  options: ReadableOptions = RECORD_DISPLAY,
): CalculationWarning[] {
  const notes: CalculationWarning[] = [];
  const walk = (node: JsonSchema, value: unknown, path: string, key: string) => {
    if (typeof value === 'number') {
      const note = noteFor(schema, path, key, node, value, options);
      if (note) notes.push(note);
      return;
    }
    if (Array.isArray(value)) {
      const items = asSchema(node.items);
      value.forEach((item, index) => walk(items, item, `${path}.${index}`, key));
      return;
    }
    if (value && typeof value === 'object') {
      const object = value as Record<string, unknown>;
      const variant = variantOf(node, object);
      if (!variant) return;
      const properties = asSchema(variant.properties);
      for (const [childKey, child] of Object.entries(object)) {
        const property = properties[childKey];
        if (property) {
          walk(asSchema(property), child, path ? `${path}.${childKey}` : childKey, childKey);
        }
      }
    }
  };
  walk(asSchema(schema), inputs, '', '');
  return notes;
}
