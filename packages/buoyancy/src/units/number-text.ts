import { formatNumber, NUMBER_FORMATS, type NumberFormat } from './number-format.js';

/** A number read from the start of a person's text, and what follows it (a unit, a currency). */
export type NumberReading =
  | { readonly ok: true; readonly value: number; readonly rest: string }
  | { readonly ok: false; readonly reason: string };

// Spaces people and programs put between digit groups: space, no-break, narrow no-break, thin.
const SPACE = '[ \\u00a0\\u202f\\u2009]';
const SIGN = '[+\\-\\u2212\\u2013]';
/**
 * Digits with marks between them: a mark counts only when a digit follows it, and a space only
 * when exactly three digits follow (so "158 cm" stops before the unit, "1 500 m" does not).
 */
const BODY = `(?:\\d|[.,](?=\\d)|${SPACE}(?=\\d{3}(?!\\d)))+`;
const EXPONENT = '[eE][+\\-\\u2212]?\\d+';
const LEADING_NUMBER = new RegExp(`^(${SIGN})?(${BODY})(${EXPONENT}(?![A-Za-z]))?`);

/** Trims every kind of space, including the no-break ones a copied number brings along. */
export function trimSpaces(text: string): string {
  return text.replace(/^[\s\u00a0\u202f\u2009]+|[\s\u00a0\u202f\u2009]+$/g, '');
}

/**
 * The one reading rule for a number a person types, under their number format:
 * - the format's decimal mark and group separators (the other mark, or any space, in groups of
 *   three) read as the format says: "1,234.5" / "1 234,5" / "1.234,5";
 * - the other decimal mark is accepted where it cannot be a group separator ("0,25" in 1,234.5
 *   format is 0.25, "1.5" in 1 234,5 format is 1.5), because people type it out of habit;
 * - a text that reads both ways ("1,500": 1.5 or 1500) is refused with both readings, never
 *   guessed;
 * - signs (+, -, the true minus −), exponents (1.5e3) and a unit after the number, with or
 *   without a space, are allowed.
 */
export function readLeadingNumber(text: string, format: NumberFormat): NumberReading {
  const trimmed = trimSpaces(text);
  if (trimmed === '') return { ok: false, reason: 'is empty' };
  const match = LEADING_NUMBER.exec(trimmed);
  if (!match) return { ok: false, reason: `does not start with a number (${examples(format)})` };
  const [whole, sign = '', body = '', exponent = ''] = match;
  const readings = bodyReadings(body, format);
  if (readings.length === 0) return { ok: false, reason: unreadableReason(body, format) };
  const values = readings.map((reading) => toNumber(sign, reading, exponent));
  const [first, second] = values;
  if (first === undefined) return { ok: false, reason: unreadableReason(body, format) };
  if (second !== undefined && second !== first) {
    const [low, high] = [first, second]
      .sort((a, b) => Math.abs(a) - Math.abs(b))
      .map((value) => exact(value, format));
    return { ok: false, reason: `could be ${low} or ${high}: type ${low} or ${high}` };
  }
  if (!Number.isFinite(first)) return { ok: false, reason: 'is too large a number' };
  return { ok: true, value: first, rest: trimSpaces(trimmed.slice(whole.length)) };
}

/**
 * Reads a whole text that must be a number and nothing else (a count, a price without its
 * currency, a plain coefficient).
 */
export function readNumber(text: string, format: NumberFormat): NumberReading {
  const reading = readLeadingNumber(text, format);
  if (!reading.ok) return reading;
  if (reading.rest !== '')
    return { ok: false, reason: `has “${reading.rest}” after the number: type a number only` };
  return reading;
}

/**
 * The body's readings as canonical text ("1234.5"): the one under the format's own marks, and
 * the one with the other decimal mark, when each is well formed. Duplicates removed.
 */
function bodyReadings(body: string, format: NumberFormat): string[] {
  const { decimal } = NUMBER_FORMATS[format];
  const other = decimal === '.' ? ',' : '.';
  const readings = [ownReading(body, decimal, other), otherMarkReading(body, other)].filter(
    (reading): reading is string => reading !== undefined,
  );
  return [...new Set(readings)];
}

/** The format's decimal mark as decimal; the other mark or a space as a group separator. */
function ownReading(body: string, decimal: string, groupMark: string): string | undefined {
  const parts = body.split(decimal);
  if (parts.length > 2) return undefined;
  const [whole = '', fraction] = parts;
  if (fraction !== undefined && !/^\d+$/.test(fraction)) return undefined;
  const wholeDigits = groupedWhole(whole, groupMark);
  if (wholeDigits === undefined) return undefined;
  if (wholeDigits === '' && fraction === undefined) return undefined;
  return fraction === undefined ? wholeDigits : `${wholeDigits || '0'}.${fraction}`;
}

/** Digits of a whole part, with one kind of separator in well-formed groups of three. */
function groupedWhole(whole: string, groupMark: string): string | undefined {
  if (/^\d*$/.test(whole)) return whole;
  const separators = new Set(whole.replace(/\d/g, ''));
  if (separators.size !== 1) return undefined;
  const [separator = ''] = [...separators];
  if (separator !== groupMark && !/\s/.test(separator)) return undefined;
  const groups = whole.split(separator);
  // The first group has 1 to 3 digits and no leading zero: "0,500" is no grouping.
  const [head = '', ...tail] = groups;
  if (!/^[1-9]\d{0,2}$/.test(head) || !tail.every((group) => /^\d{3}$/.test(group)))
    return undefined;
  return groups.join('');
}

/** The other decimal mark, alone in the number, as the decimal mark ("0,25" typed as 0.25). */
function otherMarkReading(body: string, other: string): string | undefined {
  const parts = body.split(other);
  if (parts.length !== 2 || !parts.every((part) => /^\d*$/.test(part))) return undefined;
  const [whole = '', fraction = ''] = parts;
  if (fraction === '') return undefined;
  return `${whole || '0'}.${fraction}`;
}

function toNumber(sign: string, canonical: string, exponent: string): number {
  const negative = sign !== '' && sign !== '+';
  return Number(`${negative ? '-' : ''}${canonical}${exponent.replace('\u2212', '-')}`);
}

/** A value as the person's format writes it, every digit kept and no grouping: one reading. */
function exact(value: number, format: NumberFormat): string {
  return formatNumber(value, format, { significantDigits: 15, trimZeros: true, grouping: false });
}

function examples(format: NumberFormat): string {
  const { decimal } = NUMBER_FORMATS[format];
  return `for example 12${decimal}5 or ${NUMBER_FORMATS[format].example}`;
}

/** Why a body of digits and marks does not read, with the reading the other convention gives. */
function unreadableReason(body: string, format: NumberFormat): string {
  const otherFormat: NumberFormat = format === 'point-comma' ? 'comma-point' : 'point-comma';
  const otherReading = ownReading(
    body,
    NUMBER_FORMATS[otherFormat].decimal,
    NUMBER_FORMATS[otherFormat].group,
  );
  const yours = NUMBER_FORMATS[format].example;
  if (otherReading !== undefined) {
    const meant = exact(Number(otherReading), format);
    return `does not read in your number format (${yours}); if you meant ${meant}, type ${meant}`;
  }
  return `is not a number as your format writes them (${examples(format)})`;
}
