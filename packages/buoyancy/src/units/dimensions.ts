/** The kinds of quantity a form field can hold, each with its SI unit inside the engine. */
export const DIMENSIONS = {
  length: { si: 'm', mathjs: 'm' },
  area: { si: 'm²', mathjs: 'm^2' },
  volume: { si: 'm³', mathjs: 'm^3' },
  mass: { si: 'kg', mathjs: 'kg' },
  temperature: { si: 'K', mathjs: 'K' },
  temperatureDifference: { si: 'K', mathjs: 'K' },
  pressure: { si: 'Pa', mathjs: 'Pa' },
  pressureDifference: { si: 'Pa', mathjs: 'Pa' },
  density: { si: 'kg/m³', mathjs: 'kg/m^3' },
  arealDensity: { si: 'kg/m²', mathjs: 'kg/m^2' },
  velocity: { si: 'm/s', mathjs: 'm/s' },
  time: { si: 's', mathjs: 's' },
  current: { si: 'A', mathjs: 'A' },
  voltage: { si: 'V', mathjs: 'V' },
  energy: { si: 'J', mathjs: 'J' },
  power: { si: 'W', mathjs: 'W' },
  force: { si: 'N', mathjs: 'N' },
  /** A share of a whole (purity, humidity, efficiency), shown and typed as a percentage. */
  fraction: { si: '', mathjs: '' },
  /** A plain ratio or coefficient (drag coefficient, length over diameter), never a percentage. */
  coefficient: { si: '', mathjs: '' },
  /** A plane angle in degrees (latitude, longitude, a wind's direction): decimals, never a count. */
  angle: { si: '°', mathjs: 'deg' },
} as const;

export type Dimension = keyof typeof DIMENSIONS;
export type UnitSystem = 'si' | 'us';

/**
 * Units results are shown in, per unit system, with the magnitude below which a smaller unit reads
 * better (a 24.6 g envelope, not 0.0246 kg). Units are mathjs names.
 */
export const DISPLAY_UNITS: Record<
  Dimension,
  Record<UnitSystem, readonly { unit: string; below?: number }[]>
> = {
  length: {
    si: [{ unit: 'cm', below: 1 }, { unit: 'm' }],
    us: [{ unit: 'in', below: 0.3048 }, { unit: 'ft' }],
  },
  area: { si: [{ unit: 'm^2' }], us: [{ unit: 'ft^2' }] },
  volume: { si: [{ unit: 'L', below: 1 }, { unit: 'm^3' }], us: [{ unit: 'ft^3' }] },
  mass: {
    si: [{ unit: 'g', below: 1 }, { unit: 'kg' }],
    us: [{ unit: 'oz', below: 0.45359237 }, { unit: 'lb' }],
  },
  temperature: { si: [{ unit: 'degC' }], us: [{ unit: 'degF' }] },
  temperatureDifference: { si: [{ unit: 'K' }], us: [{ unit: 'degR' }] },
  pressure: { si: [{ unit: 'hPa' }], us: [{ unit: 'inHg' }] },
  pressureDifference: {
    si: [{ unit: 'Pa', below: 10000 }, { unit: 'kPa' }],
    us: [{ unit: 'psi' }],
  },
  density: { si: [{ unit: 'kg/m^3' }], us: [{ unit: 'lb/ft^3' }] },
  arealDensity: { si: [{ unit: 'g/m^2' }], us: [{ unit: 'oz/yd^2' }] },
  velocity: { si: [{ unit: 'm/s' }], us: [{ unit: 'ft/min' }] },
  time: {
    si: [{ unit: 's', below: 120 }, { unit: 'min', below: 7200 }, { unit: 'h' }],
    us: [{ unit: 's', below: 120 }, { unit: 'min', below: 7200 }, { unit: 'h' }],
  },
  current: { si: [{ unit: 'A' }], us: [{ unit: 'A' }] },
  voltage: { si: [{ unit: 'V' }], us: [{ unit: 'V' }] },
  energy: {
    si: [{ unit: 'Wh', below: 3.6e6 }, { unit: 'kWh' }],
    us: [{ unit: 'Wh', below: 3.6e6 }, { unit: 'kWh' }],
  },
  power: {
    si: [{ unit: 'W', below: 1000 }, { unit: 'kW' }],
    us: [{ unit: 'W', below: 1000 }, { unit: 'kW' }],
  },
  force: { si: [{ unit: 'N' }], us: [{ unit: 'lbf' }] },
  fraction: { si: [{ unit: '%' }], us: [{ unit: '%' }] },
  coefficient: { si: [{ unit: '' }], us: [{ unit: '' }] },
  angle: { si: [{ unit: 'deg' }], us: [{ unit: 'deg' }] },
};

/**
 * The dimension of a result given in an SI unit symbol ("kg/m³" -> density), so a person can type
 * an answer to it with units. Kelvin and pascal read as a temperature and a pressure; a unit that
 * is no dimension's SI unit (a currency) gives undefined.
 */
export function dimensionOfSIUnit(unit: string): Dimension | undefined {
  if (unit === '') return 'coefficient';
  const found = (Object.keys(DIMENSIONS) as Dimension[]).find(
    (dimension) => DIMENSIONS[dimension].si === unit,
  );
  return found;
}
