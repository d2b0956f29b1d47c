import type { NumberFormat } from '@loftwright/buoyancy';

/** Each format shown as the number it writes; a no-break space keeps 1 234,5 on one line. */
export const NUMBER_FORMAT_OPTIONS: { label: string; value: NumberFormat }[] = [
  { label: '1,234.5', value: 'point-comma' },
  { label: '1\u00a0234,5', value: 'comma-space' },
  { label: '1.234,5', value: 'comma-point' },
];
