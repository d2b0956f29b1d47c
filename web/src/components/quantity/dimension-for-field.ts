import type { Dimension } from '@loftwright/buoyancy';

const BY_UNIT: Record<string, Dimension> = {
  m: 'length',
  'm²': 'area',
  'm³': 'volume',
  kg: 'mass',
  K: 'temperature',
  Pa: 'pressure',
  'kg/m²': 'arealDensity',
  'kg/m³': 'density',
  'm/s': 'velocity',
  s: 'time',
  A: 'current',
  V: 'voltage',
  J: 'energy',
  W: 'power',
  N: 'force',
  '': 'fraction',
};

/**
 * The kind of quantity a schema field holds, from its SI unit. Kelvin and pascal fields whose
 * name says they are differences (an offset, superheat, superpressure) take degree or pressure
 * steps, not absolute values.
 */
export function dimensionForField(fieldName: string, unit: string): Dimension | undefined {
  if (unit === 'K' && /offset|superheat/i.test(fieldName)) return 'temperatureDifference';
  if (unit === 'Pa' && /superpressure|residual|fillPressure/i.test(fieldName))
    return 'pressureDifference';
  return BY_UNIT[unit];
}
