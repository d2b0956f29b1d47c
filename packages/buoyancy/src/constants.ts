/**
 * Physical constants, grouped by the publication that defines them. Models keep to the constants
 * of their own source: the 1976 atmosphere uses its own gas constant, not the CODATA one, or its
 * published tables would not be reproduced to five digits.
 */

/** U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562), Table 2: universal gas constant [J/(mol K)]. */
export const USSA1976_GAS_CONSTANT_J_PER_MOL_K = 8.31432;

/** U.S. Standard Atmosphere 1976, Table 2: mean molar mass of sea-level dry air [kg/mol]. */
export const USSA1976_AIR_MOLAR_MASS_KG_PER_MOL = 0.0289644;

/** U.S. Standard Atmosphere 1976: sea-level temperature [K]. */
export const USSA1976_SEA_LEVEL_TEMPERATURE_K = 288.15;

/** U.S. Standard Atmosphere 1976: sea-level pressure [Pa]; also the exact "standard atmosphere". */
export const USSA1976_SEA_LEVEL_PRESSURE_PA = 101325;

/** Standard acceleration of gravity [m/s2], exact (3rd CGPM, 1901). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

/** U.S. Standard Atmosphere 1976: effective Earth radius for the geopotential conversion [m]. */
export const USSA1976_EARTH_RADIUS_M = 6356766;

/**
 * Molar gas constant [J/(mol K)], CODATA 2018 (exact since the 2019 SI: N_A k). Used for every
 * ideal-gas density outside the 1976 atmosphere.
 */
export const MOLAR_GAS_CONSTANT_J_PER_MOL_K = 8.314462618;

/** Faraday constant [C/mol], CODATA 2018 (exact since the 2019 SI: N_A e). */
export const FARADAY_C_PER_MOL = 96485.33212;

/** Normal conditions for gas volumes: 0 °C and one standard atmosphere (as in "Nm³"). */
export const NORMAL_TEMPERATURE_K = 273.15;
export const NORMAL_PRESSURE_PA = 101325;

/** Kelvin at 0 °C, exact by the definition of the Celsius scale. */
export const ZERO_CELSIUS_K = 273.15;

/**
 * WGS 84 ellipsoid, NIMA TR8350.2 (3rd ed., 2000), Table 3.1: semi-major axis [m] and inverse
 * flattening (defining parameters).
 */
export const WGS84_SEMI_MAJOR_AXIS_M = 6378137;
export const WGS84_INVERSE_FLATTENING = 298.257223563;
