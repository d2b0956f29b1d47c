import {
  CIPM_VALIDITY,
  WATER_MOLAR_MASS_KG_PER_MOL,
  vapourMoleFractionFromDewPoint,
  vapourMoleFractionFromRelativeHumidity,
} from '../atmosphere/moist-air-density.js';
import {
  enhancementFactor,
  saturationVapourPressurePa,
} from '../atmosphere/saturation-vapour-pressure.js';
import {
  geopotentialAltitudeM,
  standardAtmosphere,
  standardAtmosphereLayer,
  USSA1976_HYDROSTATIC_CONSTANT_K_PER_M,
} from '../atmosphere/standard-atmosphere.js';
import {
  USSA1976_AIR_MOLAR_MASS_KG_PER_MOL,
  USSA1976_EARTH_RADIUS_M,
  USSA1976_GAS_CONSTANT_J_PER_MOL_K,
  ZERO_CELSIUS_K,
} from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import { SOURCES } from '../sources.js';
import { deriveCipmDensity } from './cipm-density-steps.js';

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

/** Derives the ambient air state, recording a step for each quantity. */
export function deriveAmbient(d: Derivation, ambient: AmbientInput): AmbientState {
  let temperatureK: number;
  let pressurePa: number;
  if (ambient.mode === 'standard') {
    const z = ambient.altitudeM;
    const heightM = d.step({
      id: 'geopotential-height',
      label: 'Geopotential height',
      formula: 'H = r₀·Z / (r₀ + Z)',
      values: [v('r₀', USSA1976_EARTH_RADIUS_M, 'm'), v('Z', z, 'm')],
      result: v('H', geopotentialAltitudeM(z), "m'"),
      source: SOURCES.ussa1976Geopotential,
    });
    const state = standardAtmosphere(z, { temperatureOffsetK: ambient.temperatureOffsetK });
    const layer = standardAtmosphereLayer(heightM);
    const offsetValues =
      ambient.temperatureOffsetK === 0 ? [] : [v('ΔT', ambient.temperatureOffsetK, 'K')];
    temperatureK = d.step({
      id: 'air-temperature',
      label: `Air temperature (1976 standard, layer ${layer.index + 1})`,
      formula:
        ambient.temperatureOffsetK === 0
          ? 'T = T_b + L_b·(H − H_b)'
          : 'T = T_b + L_b·(H − H_b) + ΔT',
      values: [
        v('T_b', layer.baseTemperatureK, 'K'),
        v('L_b', layer.lapseRateKPerM * 1000, "K/km'"),
        v('H_b', layer.baseHeightM, "m'"),
        v('H', heightM, "m'"),
        ...offsetValues,
      ],
      result: v('T', state.temperatureK, 'K'),
      source: SOURCES.ussa1976Temperature,
    });
    pressurePa = d.step({
      id: 'air-pressure',
      label: 'Air pressure (1976 standard)',
      formula:
        layer.lapseRateKPerM === 0
          ? 'p = p_b·exp(−g₀M₀·(H − H_b) / (R*·T_b))'
          : 'p = p_b·[T_b / (T_b + L_b·(H − H_b))]^(g₀M₀ / (R*·L_b))',
      values: [
        v('p_b', layer.basePressurePa, 'Pa'),
        v('T_b', layer.baseTemperatureK, 'K'),
        v('L_b', layer.lapseRateKPerM * 1000, "K/km'"),
        v('g₀M₀/R*', USSA1976_HYDROSTATIC_CONSTANT_K_PER_M * 1000, "K/km'"),
        v('H − H_b', heightM - layer.baseHeightM, "m'"),
      ],
      result: v('p', state.pressurePa, 'Pa'),
      source: SOURCES.ussa1976Pressure,
    });
    // One model in standard mode: the standard's own ideal gas, with water vapour mixed in as an
    // ideal gas when a humidity is given. No humidity and 0 % are then the same air exactly, and
    // dry air reproduces the standard's tables (CIPM-2007 real air is for measured air).
    const { vapourMoleFraction, humidityText } = deriveVapour(d, ambient, temperatureK, pressurePa);
    const dryDensityKgM3 = d.step({
      id: vapourMoleFraction === 0 ? 'air-density' : 'dry-air-density',
      label: 'Density of the surrounding air (dry, 1976 standard)',
      formula: vapourMoleFraction === 0 ? 'ρ_air = p·M₀ / (R*·T)' : 'ρ_dry = p·M₀ / (R*·T)',
      values: [
        v('p', pressurePa, 'Pa'),
        v('M₀', USSA1976_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
        v('R*', USSA1976_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
        v('T', temperatureK, 'K'),
      ],
      result: v(vapourMoleFraction === 0 ? 'ρ_air' : 'ρ_dry', state.densityKgM3, 'kg/m³'),
      source: SOURCES.ussa1976Density,
    });
    const densityKgM3 =
      vapourMoleFraction === 0
        ? dryDensityKgM3
        : d.step({
            id: 'air-density',
            label: 'Density of the surrounding air (1976 standard with water vapour)',
            formula: 'ρ_air = ρ_dry·[1 − x_v·(1 − M_v/M₀)]',
            values: [
              v('ρ_dry', dryDensityKgM3, 'kg/m³'),
              v('x_v', vapourMoleFraction, ''),
              v('M_v', WATER_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
              v('M₀', USSA1976_AIR_MOLAR_MASS_KG_PER_MOL, 'kg/mol'),
            ],
            result: v(
              'ρ_air',
              dryDensityKgM3 *
                (1 -
                  vapourMoleFraction *
                    (1 - WATER_MOLAR_MASS_KG_PER_MOL / USSA1976_AIR_MOLAR_MASS_KG_PER_MOL)),
              'kg/m³',
            ),
            source: `${SOURCES.ussa1976Density}; ${SOURCES.mixture}`,
          });
    return {
      temperatureK,
      pressurePa,
      densityKgM3,
      vapourMoleFraction,
      model: 'ussa1976',
      // Above 80 km the standard's air is lighter than M₀ (Table 8); this is its actual one.
      molarMassKgPerMol:
        (densityKgM3 * USSA1976_GAS_CONSTANT_J_PER_MOL_K * temperatureK) / pressurePa,
      context: describeAir(temperatureK, pressurePa, humidityText),
    };
  } else {
    temperatureK = d.step({
      id: 'air-temperature',
      label: 'Air temperature (measured)',
      formula: 'T = T_measured',
      values: [],
      result: v('T', ambient.temperatureK, 'K'),
      source: SOURCES.measured,
    });
    pressurePa = d.step({
      id: 'air-pressure',
      label: 'Air pressure (measured, absolute)',
      formula: 'p = p_measured',
      values: [],
      result: v('p', ambient.pressurePa, 'Pa'),
      source: SOURCES.measured,
    });
  }
  return deriveRealAir(d, ambient, temperatureK, pressurePa);
}

/** The air's water vapour mole fraction from its humidity, with a step for each quantity. */
function deriveVapour(
  d: Derivation,
  ambient: AmbientInput,
  temperatureK: number,
  pressurePa: number,
): { vapourMoleFraction: number; humidityText: string } {
  const humidity = ambient.humidity;
  let vapourMoleFraction = 0;
  let humidityText = 'dry air';
  // 0 % is dry air: no saturation pressure is needed, even where its formula does not reach.
  if (humidity.kind === 'relative' && humidity.relativeHumidity === 0) {
    return { vapourMoleFraction, humidityText: 'relative humidity 0 %' };
  }
  if (humidity.kind !== 'dry') {
    const waterTemperatureK = humidity.kind === 'relative' ? temperatureK : humidity.dewPointK;
    if (humidity.kind === 'dewPoint' && humidity.dewPointK > temperatureK) {
      throw new InputError(
        'ambient.humidity.dewPointK',
        humidity.dewPointK,
        'must not be above the air temperature',
        {
          max: temperatureK,
          unit: 'K',
        },
      );
    }
    const psvPa = d.step({
      id: 'saturation-vapour-pressure',
      label:
        humidity.kind === 'relative'
          ? 'Saturation vapour pressure at the air temperature'
          : 'Saturation vapour pressure at the dew point',
      formula: 'p_sv = exp(A·T² + B·T + C + D/T)',
      values: [v('T', waterTemperatureK, 'K')],
      result: v('p_sv', saturationVapourPressurePa(waterTemperatureK), 'Pa'),
      source: SOURCES.cipm2007Saturation,
    });
    const f = d.step({
      id: 'enhancement-factor',
      label: 'Enhancement factor of water vapour in air',
      formula: 'f = α + β·p + γ·t²',
      values: [v('p', pressurePa, 'Pa'), v('t', waterTemperatureK - ZERO_CELSIUS_K, '°C')],
      result: v('f', enhancementFactor(pressurePa, waterTemperatureK), ''),
      source: SOURCES.cipm2007,
    });
    vapourMoleFraction =
      humidity.kind === 'relative'
        ? d.step({
            id: 'vapour-mole-fraction',
            label: 'Mole fraction of water vapour in the air',
            formula: 'x_v = h·f·p_sv / p',
            values: [
              v('h', humidity.relativeHumidity, ''),
              v('f', f, ''),
              v('p_sv', psvPa, 'Pa'),
              v('p', pressurePa, 'Pa'),
            ],
            result: v(
              'x_v',
              vapourMoleFractionFromRelativeHumidity(
                humidity.relativeHumidity,
                temperatureK,
                pressurePa,
              ),
              '',
            ),
            source: SOURCES.cipm2007,
          })
        : d.step({
            id: 'vapour-mole-fraction',
            label: 'Mole fraction of water vapour in the air',
            formula: 'x_v = f·p_sv(T_d) / p',
            values: [v('f', f, ''), v('p_sv', psvPa, 'Pa'), v('p', pressurePa, 'Pa')],
            result: v(
              'x_v',
              vapourMoleFractionFromDewPoint(humidity.dewPointK, temperatureK, pressurePa),
              '',
            ),
            source: SOURCES.cipm2007,
          });
    if (vapourMoleFraction >= 1) {
      throw new InputError(
        'ambient.humidity',
        humidity,
        'is more water vapour than air can hold: water boils at this temperature and pressure',
      );
    }
    humidityText =
      humidity.kind === 'relative'
        ? `relative humidity ${(humidity.relativeHumidity * 100).toFixed(0)} %`
        : `dew point ${(humidity.dewPointK - ZERO_CELSIUS_K).toFixed(1)} °C`;
  }
  return { vapourMoleFraction, humidityText };
}

function deriveRealAir(
  d: Derivation,
  ambient: AmbientInput,
  temperatureK: number,
  pressurePa: number,
): AmbientState {
  const { vapourMoleFraction, humidityText } = deriveVapour(d, ambient, temperatureK, pressurePa);
  const { densityKgM3, molarMassKgPerMol } = deriveCipmDensity(
    d,
    { temperatureK, pressurePa, vapourMoleFraction },
    {
      kind: 'air',
      compressibilityLabel: 'Compressibility factor of the air',
      densityLabel: 'Density of the surrounding air',
    },
  );
  const outsideFit =
    pressurePa < CIPM_VALIDITY.pressurePa.min ||
    pressurePa > CIPM_VALIDITY.pressurePa.max ||
    temperatureK < CIPM_VALIDITY.temperatureK.min ||
    temperatureK > CIPM_VALIDITY.temperatureK.max;
  if (outsideFit) {
    d.warn({
      code: 'air-density-formula-extrapolated',
      severity: 'note',
      message:
        'The CIPM-2007 air-density formula is published for 600–1100 hPa and 15–27 °C; here its small real-gas correction (about 0.04 % near sea level, shrinking as pressure falls) is extrapolated.',
      field: 'ambient',
    });
  }
  return {
    temperatureK,
    pressurePa,
    densityKgM3,
    vapourMoleFraction,
    model: 'cipm2007',
    molarMassKgPerMol,
    context: describeAir(temperatureK, pressurePa, humidityText),
  };
}

function describeAir(temperatureK: number, pressurePa: number, humidityText: string): string {
  return `at ${(temperatureK - ZERO_CELSIUS_K).toFixed(1)} °C, ${(pressurePa / 1000).toFixed(2)} kPa, ${humidityText}`;
}
