import { standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import type { EnvelopeGeometry } from '../envelope/envelope-geometry.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { type AmbientState, deriveAmbient } from '../steps/ambient-steps.js';
import { deriveGas } from '../steps/gas-steps.js';
import { deriveGeometry } from '../steps/geometry-steps.js';
import { deriveLift } from '../steps/lift-steps.js';
import { type AscentModel, ascentState } from './ascent-model.js';
import { deriveProfileLaunchAir, type FlightAir } from './flight-air.js';

/** The balloon as launched: the air, its envelope, the gas it holds, and how it will rise. */
export interface Launch {
  readonly air: AmbientState;
  readonly geometry: EnvelopeGeometry;
  readonly gasMol: number;
  readonly model: AscentModel;
  /** Rate of climb at launch [m/s]; 0 when free lift is not positive. */
  readonly ascentRateMS: number;
  /** Whether the air comes from the wind profile rather than the 1976 standard. */
  readonly airFromProfile: boolean;
}

/**
 * The launch in the flight's air (the 1976 standard, or the wind profile's): air and gas at the site, the envelope as filled,
 * the amount of gas (constant in flight), the lift, and the ascent rate at launch; publishes free
 * lift and launch rate, with the free-balloon caution.
 */
export function deriveLaunch(
  d: Derivation,
  inputs: FlightProfileValues,
  flightAir: FlightAir,
): Launch {
  const air =
    flightAir.fromProfile && flightAir.wind
      ? deriveProfileLaunchAir(d, flightAir.wind, inputs.launch.altitudeM)
      : deriveAmbient(d, {
          mode: 'standard',
          altitudeM: inputs.launch.altitudeM,
          temperatureOffsetK: inputs.launch.temperatureOffsetK,
          humidity: { kind: 'dry' },
        });
  const gas = deriveGas(
    d,
    {
      gasId: inputs.gas.gasId,
      purity: inputs.gas.purity,
      superheatK: 0,
      superpressurePa: 0,
      relativeHumidity: 0,
    },
    air,
  );
  const launchShape =
    inputs.envelope.kind === 'extensible'
      ? { shape: 'sphere' as const, diameterM: inputs.envelope.launchDiameterM }
      : inputs.envelope.shape;
  const geometry = deriveGeometry(d, launchShape);
  const gasMol = deriveGasAmountMol(d, air, geometry.volumeM3);
  const lift = deriveLift(
    d,
    geometry.volumeM3,
    air.densityKgM3,
    gas.densityKgM3,
    inputs.envelopeMassKg,
    inputs.payloadMassKg,
  );
  const model: AscentModel = {
    air: flightAir.model,
    gasMol,
    gasMolarMassKgPerMol: gas.molarMassKgPerMol,
    carriedMassKg: inputs.envelopeMassKg + inputs.payloadMassKg,
    envelope:
      inputs.envelope.kind === 'extensible'
        ? { kind: 'extensible', burstDiameterM: inputs.envelope.burstDiameterM }
        : { kind: 'fixed', volumeM3: geometry.volumeM3, frontalAreaM2: geometry.frontalAreaM2 },
    dragCoefficient: inputs.dragCoefficient,
  };
  const ascentRateMS = deriveLaunchAscentRateMS(d, inputs, {
    air,
    geometry,
    model,
    freeLiftKg: lift.freeLiftKg,
  });
  d.output('freeLift', 'Free lift at launch', 'free-lift', air.context);
  d.output('launchAscentRate', 'Ascent rate at launch', 'launch-ascent-rate', air.context);
  d.warn({
    code: 'free-balloon-rules',
    severity: 'caution',
    message:
      'A free balloon is an aircraft in most countries: check the payload against the rules (Balloon rules check) and notify the aviation authority as it requires before launch.',
  });
  return { air, geometry, gasMol, model, ascentRateMS, airFromProfile: flightAir.fromProfile };
}

/** Amount of gas in the envelope at launch, n = p·V / (R·T), constant in flight [mol]. */
function deriveGasAmountMol(d: Derivation, air: AmbientState, volumeM3: number): number {
  return d.step({
    id: 'gas-amount',
    label: 'Amount of gas in the envelope (constant in flight)',
    formula: 'n = p·V / (R·T)',
    values: [
      v('p', air.pressurePa, 'Pa'),
      v('V', volumeM3, 'm³'),
      v('R', MOLAR_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v('T', air.temperatureK, 'K'),
    ],
    result: v(
      'n',
      (air.pressurePa * volumeM3) / (MOLAR_GAS_CONSTANT_J_PER_MOL_K * air.temperatureK),
      'mol',
    ),
    source: 'ideal-gas law',
  });
}

/** Terminal rate of climb at launch, where drag balances the free lift [m/s]. */
function deriveLaunchAscentRateMS(
  d: Derivation,
  inputs: FlightProfileValues,
  launch: Pick<Launch, 'air' | 'geometry' | 'model'> & { freeLiftKg: number },
): number {
  return d.step({
    id: 'launch-ascent-rate',
    label: 'Ascent rate at launch (drag balances free lift)',
    formula: 'w = √(2·L_free·g / (ρ_air·C_d·A))',
    values: [
      v('L_free', launch.freeLiftKg, 'kg'),
      v('g', standardAtmosphere(inputs.launch.altitudeM).gravityMS2, 'm/s²'),
      v('ρ_air', launch.air.densityKgM3, 'kg/m³'),
      v('C_d', inputs.dragCoefficient, ''),
      v('A', launch.geometry.frontalAreaM2, 'm²'),
    ],
    result: v('w', ascentState(launch.model, inputs.launch.altitudeM).ascentRateMS, 'm/s'),
    source: 'terminal velocity: drag ½·ρ·w²·C_d·A equal to the free lift force',
  });
}
