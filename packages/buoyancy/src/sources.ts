/** Citations shown beside derivation steps. */
export const SOURCES = {
  ussa1976: 'U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562)',
  ussa1976Geopotential: 'U.S. Standard Atmosphere, 1976, eq. 18 (geopotential height)',
  ussa1976Temperature: 'U.S. Standard Atmosphere, 1976, eq. 23 and Table 4 (layer temperatures)',
  ussa1976Pressure: 'U.S. Standard Atmosphere, 1976, eqs. 33a/33b (hydrostatic pressure)',
  ussa1976Density: 'U.S. Standard Atmosphere, 1976, eq. 42 (ideal-gas density)',
  ussa1976Gravity: 'U.S. Standard Atmosphere, 1976, eq. 17 (gravity with height)',
  cipm2007:
    'CIPM-2007 air density equation (Picard, Davis, Gläser, Fujii, Metrologia 45 (2008) 149–155)',
  cipm2007Saturation: 'CIPM-2007 / Davis (1992) saturation vapour pressure over water',
  idealGas: 'ideal-gas law, ρ = pM/(RT), R from CODATA 2018',
  mixture: 'molar mass of an ideal-gas mixture (mole-fraction weighted)',
  measured: 'measured value, as entered',
  given: 'input, as entered',
  archimedes: "Archimedes' principle: buoyancy equals the weight of the displaced air",
  liftDefinitions:
    'gross, net and free lift as defined in meteorological balloon practice (WMO-No. 8, Part II)',
  standardGravity: 'standard acceleration of gravity g₀ = 9.806 65 m/s² (3rd CGPM, 1901)',
  sphere: 'sphere: CRC Standard Mathematical Tables',
  spheroid: 'spheroid surface of revolution: CRC Standard Mathematical Tables',
  capsule:
    'cylinder with hemispherical ends: sum of cylinder and sphere (CRC Standard Mathematical Tables)',
  cushion:
    'inflated two-disc cushion: Paulsen, Amer. Math. Monthly 101 (1994) 953; Mladenov & Oprea, Amer. Math. Monthly 110 (2003) 761',
  frontalCircle:
    'projected area along the axis of a body of revolution: the disc of its widest section, π·r² (CRC Standard Mathematical Tables)',
  frontalOutline:
    'projected area across the axis: a rectangle d·(L − d) and two half-discs π·r² (CRC Standard Mathematical Tables)',
  disc: 'area of a disc π·r², twice for the two flat discs: CRC Standard Mathematical Tables',
  normalConditions: 'ideal-gas law between fill conditions and 0 °C, 101.325 kPa',
} as const;
