/** A number in a derivation: six significant figures, exponent form when very large or small. */
export function stepNumber(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  return magnitude >= 1e6 || magnitude < 1e-3
    ? value.toExponential(4)
    : Number(value.toPrecision(6)).toString();
}
