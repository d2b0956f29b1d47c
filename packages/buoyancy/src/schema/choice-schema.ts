import * as z from 'zod';
import { GAS_CATALOGUE, type GasId } from '../gas/gas-catalogue.js';

/**
 * One of a fixed set of string values, each with a title for people. The titles are published as
 * `enumTitles` (value -> title) in the kind's JSON Schema, so forms can show "Helium" rather than
 * `helium`, and a refusal lists the allowed values by title.
 * @param values the allowed values, as stored
 * @param titleOf the title people read for a value
 * @param description what the field is, for the form's label and the docs
 * @param whyOnlyThese why a value people might expect is not among them, added to the refusal
 */
export function choice<const T extends readonly string[]>(
  values: T,
  titleOf: (value: T[number]) => string,
  description?: string,
  whyOnlyThese?: string,
) {
  const enumTitles = Object.fromEntries(values.map((value) => [value, titleOf(value)])) as Record<
    T[number],
    string
  >;
  const allowed =
    values.map((value) => `“${titleOf(value)}” (${value})`).join(', ') +
    (whyOnlyThese ? `. ${whyOnlyThese}` : '');
  return z
    .enum(values, {
      error: (issue) => (issue.input === undefined ? 'is required' : `must be one of: ${allowed}`),
    })
    .meta({ enumTitles, ...(description ? { description } : {}) });
}

/** A gas of the catalogue, titled by its name ("Heated air" for `hot-air`). */
export function gasChoice<const T extends readonly GasId[]>(
  values: T,
  description?: string,
  whyOnlyThese?: string,
) {
  return choice(values, (id) => GAS_CATALOGUE[id as GasId].name, description, whyOnlyThese);
}
