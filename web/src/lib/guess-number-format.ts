import type { NumberFormat } from '@loftwright/buoyancy';

/** For a locale whose numbers fit none of the three, or that cannot be read. */
const FALLBACK: NumberFormat = 'point-comma';

/**
 * Guesses the number format from a BCP 47 locale (the browser's language by default), from the
 * decimal and group separators `Intl.NumberFormat` uses for it. A decimal comma with a dot group
 * is `comma-point`; with any other group (a space, a no-break space U+00A0, a narrow no-break
 * space U+202F) or none, `comma-space`. A decimal point is `point-comma` whatever the group
 * (de-CH groups with an apostrophe); any other decimal mark, or a locale Intl refuses, falls back
 * to `point-comma`.
 *
 * The sample has seven integer digits: some locales (es-ES, it-IT, pl-PL) leave a four-digit
 * number ungrouped, which would hide a dot group.
 */
export function guessNumberFormat(
  locale: string | undefined = typeof navigator === 'undefined' ? undefined : navigator.language,
): NumberFormat {
  let parts: Intl.NumberFormatPart[];
  try {
    parts = new Intl.NumberFormat(locale).formatToParts(1234567.5);
  } catch {
    return FALLBACK;
  }
  const decimal = parts.find((part) => part.type === 'decimal')?.value;
  const group = parts.find((part) => part.type === 'group')?.value;
  if (decimal === '.') return 'point-comma';
  if (decimal === ',') return group === '.' ? 'comma-point' : 'comma-space';
  return FALLBACK;
}
