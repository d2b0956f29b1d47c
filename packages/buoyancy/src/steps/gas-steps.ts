import {
  CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL,
  WATER_MOLAR_MASS_KG_PER_MOL,
} from '../atmosphere/moist-air-density.js';
import {
  enhancementFactor,
  saturationVapourPressurePa,
} from '../atmosphere/saturation-vapour-pressure.js';
import { MOLAR_GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { GAS_TEMPERATURE_RANGE_K, gasDensity } from '../gas/lifting-gas-density.js';
import type { GasInput } from '../schema/gas-schema.js';
import { SOURCES } from '../sources.js';
import { deriveCipmDensity } from './cipm-density-steps.js';
import type { AmbientState } from './ambient-steps.js';

export interface GasDerivedState {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityKgM3: number;
  readonly molarMassKgPerMol: number;
}

/** Derives the state of the lifting gas inside the envelope, with its steps and cautions. */
export function deriveGas(
  d: Derivation,
  gasInput: GasInput,
  ambient: AmbientState,
): GasDerivedState {
  const gas = GAS_CATALOGUE[gasInput.gasId];
  if (gas.isHeatedAir) return deriveHeatedAir(d, gasInput, ambient);
  const { temperatureK, pressurePa } = gasTemperatureAndPressure(d, gasInput, ambient);
  const state = gasDensity({
    gasId: gas.id,
    temperatureK,
    pressurePa,
    purity: gasInput.purity,
    relativeHumidity: gasInput.relativeHumidity,
  });
  const values = [
    v('x', gasInput.purity, ''),
    v(`M_${gas.formula}`, gas.molarMassKgPerMol, 'kg/mol'),
    v('M_air', CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
  ];
  if (gasInput.relativeHumidity > 0) {
    const psvPa = d.step({
      id: 'gas-saturation-vapour-pressure',
      label: 'Saturation vapour pressure at the gas temperature',
      formula: 'p_sv = exp(A·T_gas² + B·T_gas + C + D/T_gas)',
      values: [v('T_gas', temperatureK, 'K')],
      result: v('p_sv', saturationVapourPressurePa(temperatureK), 'Pa'),
      source: SOURCES.cipm2007Saturation,
    });
    const f = d.step({
      id: 'gas-enhancement-factor',
      label: 'Enhancement factor of water vapour in the gas',
      formula: 'f = α + β·p_gas + γ·t_gas²',
      values: [v('p_gas', pressurePa, 'Pa'), v('t_gas', temperatureK - ZERO_CELSIUS_K, '°C')],
      result: v('f', enhancementFactor(pressurePa, temperatureK), ''),
      source: SOURCES.cipm2007,
    });
    d.step({
      id: 'gas-vapour-mole-fraction',
      label: 'Mole fraction of water vapour in the gas',
      formula: 'x_w = h_gas·f·p_sv / p_gas',
      values: [
        v('h_gas', gasInput.relativeHumidity, ''),
        v('f', f, ''),
        v('p_sv', psvPa, 'Pa'),
        v('p_gas', pressurePa, 'Pa'),
      ],
      result: v('x_w', state.vapourMoleFraction, ''),
      source: `${SOURCES.mixture}; ${SOURCES.cipm2007}`,
    });
    values.push(
      v('x_w', state.vapourMoleFraction, ''),
      v('M_w', WATER_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
    );
  }
  const molarMassKgPerMol = d.step({
    id: 'gas-molar-mass',
    label: `Molar mass of the gas in the envelope (${gas.name.toLowerCase()}${gasInput.purity < 1 ? ' with air' : ''}${gasInput.relativeHumidity > 0 ? ' and water vapour' : ''})`,
    formula:
      gasInput.relativeHumidity > 0
        ? 'M = [x·M_gas + (1 − x)·M_air]·(1 − x_w) + x_w·M_w'
        : 'M = x·M_gas + (1 − x)·M_air',
    values,
    result: v('M', state.molarMassKgPerMol, 'kg/mol'),
    source: `${SOURCES.mixture}; ${gas.molarMassSource}`,
  });
  const densityKgM3 = d.step({
    id: 'gas-density',
    label: 'Density of the gas in the envelope',
    formula: 'ρ_gas = p_gas·M / (R·T_gas)',
    values: [
      v('p_gas', pressurePa, 'Pa'),
      v('M', molarMassKgPerMol, 'kg/mol'),
      v('R', MOLAR_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v('T_gas', temperatureK, 'K'),
    ],
    result: v('ρ_gas', state.densityKgM3, 'kg/m³'),
    source: SOURCES.idealGas,
  });
  warnAboutGas(d, gasInput);
  return { temperatureK, pressurePa, densityKgM3, molarMassKgPerMol };
}

/** The gas's temperature and pressure: the air's, plus superheat and superpressure. */
function gasTemperatureAndPressure(d: Derivation, gasInput: GasInput, ambient: AmbientState) {
  const temperatureK = d.step({
    id: 'gas-temperature',
    label:
      gasInput.superheatK === 0
        ? 'Gas temperature (same as the air)'
        : 'Gas temperature (air plus superheat)',
    formula: 'T_gas = T + ΔT_superheat',
    values: [v('T', ambient.temperatureK, 'K'), v('ΔT_superheat', gasInput.superheatK, 'K')],
    result: v('T_gas', ambient.temperatureK + gasInput.superheatK, 'K'),
    source: SOURCES.given,
  });
  if (temperatureK < GAS_TEMPERATURE_RANGE_K.min || temperatureK > GAS_TEMPERATURE_RANGE_K.max) {
    throw new InputError(
      'gas.superheatK',
      gasInput.superheatK,
      `puts the gas at ${temperatureK.toFixed(2)} K; the gas temperature must be between ${GAS_TEMPERATURE_RANGE_K.min} and ${GAS_TEMPERATURE_RANGE_K.max} K`,
      {
        min: GAS_TEMPERATURE_RANGE_K.min - ambient.temperatureK,
        max: GAS_TEMPERATURE_RANGE_K.max - ambient.temperatureK,
        unit: 'K',
      },
    );
  }
  const pressurePa = d.step({
    id: 'gas-pressure',
    label:
      gasInput.superpressurePa === 0
        ? 'Gas pressure (same as the air)'
        : 'Gas pressure (air plus superpressure)',
    formula: 'p_gas = p + Δp',
    values: [v('p', ambient.pressurePa, 'Pa'), v('Δp', gasInput.superpressurePa, 'Pa')],
    result: v('p_gas', ambient.pressurePa + gasInput.superpressurePa, 'Pa'),
    source: SOURCES.given,
  });
  return { temperatureK, pressurePa };
}

/**
 * Heated air is the surrounding air itself, warmed: the same composition and water content
 * (its mole fraction of vapour does not change on heating, only its relative humidity falls),
 * computed with the same density model as the air outside. With no superheat and no
 * superpressure it is exactly the air outside, and lifts nothing.
 */
function deriveHeatedAir(
  d: Derivation,
  gasInput: GasInput,
  ambient: AmbientState,
): GasDerivedState {
  const { temperatureK, pressurePa } = gasTemperatureAndPressure(d, gasInput, ambient);
  let densityKgM3: number;
  if (ambient.model === 'ussa1976') {
    // The standard's dry ideal gas of fixed composition: density scales with p/T.
    densityKgM3 = d.step({
      id: 'gas-density',
      label: 'Density of the heated air (the surrounding air at the gas temperature)',
      formula: 'ρ_gas = ρ_air·(p_gas / p)·(T / T_gas)',
      values: [
        v('ρ_air', ambient.densityKgM3, 'kg/m³'),
        v('p_gas', pressurePa, 'Pa'),
        v('p', ambient.pressurePa, 'Pa'),
        v('T', ambient.temperatureK, 'K'),
        v('T_gas', temperatureK, 'K'),
      ],
      result: v(
        'ρ_gas',
        ambient.densityKgM3 *
          (pressurePa / ambient.pressurePa) *
          (ambient.temperatureK / temperatureK),
        'kg/m³',
      ),
      source: `${SOURCES.ussa1976Density}; ${SOURCES.idealGas}`,
    });
  } else {
    ({ densityKgM3 } = deriveCipmDensity(
      d,
      { temperatureK, pressurePa, vapourMoleFraction: ambient.vapourMoleFraction },
      {
        kind: 'gas',
        compressibilityLabel: 'Compressibility factor of the heated air',
        densityLabel: 'Density of the heated air (the surrounding air at the gas temperature)',
      },
    ));
  }
  warnAboutGas(d, gasInput);
  return {
    temperatureK,
    pressurePa,
    densityKgM3,
    molarMassKgPerMol: ambient.molarMassKgPerMol,
  };
}

function warnAboutGas(d: Derivation, gasInput: GasInput): void {
  const gas = GAS_CATALOGUE[gasInput.gasId];
  if (gas.hazard.flammable) {
    d.warn({
      code: 'flammable-gas',
      severity: 'caution',
      message: `${gas.name} is flammable. ${gas.hazard.note} Fill in open air or a well-ventilated space, away from ignition sources, and follow your local fire code and the gas supplier's instructions.`,
      field: 'gas.gasId',
    });
  }
  if (gas.hazard.toxic) {
    d.warn({
      code: 'toxic-gas',
      severity: 'caution',
      message: `${gas.name} is toxic. Handle it only with the ventilation and protection its safety data sheet requires.`,
      field: 'gas.gasId',
    });
  }
  if (gas.idealGasCaveat) {
    d.warn({
      code: 'ideal-gas-density-caveat',
      severity: 'note',
      message: gas.idealGasCaveat,
      field: 'gas.gasId',
    });
  }
  if (gas.isHeatedAir && gasInput.superheatK <= 0) {
    d.warn({
      code: 'heated-air-not-heated',
      severity: 'warning',
      message:
        'Heated air lifts only when it is warmer than the surrounding air: enter a superheat above 0 K.',
      field: 'gas.superheatK',
    });
  }
}
