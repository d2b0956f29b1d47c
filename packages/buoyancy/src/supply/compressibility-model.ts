/**
 * A published real-gas model of one gas: its compressibility factor Z = p/(ρ_n·R·T) as a function
 * of absolute pressure and temperature, the formula and source printed in a derivation step, and
 * the range the publication vouches for (the engine refuses to go outside it).
 */
export interface CompressibilityModel {
  compressibility(pressurePa: number, temperatureK: number): number;
  readonly formula: string;
  readonly source: string;
  readonly validity: {
    readonly minTemperatureK: number;
    readonly maxTemperatureK: number;
    readonly maxPressurePa: number;
  };
}
