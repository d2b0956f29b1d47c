import type { CompressibilityModel } from './compressibility-model.js';

/**
 * Coefficients of the density equation for normal hydrogen, Table 1 of E. W. Lemmon, M. L. Huber
 * and J. W. Leachman, "Revised Standardized Equation for Hydrogen Gas Densities for Fuel
 * Consumption Applications", J. Res. NIST 113 (2008) 341–350 (doi:10.6028/jres.113.028):
 * Z = 1 + Σ aᵢ·(100 K / T)^bᵢ·(p / 1 MPa)^cᵢ.
 */
const TERMS: readonly { a: number; b: number; c: number }[] = [
  { a: 0.0588846, b: 1.325, c: 1.0 },
  { a: -0.06136111, b: 1.87, c: 1.0 },
  { a: -0.002650473, b: 2.5, c: 2.0 },
  { a: 0.002731125, b: 2.8, c: 2.0 },
  { a: 0.001802374, b: 2.938, c: 2.42 },
  { a: -0.001150707, b: 3.14, c: 2.63 },
  { a: 0.9588528e-4, b: 3.37, c: 3.0 },
  { a: -0.110904e-6, b: 3.75, c: 4.0 },
  { a: 0.1264403e-9, b: 4.0, c: 5.0 },
];

/**
 * Compressibility factor of normal hydrogen gas from the same paper's equation. Its stated
 * accuracy: 0.01 % from 220 K to 1000 K up to 70 MPa, and 0.1 % from 200 K up to 200 MPa against
 * the reference equation of state (Leachman et al. 2009).
 */
export function hydrogenCompressibility(pressurePa: number, temperatureK: number): number {
  const reducedInverseTemperature = 100 / temperatureK;
  const pressureMPa = pressurePa / 1e6;
  let z = 1;
  for (const { a, b, c } of TERMS) {
    z += a * reducedInverseTemperature ** b * pressureMPa ** c;
  }
  return z;
}

export const HYDROGEN_COMPRESSIBILITY: CompressibilityModel = {
  compressibility: hydrogenCompressibility,
  formula: 'Z = 1 + Σ aᵢ·(100 K/T)^bᵢ·(p/1 MPa)^cᵢ',
  source:
    'Lemmon, Huber & Leachman, J. Res. NIST 113 (2008) 341–350, eq. 1 and Table 1 (normal hydrogen)',
  // The paper's range for 0.1 %: 200–1000 K up to 200 MPa; a cylinder's range lies well inside.
  validity: { minTemperatureK: 200, maxTemperatureK: 1000, maxPressurePa: 200e6 },
};
