import type { CalculationResult, DerivationStep } from '../derivation.js';
import { sizingEnvelopeStretches } from '../chain/sizing-stretches.js';
import { ComputationError, InputError } from '../errors.js';
import { GAS_CATALOGUE, type GasId } from '../gas/gas-catalogue.js';
import type { EnvelopeSizingValues } from '../kinds/envelope-sizing.kind.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { evaluate, kindCapabilities, normaliseInputs } from '../kinds/registry.js';

/**
 * What a fill card needs from a saved calculation: the day's air and gas exactly as the version
 * computed them, the masses the balloon carries, and the version's own free lift and envelope.
 */
export interface FillBasis {
  readonly kindId: string;
  readonly gasId: GasId;
  readonly airTemperatureK: number;
  readonly airPressurePa: number;
  readonly airDensityKgM3: number;
  readonly gasTemperatureK: number;
  readonly gasPressurePa: number;
  readonly gasDensityKgM3: number;
  /** Mole fraction of water vapour in the envelope's gas (0 when dry). */
  readonly gasVapourMoleFraction: number;
  readonly envelopeMassKg: number;
  readonly payloadMassKg: number;
  /** The version's free lift [kg] (sizing: its target or the one its ascent rate needs). */
  readonly versionFreeLiftKg: number;
  /** The envelope's volume in the version [m³]. */
  readonly envelopeVolumeM3: number;
  /** Whether the envelope stretches (latex-like): it can take more gas than its planned volume. */
  readonly stretches: boolean;
}

type KindPart = Pick<
  FillBasis,
  'envelopeMassKg' | 'payloadMassKg' | 'versionFreeLiftKg' | 'envelopeVolumeM3' | 'stretches'
>;

/** How each kind with a fill card names the masses and the envelope in its inputs and results. */
const KIND_PARTS: Record<string, (inputs: unknown, result: CalculationResult) => KindPart> = {
  'envelope-sizing': (raw, result) => {
    const inputs = raw as EnvelopeSizingValues;
    return {
      envelopeMassKg: sizingOutput(result, 'envelopeMass'),
      payloadMassKg: inputs.payloadMassKg,
      versionFreeLiftKg: sizingOutput(result, 'freeLift'),
      envelopeVolumeM3: sizingOutput(result, 'volume'),
      // The design chain's rule: a sphere given by its mass is a stretching (latex) envelope.
      stretches: sizingEnvelopeStretches(inputs, sizingOutput(result, 'size')),
    };
  },
  'flight-profile': (raw, result) => {
    const inputs = raw as FlightProfileValues;
    return {
      envelopeMassKg: inputs.envelopeMassKg,
      payloadMassKg: inputs.payloadMassKg,
      versionFreeLiftKg: stepOf(result, 'free-lift').result.value,
      envelopeVolumeM3: stepOf(result, 'volume').result.value,
      stretches: inputs.envelope.kind === 'extensible',
    };
  },
};

/** A sizing that found no size has no envelope to fill: said on the version, not computed on. */
function sizingOutput(result: CalculationResult, name: string): number {
  const output = result.outputs[name];
  if (!output) {
    throw new InputError(
      'version',
      name,
      'has no envelope to fill: the sizing found no size that works (see its warnings)',
    );
  }
  return output.value;
}

function stepOf(result: CalculationResult, id: string): DerivationStep {
  const step = result.steps.find((candidate) => candidate.id === id);
  if (!step) throw new ComputationError(`The version's derivation has no "${id}" step`);
  return step;
}

function valueIn(step: DerivationStep, symbol: string): number {
  const value = step.values.find((candidate) => candidate.symbol === symbol);
  if (!value) throw new ComputationError(`Step "${step.id}" has no value "${symbol}"`);
  return value.value;
}

/**
 * Reads a fill basis from a kind's inputs by evaluating them with the engine, as the version was.
 * @throws InputError on field `kind` for a kind without a fill card, `gas` for heated air, or
 *   any field of the inputs the kind refuses
 */
export function fillBasis(kindId: string, inputs: unknown): FillBasis {
  const part = KIND_PARTS[kindId];
  if (!part || !kindCapabilities(kindId).fillCard) {
    throw new InputError(
      'kind',
      kindId,
      'has no fill card: only sizing and flight calculations do',
    );
  }
  const values = normaliseInputs(kindId, inputs) as { gas: { gasId: GasId } };
  const gas = GAS_CATALOGUE[values.gas.gasId];
  if (gas.isHeatedAir) {
    throw new InputError(
      'gas.gasId',
      gas.id,
      'has no fill card: heated air lifts by the burner, not by a gas filled and weighed off',
    );
  }
  const result = evaluate(kindId, values);
  // The kind's part first: a sizing with no size stops there, naming the version.
  const kindPart = part(values, result);
  const gasTemperature = stepOf(result, 'gas-temperature');
  const gasPressure = stepOf(result, 'gas-pressure');
  const vapour = result.steps.find((step) => step.id === 'gas-vapour-mole-fraction');
  return {
    kindId,
    gasId: gas.id,
    airTemperatureK: valueIn(gasTemperature, 'T'),
    airPressurePa: valueIn(gasPressure, 'p'),
    airDensityKgM3: valueIn(stepOf(result, 'displaced-air-mass'), 'ρ_air'),
    gasTemperatureK: gasTemperature.result.value,
    gasPressurePa: gasPressure.result.value,
    gasDensityKgM3: stepOf(result, 'gas-density').result.value,
    gasVapourMoleFraction: vapour?.result.value ?? 0,
    ...kindPart,
  };
}
