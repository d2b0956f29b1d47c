import { CIPM_VALIDITY } from '../atmosphere/moist-air-density.js';
import { type Derivation, v } from '../derivation.js';
import type { AmbientInput } from '../schema/ambient-schema.js';
import { SOURCES } from '../sources.js';
import { type AmbientState, describeAir } from './ambient-state.js';
import { deriveCipmDensity } from './cipm-density-steps.js';
import { deriveVapour } from './vapour-steps.js';

type MeasuredAmbient = Extract<AmbientInput, { mode: 'measured' }>;

/** Measured air: its temperature and pressure as given, its density by CIPM-2007 (real air). */
export function deriveMeasuredAir(d: Derivation, ambient: MeasuredAmbient): AmbientState {
  const temperatureK = d.step({
    id: 'air-temperature',
    label: 'Air temperature (measured)',
    formula: 'T = T_measured',
    values: [],
    result: v('T', ambient.temperatureK, 'K'),
    source: SOURCES.measured,
  });
  const pressurePa = d.step({
    id: 'air-pressure',
    label: 'Air pressure (measured, absolute)',
    formula: 'p = p_measured',
    values: [],
    result: v('p', ambient.pressurePa, 'Pa'),
    source: SOURCES.measured,
  });
  return deriveRealAir(d, ambient.humidity, temperatureK, pressurePa);
}

/** CIPM-2007 density of the moist air, noting where its fit is extrapolated. */
function deriveRealAir(
  d: Derivation,
  humidity: AmbientInput['humidity'],
  temperatureK: number,
  pressurePa: number,
): AmbientState {
  const { vapourMoleFraction, humidityText } = deriveVapour(d, humidity, temperatureK, pressurePa);
  const { densityKgM3, molarMassKgPerMol } = deriveCipmDensity(
    d,
    { temperatureK, pressurePa, vapourMoleFraction },
    {
      kind: 'air',
      compressibilityLabel: 'Compressibility factor of the air',
      densityLabel: 'Density of the surrounding air',
    },
  );
  if (outsideCipmFit(temperatureK, pressurePa)) {
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

function outsideCipmFit(temperatureK: number, pressurePa: number): boolean {
  return (
    pressurePa < CIPM_VALIDITY.pressurePa.min ||
    pressurePa > CIPM_VALIDITY.pressurePa.max ||
    temperatureK < CIPM_VALIDITY.temperatureK.min ||
    temperatureK > CIPM_VALIDITY.temperatureK.max
  );
}
