import {
  standardHumidAirDensityKgM3,
  vapourMoleFractionOfHumidity,
} from '../atmosphere/humid-air.js';
import { moistAirDensity } from '../atmosphere/moist-air-density.js';
import { standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { GAS_TEMPERATURE_RANGE_K, gasDensity } from '../gas/lifting-gas-density.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import type { GasInput } from '../schema/gas-schema.js';

/**
 * The air around the envelope as SI numbers, exactly as the ambient derivation computes them but
 * without its steps: what a sweep needs at each point.
 */
export interface AirNumbers {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly vapourMoleFraction: number;
  readonly densityKgM3: number;
  /** The 1976 standard's ideal gas, or CIPM-2007 real air (measured air). */
  readonly model: 'ussa1976' | 'cipm2007';
}

/**
 * The ambient air's temperature, pressure, water and density: the 1976 standard at an altitude
 * (with water vapour mixed in as an ideal gas), or measured air by CIPM-2007. Same functions and
 * same refusals as `deriveAmbient`, so the numbers are the lift check's.
 * @throws InputError where the lift check would refuse the air
 */
export function ambientAirNumbers(ambient: AmbientInput): AirNumbers {
  if (ambient.mode === 'standard') {
    const state = standardAtmosphere(ambient.altitudeM, {
      temperatureOffsetK: ambient.temperatureOffsetK,
    });
    const vapourMoleFraction = vapourMoleFractionOfHumidity(
      ambient.humidity,
      state.temperatureK,
      state.pressurePa,
    );
    return {
      temperatureK: state.temperatureK,
      pressurePa: state.pressurePa,
      vapourMoleFraction,
      densityKgM3:
        vapourMoleFraction === 0
          ? state.densityKgM3
          : standardHumidAirDensityKgM3(state.densityKgM3, vapourMoleFraction),
      model: 'ussa1976',
    };
  }
  const { temperatureK, pressurePa } = ambient;
  const vapourMoleFraction = vapourMoleFractionOfHumidity(
    ambient.humidity,
    temperatureK,
    pressurePa,
  );
  return {
    temperatureK,
    pressurePa,
    vapourMoleFraction,
    densityKgM3: moistAirDensity({ temperatureK, pressurePa, vapourMoleFraction }).densityKgM3,
    model: 'cipm2007',
  };
}

/**
 * Density of the gas in the envelope at the air's temperature and pressure plus its superheat and
 * superpressure [kg/m3]: the ideal-gas mixture of `gasDensity`, or for heated air the surrounding
 * air warmed, in the air's own model. Same numbers and refusals as `deriveGas`.
 * @throws InputError where the lift check would refuse the gas
 */
export function gasDensityInAirKgM3(gas: GasInput, air: AirNumbers): number {
  const temperatureK = air.temperatureK + gas.superheatK;
  if (temperatureK < GAS_TEMPERATURE_RANGE_K.min || temperatureK > GAS_TEMPERATURE_RANGE_K.max) {
    throw new InputError(
      'gas.superheatK',
      gas.superheatK,
      `puts the gas at ${temperatureK.toFixed(2)} K; the gas temperature must be between ${GAS_TEMPERATURE_RANGE_K.min} and ${GAS_TEMPERATURE_RANGE_K.max} K`,
    );
  }
  const pressurePa = air.pressurePa + gas.superpressurePa;
  if (!GAS_CATALOGUE[gas.gasId].isHeatedAir) {
    return gasDensity({
      gasId: gas.gasId,
      temperatureK,
      pressurePa,
      purity: gas.purity,
      relativeHumidity: gas.relativeHumidity,
    }).densityKgM3;
  }
  if (air.model === 'ussa1976') {
    // The standard's dry ideal gas of fixed composition: density scales with p/T.
    return air.densityKgM3 * (pressurePa / air.pressurePa) * (air.temperatureK / temperatureK);
  }
  return moistAirDensity({
    temperatureK,
    pressurePa,
    vapourMoleFraction: air.vapourMoleFraction,
  }).densityKgM3;
}
