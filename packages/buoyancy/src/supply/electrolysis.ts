import { FARADAY_C_PER_MOL } from '../constants.js';

/**
 * Higher heating value of hydrogen [J/kg]: 141.88 MJ/kg (Hydrogen Analysis Resource Center,
 * DOE/PNNL, "Lower and Higher Heating Values of Hydrogen and Fuels").
 */
export const HYDROGEN_HHV_J_PER_KG = 141.88e6;

/** Lowest voltage across one cell the gas-supply kind accepts, typed or from a stack [V]. */
export const CELL_VOLTAGE_FLOOR_V = 1;

/**
 * Hydrogen produced by water electrolysis, by Faraday's law: two electrons per H₂ molecule, so
 * ṅ = I·N·η_F / (2F) for N cells in series carrying current I at faradaic efficiency η_F.
 * @param currentA stack current [A]
 * @param cellsInSeries number of cells the current passes through in series
 * @param faradaicEfficiency fraction of the charge that makes hydrogen, 0 to 1
 * @returns hydrogen produced [mol/s]
 */
export function hydrogenMolarRateMolPerS(
  currentA: number,
  cellsInSeries: number,
  faradaicEfficiency = 1,
): number {
  return (currentA * cellsInSeries * faradaicEfficiency) / (2 * FARADAY_C_PER_MOL);
}
