import { STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M } from '../atmosphere/standard-atmosphere.js';
import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { findRoot } from '../numerics/find-root.js';
import { ascentState } from './ascent-model.js';
import type { Launch } from './launch-steps.js';

/** Top of the atmosphere model, where a search for burst or float gives up [m]. */
const CEILING_M = STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max;

/**
 * Where the ascent ends: the burst altitude of a stretching envelope or the float altitude of a
 * fixed one [m]; infinite, with a warning, when that lies above the atmosphere model.
 */
export function deriveStopAltitudeM(
  d: Derivation,
  inputs: FlightProfileValues,
  launch: Launch,
): number {
  return launch.model.envelope.kind === 'extensible'
    ? deriveBurstAltitudeM(d, inputs, launch, launch.model.envelope.burstDiameterM)
    : deriveFloatAltitudeM(d, inputs, launch);
}

/** Altitude at which the gas, at the air's temperature and pressure, fills the burst volume. */
function deriveBurstAltitudeM(
  d: Derivation,
  inputs: FlightProfileValues,
  launch: Launch,
  burstDiameterM: number,
): number {
  if (
    burstDiameterM <= (inputs.envelope.kind === 'extensible' ? inputs.envelope.launchDiameterM : 0)
  ) {
    throw new InputError(
      'envelope.burstDiameterM',
      burstDiameterM,
      'must be larger than the launch diameter',
    );
  }
  const burstVolumeM3 = d.step({
    id: 'burst-volume',
    label: 'Volume at burst',
    formula: 'V_b = π·d_b³ / 6',
    values: [v('d_b', burstDiameterM, 'm')],
    result: v('V_b', (Math.PI * burstDiameterM ** 3) / 6, 'm³'),
    source: 'sphere',
  });
  const volumeAt = (altitudeM: number) =>
    ascentState(launch.model, altitudeM).volumeM3 - burstVolumeM3;
  const burstAltitudeM =
    volumeAt(CEILING_M) < 0
      ? Number.POSITIVE_INFINITY
      : findRoot(volumeAt, inputs.launch.altitudeM, CEILING_M, { xTolerance: 1e-6 });
  if (!Number.isFinite(burstAltitudeM)) {
    d.warn({
      code: 'no-burst-below-ceiling',
      severity: 'warning',
      message: `The envelope would still be smaller than its burst diameter at ${CEILING_M / 1000} km, the top of the atmosphere model.`,
      field: 'envelope.burstDiameterM',
    });
    return burstAltitudeM;
  }
  d.step({
    id: 'burst-altitude',
    label: 'Burst altitude (the gas has expanded to the burst volume)',
    formula: 'n·R·T(z) / p(z) = V_b',
    values: [v('n', launch.gasMol, 'mol'), v('V_b', burstVolumeM3, 'm³')],
    result: v('z_b', burstAltitudeM, 'm'),
    source: launch.airFromProfile
      ? 'ideal gas at ambient temperature and pressure of the wind profile’s air (zero pressure difference across the envelope)'
      : 'ideal gas at ambient temperature and pressure in the U.S. Standard Atmosphere 1976 (zero pressure difference across the envelope)',
  });
  d.output('burstAltitude', 'Burst altitude', 'burst-altitude');
  return burstAltitudeM;
}

/** Altitude of neutral buoyancy of a fixed-volume envelope, and its superpressure there. */
function deriveFloatAltitudeM(d: Derivation, inputs: FlightProfileValues, launch: Launch): number {
  const { model, gasMol, geometry } = launch;
  const totalMassKg = model.carriedMassKg + gasMol * model.gasMolarMassKgPerMol;
  const floatDensity = d.step({
    id: 'float-density',
    label: 'Air density at which the balloon floats',
    formula: 'ρ_f = (m_gas + m_env + m_payload) / V',
    values: [
      v('m_gas', gasMol * model.gasMolarMassKgPerMol, 'kg'),
      v('m_env', inputs.envelopeMassKg, 'kg'),
      v('m_payload', inputs.payloadMassKg, 'kg'),
      v('V', geometry.volumeM3, 'm³'),
    ],
    result: v('ρ_f', totalMassKg / geometry.volumeM3, 'kg/m³'),
    source: "Archimedes' principle at neutral buoyancy",
  });
  const densityAt = (altitudeM: number) => model.air(altitudeM).densityKgM3 - floatDensity;
  const floatAltitudeM =
    densityAt(CEILING_M) > 0
      ? Number.POSITIVE_INFINITY
      : findRoot(densityAt, inputs.launch.altitudeM, CEILING_M, { xTolerance: 1e-6 });
  if (!Number.isFinite(floatAltitudeM)) {
    d.warn({
      code: 'no-float-below-ceiling',
      severity: 'warning',
      message: `The balloon would still be rising at ${CEILING_M / 1000} km, the top of the atmosphere model.`,
    });
    return floatAltitudeM;
  }
  const floatAir = model.air(floatAltitudeM);
  d.step({
    id: 'float-altitude',
    label: 'Float altitude (neutral buoyancy)',
    formula: 'ρ_air(z_f) = ρ_f',
    values: [v('ρ_f', floatDensity, 'kg/m³')],
    result: v('z_f', floatAltitudeM, 'm'),
    source: launch.airFromProfile
      ? 'density of the wind profile’s air (1976 standard above and below it)'
      : 'U.S. Standard Atmosphere, 1976, density profile',
  });
  d.step({
    id: 'float-superpressure',
    label: 'Superpressure at float (gas above the air)',
    formula: 'Δp = n·R·T_f / V − p_f',
    values: [
      v('n', gasMol, 'mol'),
      v('T_f', floatAir.temperatureK, 'K'),
      v('V', geometry.volumeM3, 'm³'),
      v('p_f', floatAir.pressurePa, 'Pa'),
    ],
    result: v(
      'Δp',
      (gasMol * MOLAR_GAS_CONSTANT_J_PER_MOL_K * floatAir.temperatureK) / geometry.volumeM3 -
        floatAir.pressurePa,
      'Pa',
    ),
    source: 'ideal-gas law, gas at the air temperature',
  });
  d.output('floatAltitude', 'Float altitude', 'float-altitude');
  d.output('floatSuperpressure', 'Superpressure at float', 'float-superpressure');
  return floatAltitudeM;
}
