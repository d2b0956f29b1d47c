import type { CompressibilityModel } from './compressibility-model.js';

/**
 * The residual Helmholtz energy of helium-4 from D. O. Ortiz Vega, K. R. Hall, J. C. Holste,
 * A. H. Harvey and E. W. Lemmon, "An Equation of State for the Thermodynamic Properties of
 * Helium", NIST IR 8474 (2023), doi:10.6028/NIST.IR.8474 — the equation of REFPROP 10, valid for
 * the normal fluid up to 1500 K and 2000 MPa. Coefficients as copied in CoolProp's
 * dev/fluids/Helium.json (entry "OrtizVega-NISTIR-2023"); checked in the reference tests against
 * NIST SRD 134's ab initio virial coefficients, an independent source.
 */
const CRITICAL_TEMPERATURE_K = 5.1953;
const REDUCING_DENSITY_MOL_PER_M3 = 17383.7;
/** The gas constant the equation was fitted with [J/(mol·K)]. */
const EOS_GAS_CONSTANT = 8.3144598;

/** Terms n·δ^d·τ^t, times exp(−δ^l) when l > 0. */
const POWER_TERMS: readonly { n: number; d: number; t: number; l: number }[] = [
  { n: 0.015559018, d: 4, t: 1.0, l: 0 },
  { n: 3.0638932, d: 1, t: 0.425, l: 0 },
  { n: -4.2420844, d: 1, t: 0.63, l: 0 },
  { n: 0.054418088, d: 2, t: 0.69, l: 0 },
  { n: -0.18971904, d: 2, t: 1.83, l: 0 },
  { n: 0.087856262, d: 3, t: 0.575, l: 0 },
  { n: 2.2833566, d: 1, t: 0.925, l: 1 },
  { n: -0.53331595, d: 1, t: 1.585, l: 2 },
  { n: -0.53296502, d: 3, t: 1.69, l: 2 },
  { n: 0.99444915, d: 2, t: 1.51, l: 1 },
  { n: -0.30078896, d: 2, t: 2.9, l: 2 },
  { n: -1.6432563, d: 1, t: 0.8, l: 1 },
];

/** Terms n·δ^d·τ^t·exp(−η(δ−ε)² − β(τ−γ)²). */
const GAUSSIAN_TERMS: readonly {
  n: number;
  d: number;
  t: number;
  eta: number;
  epsilon: number;
  beta: number;
  gamma: number;
}[] = [
  { n: 0.8029102, d: 2, t: 1.26, eta: 1.5497, epsilon: 0.596, beta: 0.2471, gamma: 3.15 },
  { n: 0.026838669, d: 1, t: 3.51, eta: 9.245, epsilon: 0.3423, beta: 0.0983, gamma: 2.54505 },
  { n: 0.04687678, d: 2, t: 2.785, eta: 4.76323, epsilon: 0.761, beta: 0.1556, gamma: 1.2513 },
  { n: -0.14832766, d: 1, t: 1.0, eta: 6.3826, epsilon: 0.9747, beta: 2.6782, gamma: 1.9416 },
  { n: 0.03016211, d: 1, t: 4.22, eta: 8.7023, epsilon: 0.5868, beta: 2.7077, gamma: 0.5984 },
  { n: -0.019986041, d: 3, t: 0.83, eta: 0.255, epsilon: 0.5627, beta: 0.6621, gamma: 2.2282 },
  { n: 0.14283514, d: 2, t: 1.575, eta: 0.3523, epsilon: 2.5346, beta: 0.1775, gamma: 1.606 },
  { n: 0.007418269, d: 2, t: 3.447, eta: 0.1492, epsilon: 3.6763, beta: 0.4821, gamma: 3.815 },
  { n: -0.22989793, d: 3, t: 0.73, eta: 0.05, epsilon: 4.5245, beta: 0.3069, gamma: 1.61958 },
  { n: 0.79224829, d: 2, t: 1.634, eta: 0.1668, epsilon: 5.039, beta: 0.1758, gamma: 0.6407 },
  { n: -0.049386338, d: 2, t: 6.13, eta: 42.2358, epsilon: 0.959, beta: 1357.6577, gamma: 1.076 },
];

/** δ·∂αʳ/∂δ, so that Z = 1 + δ·∂αʳ/∂δ at reduced density δ and inverse temperature τ. */
function reducedDensityDerivative(delta: number, tau: number): number {
  let sum = 0;
  for (const { n, d, t, l } of POWER_TERMS) {
    const term = n * delta ** d * tau ** t;
    sum += l === 0 ? term * d : term * Math.exp(-(delta ** l)) * (d - l * delta ** l);
  }
  for (const { n, d, t, eta, epsilon, beta, gamma } of GAUSSIAN_TERMS) {
    const bell = Math.exp(-eta * (delta - epsilon) ** 2 - beta * (tau - gamma) ** 2);
    sum += n * delta ** d * tau ** t * bell * (d - 2 * eta * delta * (delta - epsilon));
  }
  return sum;
}

/** Z at a molar density [mol/m³] and temperature. */
export function heliumCompressibilityAtDensity(
  densityMolPerM3: number,
  temperatureK: number,
): number {
  const delta = densityMolPerM3 / REDUCING_DENSITY_MOL_PER_M3;
  const tau = CRITICAL_TEMPERATURE_K / temperatureK;
  return 1 + reducedDensityDerivative(delta, tau);
}

/**
 * Z at a pressure and temperature: the equation gives pressure from density, so the density is
 * found by successive substitution ρ ← p/(Z(ρ)·R·T) from the ideal gas. Gaseous helium above
 * 200 K has Z rising slowly with density (d ln Z / d ln ρ below 0.4 to 100 MPa), so each pass
 * shrinks the error at least 2.5-fold; 200 passes are a guard, not a budget.
 */
export function heliumCompressibility(pressurePa: number, temperatureK: number): number {
  const idealDensity = pressurePa / (EOS_GAS_CONSTANT * temperatureK);
  let z = 1;
  for (let pass = 0; pass < 200; pass += 1) {
    const next = heliumCompressibilityAtDensity(idealDensity / z, temperatureK);
    if (Math.abs(next - z) <= 1e-14 * next) return next;
    z = next;
  }
  return z;
}

export const HELIUM_COMPRESSIBILITY: CompressibilityModel = {
  compressibility: heliumCompressibility,
  formula: 'Z = 1 + δ·∂αʳ/∂δ (τ = 5.1953 K/T, δ = ρ/17 383.7 mol·m⁻³, solved for ρ at p and T)',
  source:
    'Ortiz Vega, Hall, Holste, Harvey & Lemmon, NIST IR 8474 (2023), helium equation of state (REFPROP 10)',
  // The equation holds to 1500 K and 2000 MPa; the engine uses it where its density iteration is
  // shown to converge and where cylinders are: 200–500 K, up to 100 MPa.
  validity: { minTemperatureK: 200, maxTemperatureK: 500, maxPressurePa: 100e6 },
};
