import { ZERO_CELSIUS_K } from '../constants.js';

export interface AmbientState {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityKgM3: number;
  readonly vapourMoleFraction: number;
  /**
   * The density model the air was computed with: the 1976 standard's dry ideal gas, or
   * CIPM-2007 real moist air. Heated air in the envelope is computed with the same one.
   */
  readonly model: 'ussa1976' | 'cipm2007';
  /** Molar mass of the air [kg/mol]. */
  readonly molarMassKgPerMol: number;
  /** One line saying what air this is, for result context: "15.0 °C, 101.33 kPa, dry air". */
  readonly context: string;
}

/** The result context of the air: "at 15.0 °C, 101.33 kPa, dry air". */
export function describeAir(
  temperatureK: number,
  pressurePa: number,
  humidityText: string,
): string {
  return `at ${(temperatureK - ZERO_CELSIUS_K).toFixed(1)} °C, ${(pressurePa / 1000).toFixed(2)} kPa, ${humidityText}`;
}
