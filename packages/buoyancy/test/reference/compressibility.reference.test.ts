import { describe, expect, it } from 'vitest';
import {
  CYLINDER_COMPRESSIBILITY,
  heliumCompressibility,
  hydrogenCompressibility,
} from '../../src/index.js';
import { heliumCompressibilityAtDensity } from '../../src/supply/helium-compressibility.js';
import { numberCell, readReferenceTable } from './support/read-csv.js';

// Published compressibility data of the two cylinder gases (see README.md in this folder for each
// row's provenance and tolerance).
const hydrogenRows = readReferenceTable(
  new URL('./data/hydrogen-compressibility.csv', import.meta.url),
);
const heliumRows = readReferenceTable(
  new URL('./data/helium-virial-coefficients.csv', import.meta.url),
);

/** The molar gas constant, exact since the 2019 SI [J/(mol·K)]. */
const R = 8.314462618;

describe('hydrogen compressibility against its paper and NIST REFPROP', () => {
  it('reads every row', () => {
    expect(hydrogenRows).toHaveLength(11);
  });

  it('matches each row within its absolute tolerance in Z', () => {
    let worstError = 0;
    for (const row of hydrogenRows) {
      const temperatureK = numberCell(row, 'temperature_k');
      const pressurePa = numberCell(row, 'pressure_pa');
      const error = Math.abs(
        hydrogenCompressibility(pressurePa, temperatureK) - numberCell(row, 'z'),
      );
      worstError = Math.max(worstError, error);
      expect(error, `${temperatureK} K, ${pressurePa} Pa (${row.source})`).toBeLessThanOrEqual(
        numberCell(row, 'absolute_tolerance'),
      );
    }
    // The REFPROP rows print four decimals; the equation agrees to better than one unit of them.
    expect(worstError).toBeLessThan(1e-4);
  });
});

describe('helium compressibility against NIST SRD 134 ab initio virial coefficients', () => {
  it('reads every row', () => {
    expect(heliumRows).toHaveLength(12);
  });

  it('matches the virial equation Z = 1 + B·ρ + C·ρ² within each row’s tolerance in Z', () => {
    let worstError = 0;
    for (const row of heliumRows) {
      const temperatureK = numberCell(row, 'temperature_k');
      const pressurePa = numberCell(row, 'pressure_pa');
      const expected = virialCompressibility(
        numberCell(row, 'b_cm3_per_mol') * 1e-6,
        numberCell(row, 'c_cm6_per_mol2') * 1e-12,
        pressurePa,
        temperatureK,
      );
      const error = Math.abs(heliumCompressibility(pressurePa, temperatureK) - expected);
      worstError = Math.max(worstError, error);
      expect(error, `${temperatureK} K, ${pressurePa} Pa (${row.source})`).toBeLessThanOrEqual(
        numberCell(row, 'absolute_tolerance'),
      );
    }
    // The equation of state was fitted to measurements; its B sits about 0.3 % above the ab initio
    // value, which is below 1e-4 in Z up to 3 MPa and well inside a cylinder's other uncertainties.
    expect(worstError).toBeLessThan(1e-4);
  });

  it('has found the density when it returns: Z(ρ) at ρ = p/(Z·R·T) gives Z back, at 200 bar', () => {
    // Successive substitution must have converged, not stopped at its guard.
    const pressurePa = 2e7;
    const temperatureK = 288.15;
    const z = heliumCompressibility(pressurePa, temperatureK);
    const density = pressurePa / (z * 8.3144598 * temperatureK);
    expect(Math.abs(heliumCompressibilityAtDensity(density, temperatureK) - z)).toBeLessThan(1e-12);
    expect(z).toBeGreaterThan(1);
  });

  it('states a validity range inside the publication’s (to 1500 K and 2000 MPa)', () => {
    const { validity } = CYLINDER_COMPRESSIBILITY.helium;
    expect(validity.maxTemperatureK).toBeLessThanOrEqual(1500);
    expect(validity.maxPressurePa).toBeLessThanOrEqual(2000e6);
  });
});

/** Z from the virial series truncated after C, solved for the density at p and T. */
function virialCompressibility(
  bM3PerMol: number,
  cM6PerMol2: number,
  pressurePa: number,
  temperatureK: number,
): number {
  let z = 1;
  for (let pass = 0; pass < 100; pass += 1) {
    const density = pressurePa / (z * R * temperatureK);
    z = 1 + bM3PerMol * density + cM6PerMol2 * density ** 2;
  }
  return z;
}
