import { formatNumber, type NumberFormat } from '@loftwright/buoyancy';

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
};

/**
 * A number in a derivation, in the reader's number format: six significant figures, and powers
 * of ten written as people write them (1.2346 × 10⁶) when very large or small.
 */
export function stepNumber(value: number, numberFormat: NumberFormat = 'point-comma'): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-3) {
    const [mantissa = '0', exponent = '0'] = value.toExponential(4).split('e');
    const power = [...exponent.replace('+', '')].map((digit) => SUPERSCRIPT[digit]).join('');
    return `${formatNumber(Number(mantissa), numberFormat, { significantDigits: 5 })} × 10${power}`;
  }
  return formatNumber(Number(value.toPrecision(6)), numberFormat, {
    significantDigits: 6,
    trimZeros: true,
  });
}
