export { ENGINE_VERSION } from './version.js';
export { InputError } from './errors.js';
export {
  AIR_PRESSURE_RANGE_PA,
  AIR_TEMPERATURE_RANGE_K,
  dryAirDensityKgM3,
} from './atmosphere/air-density.js';
export {
  STANDARD_GRAVITY_M_PER_S2,
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
  USSA1976_SEA_LEVEL_PRESSURE_PA,
  USSA1976_SEA_LEVEL_TEMPERATURE_K,
} from './constants.js';
