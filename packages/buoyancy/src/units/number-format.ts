/**
 * How a person writes numbers: the decimal mark and the digit-group separator. The three that
 * Unicode CLDR's locale data shows for most of the world: 1,234.5 (en), 1 234,5 (fr, sv, ISO
 * 80000-1 grouping with a space) and 1.234,5 (de, es, it).
 */
export const NUMBER_FORMATS = {
  'point-comma': { decimal: '.', group: ',', example: '1,234.5' },
  'comma-space': { decimal: ',', group: '\u202f', example: '1 234,5' },
  'comma-point': { decimal: ',', group: '.', example: '1.234,5' },
} as const;

export type NumberFormat = keyof typeof NUMBER_FORMATS;

export const NUMBER_FORMAT_IDS = Object.keys(NUMBER_FORMATS) as NumberFormat[];

export function isNumberFormat(value: unknown): value is NumberFormat {
  return typeof value === 'string' && value in NUMBER_FORMATS;
}

export interface NumberDisplayOptions {
  /** Significant digits kept (default 4). Whole numbers up to that size keep every digit. */
  readonly significantDigits?: number;
  /** Group thousands (default true). Off for text a person will edit, so it reads back alike. */
  readonly grouping?: boolean;
  /** Drop zeros after the decimal mark that add nothing: 1.500 -> 1.5 (default false). */
  readonly trimZeros?: boolean;
  /** A fixed number of decimals instead of significant digits (chart ticks, percentages). */
  readonly decimals?: number;
}

const MINUS = '\u2212';
// Four-digit whole numbers stay ungrouped (BIPM SI Brochure, 9th ed., 5.4.4), which also keeps
// "1500" from reading two ways when a person copies it back into a field.
const GROUP_FROM_DIGITS = 5;

/**
 * A number as a person using `format` writes it: "1,234.5", "1 234,5" or "1.234,5", rounded to
 * significant digits, with a true minus sign. Exports keep plain JavaScript numbers instead.
 */
export function formatNumber(
  value: number,
  format: NumberFormat,
  options: NumberDisplayOptions = {},
): string {
  if (!Number.isFinite(value)) return String(value);
  const digits = options.significantDigits ?? 4;
  const plain =
    options.decimals !== undefined
      ? value.toFixed(Math.max(0, Math.min(options.decimals, 12)))
      : fixedText(value, digits);
  const trimmed =
    options.trimZeros && plain.includes('.') ? plain.replace(/0+$/, '').replace(/\.$/, '') : plain;
  const negative = trimmed.startsWith('-');
  const [whole = '0', fraction] = (negative ? trimmed.slice(1) : trimmed).split('.');
  const { decimal, group } = NUMBER_FORMATS[format];
  const grouped =
    options.grouping === false || whole.length < GROUP_FROM_DIGITS
      ? whole
      : whole.replace(/\B(?=(\d{3})+$)/g, group);
  const text =
    fraction === undefined || fraction === '' ? grouped : `${grouped}${decimal}${fraction}`;
  return negative && /[1-9]/.test(text) ? `${MINUS}${text}` : text;
}

/** Fixed-point text with `significantDigits` significant digits (never exponent notation). */
function fixedText(value: number, significantDigits: number): string {
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, significantDigits - 1 - magnitude);
  return value.toFixed(Math.min(decimals, 12));
}
