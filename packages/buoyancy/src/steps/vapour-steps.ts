import {
  vapourMoleFractionFromDewPoint,
  vapourMoleFractionFromRelativeHumidity,
} from '../atmosphere/moist-air-density.js';
import {
  type HumidityInput,
  requireDewPointNotAboveAir,
  requireVapourBelowOne,
} from '../atmosphere/humid-air.js';
import {
  enhancementFactor,
  saturationVapourPressurePa,
} from '../atmosphere/saturation-vapour-pressure.js';
import { ZERO_CELSIUS_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { SOURCES } from '../sources.js';

export interface VapourState {
  readonly vapourMoleFraction: number;
  /** The humidity in words for the air's context: "relative humidity 50 %". */
  readonly humidityText: string;
}

/** The air's water vapour mole fraction from its humidity, with a step for each quantity. */
export function deriveVapour(
  d: Derivation,
  humidity: HumidityInput,
  temperatureK: number,
  pressurePa: number,
): VapourState {
  // 0 % is dry air: no saturation pressure is needed, even where its formula does not reach.
  if (humidity.kind === 'relative' && humidity.relativeHumidity === 0) {
    return { vapourMoleFraction: 0, humidityText: 'relative humidity 0 %' };
  }
  if (humidity.kind === 'dry') return { vapourMoleFraction: 0, humidityText: 'dry air' };
  if (humidity.kind === 'dewPoint') requireDewPointNotAboveAir(humidity.dewPointK, temperatureK);
  const waterTemperatureK = humidity.kind === 'relative' ? temperatureK : humidity.dewPointK;
  const saturationPa = deriveSaturationPressurePa(d, humidity.kind, waterTemperatureK);
  const enhancement = deriveEnhancementFactor(d, pressurePa, waterTemperatureK);
  const vapourMoleFraction =
    humidity.kind === 'relative'
      ? d.step({
          id: 'vapour-mole-fraction',
          label: 'Mole fraction of water vapour in the air',
          formula: 'x_v = h·f·p_sv / p',
          values: [
            v('h', humidity.relativeHumidity, ''),
            v('f', enhancement, ''),
            v('p_sv', saturationPa, 'Pa'),
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
          values: [
            v('f', enhancement, ''),
            v('p_sv', saturationPa, 'Pa'),
            v('p', pressurePa, 'Pa'),
          ],
          result: v(
            'x_v',
            vapourMoleFractionFromDewPoint(humidity.dewPointK, temperatureK, pressurePa),
            '',
          ),
          source: SOURCES.cipm2007,
        });
  requireVapourBelowOne(vapourMoleFraction, humidity);
  const humidityText =
    humidity.kind === 'relative'
      ? `relative humidity ${(humidity.relativeHumidity * 100).toFixed(0)} %`
      : `dew point ${(humidity.dewPointK - ZERO_CELSIUS_K).toFixed(1)} °C`;
  return { vapourMoleFraction, humidityText };
}

/** Saturation vapour pressure of water at the air temperature or the dew point [Pa]. */
function deriveSaturationPressurePa(
  d: Derivation,
  humidityKind: 'relative' | 'dewPoint',
  waterTemperatureK: number,
): number {
  return d.step({
    id: 'saturation-vapour-pressure',
    label:
      humidityKind === 'relative'
        ? 'Saturation vapour pressure at the air temperature'
        : 'Saturation vapour pressure at the dew point',
    formula: 'p_sv = exp(A·T² + B·T + C + D/T)',
    values: [v('T', waterTemperatureK, 'K')],
    result: v('p_sv', saturationVapourPressurePa(waterTemperatureK), 'Pa'),
    source: SOURCES.cipm2007Saturation,
  });
}

/** The CIPM-2007 enhancement factor of water vapour in air at the water's temperature. */
function deriveEnhancementFactor(
  d: Derivation,
  pressurePa: number,
  waterTemperatureK: number,
): number {
  return d.step({
    id: 'enhancement-factor',
    label: 'Enhancement factor of water vapour in air',
    formula: 'f = α + β·p + γ·t²',
    values: [v('p', pressurePa, 'Pa'), v('t', waterTemperatureK - ZERO_CELSIUS_K, '°C')],
    result: v('f', enhancementFactor(pressurePa, waterTemperatureK), ''),
    source: SOURCES.cipm2007,
  });
}
