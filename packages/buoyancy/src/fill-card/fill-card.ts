import {
  MOLAR_GAS_CONSTANT_J_PER_MOL_K,
  NORMAL_PRESSURE_PA,
  NORMAL_TEMPERATURE_K,
} from '../constants.js';
import { Derivation, type DerivationStep, type Quantity, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { SOURCES } from '../sources.js';
import { type FillBasis, fillBasis } from './fill-basis.js';
import { type FillCardCaution, fillCardCautions } from './fill-card-cautions.js';
import { deriveFillCylinders, type FillCardCylinders } from './fill-card-cylinders.js';
import { checkFillCardOptions, type FillCardOptions } from './fill-card-options.js';

/** Normal conditions of the card's normal volume, with the standard that defines them. */
export const FILL_CARD_NORMAL_CONDITIONS = {
  temperatureK: NORMAL_TEMPERATURE_K,
  pressurePa: NORMAL_PRESSURE_PA,
  definition:
    'normal conditions (Normzustand) of DIN 1343:1990, Referenzzustand, Normzustand, Normvolumen: 273.15 K (0 °C) and 101 325 Pa',
} as const;

/** Where "neck lift" comes from: the meteorological filling practice, in the product's words. */
export const NECK_LIFT_SOURCE =
  'meteorological balloon filling practice: neck lift is measured with the filling weight and equals free lift + payload (gross lift = displaced air − gas; free lift = gross lift − balloon − payload)';

/** Everything printed on the crew's fill card, each number with its unit. */
export interface FillCard {
  readonly kindId: string;
  readonly gas: { readonly id: string; readonly name: string; readonly formula: string };
  readonly day: {
    readonly airTemperature: Quantity;
    readonly airPressure: Quantity;
    readonly airDensity: Quantity;
    readonly gasTemperature: Quantity;
    readonly gasPressure: Quantity;
    readonly gasDensity: Quantity;
  };
  /** The gas to fill, at the day's conditions. */
  readonly gasVolume: Quantity;
  readonly gasVolumeNormal: Quantity;
  readonly normalConditions: typeof FILL_CARD_NORMAL_CONDITIONS;
  readonly gasMass: Quantity;
  readonly gasAmount: Quantity;
  readonly freeLift: Quantity & { readonly from: 'version' | 'typed' };
  readonly payloadMass: Quantity;
  readonly envelopeMass: Quantity;
  readonly neckLift: Quantity;
  readonly fillerMass: Quantity;
  /** The weight to hang on the filler so the balloon just balances at the neck lift. */
  readonly fillerWeight: Quantity;
  readonly stopCriterion: string;
  readonly cylinders?: FillCardCylinders;
  readonly cautions: readonly FillCardCaution[];
  readonly notes: readonly string[];
  readonly steps: readonly DerivationStep[];
}

const kg = (value: number) => `${value.toFixed(3)} kg`;

/**
 * The stop criterion in words, with the masses as the reader shows them (the card's SI text, or
 * the web page's units), so every card says it the same way.
 */
export function fillCardStopText(masses: {
  weight: string;
  filler: string;
  neckLift: string;
}): string {
  return `Hang ${masses.weight} on the filler (${masses.filler}), together ${masses.neckLift}. Fill until the balloon just lifts the filler and weight: it balances, neither sinking nor rising. Then stop and close the neck.`;
}

/**
 * The fill card of a saved sizing or flight calculation: the gas that gives the target free lift
 * at the version's air (and at DIN 1343 normal conditions), the neck lift and the weight to hang
 * on the filler, the stop criterion, what the fill takes from the team's cylinders (real gas),
 * and the gas's cautions; with the derivation of every number.
 * @param kindId a kind whose capabilities include `fillCard`
 * @param inputs the version's inputs
 * @param options what the crew types: filler mass [kg], target free lift [kg] (default: the
 *   version's), cylinders (water volume m³, gauge fill pressure Pa, temperature K, count)
 * @throws InputError naming the field: `kind` without a fill card, `fillerMassKg`, `freeLiftKg`,
 *   `cylinder.*`, or any input of the version the kind refuses
 */
export function fillCard(kindId: string, inputs: unknown, options: FillCardOptions): FillCard {
  const basis = fillBasis(kindId, inputs);
  const checked = checkFillCardOptions(options);
  const d = new Derivation();
  const freeLiftKg = checked.freeLiftKg ?? basis.versionFreeLiftKg;
  if (freeLiftKg <= 0) {
    throw new InputError(
      'freeLiftKg',
      freeLiftKg,
      checked.freeLiftKg === undefined
        ? "is required: the version's own free lift is not positive"
        : 'must be more than 0 kg, or the balloon does not rise',
      { min: 0, unit: 'kg' },
    );
  }
  const gas = deriveFillGas(d, basis, freeLiftKg, checked.freeLiftKg !== undefined);
  const neckLiftKg = d.step({
    id: 'neck-lift',
    label: 'Neck lift (measured with the filling weight)',
    formula: 'L_neck = L_free + m_payload',
    values: [v('L_free', freeLiftKg, 'kg'), v('m_payload', basis.payloadMassKg, 'kg')],
    result: v('L_neck', freeLiftKg + basis.payloadMassKg, 'kg'),
    source: NECK_LIFT_SOURCE,
  });
  if (checked.fillerMassKg > neckLiftKg) {
    throw new InputError(
      'fillerMassKg',
      checked.fillerMassKg,
      `is more than the neck lift (${kg(neckLiftKg)}): the filler alone would hold the balloon down; use a lighter filler`,
      { min: 0, max: neckLiftKg, unit: 'kg' },
    );
  }
  const fillerWeightKg = d.step({
    id: 'filler-weight',
    label: 'Weight to hang on the filler',
    formula: 'm_weight = L_neck − m_filler',
    values: [v('L_neck', neckLiftKg, 'kg'), v('m_filler', checked.fillerMassKg, 'kg')],
    result: v('m_weight', neckLiftKg - checked.fillerMassKg, 'kg'),
    source: 'the filler and its weight together are the neck lift the balloon must just hold up',
  });
  const cylinders = checked.cylinder
    ? deriveFillCylinders(d, basis.gasId, checked.cylinder, gas.dryMol, basis.airPressurePa)
    : undefined;
  const gasInfo = GAS_CATALOGUE[basis.gasId];
  const q = (value: number, unit: string): Quantity => ({ value, unit });
  return {
    kindId,
    gas: { id: gasInfo.id, name: gasInfo.name, formula: gasInfo.formula },
    day: {
      airTemperature: q(basis.airTemperatureK, 'K'),
      airPressure: q(basis.airPressurePa, 'Pa'),
      airDensity: q(basis.airDensityKgM3, 'kg/m³'),
      gasTemperature: q(basis.gasTemperatureK, 'K'),
      gasPressure: q(basis.gasPressurePa, 'Pa'),
      gasDensity: q(basis.gasDensityKgM3, 'kg/m³'),
    },
    gasVolume: q(gas.volumeM3, 'm³'),
    gasVolumeNormal: q(gas.normalVolumeM3, 'm³'),
    normalConditions: FILL_CARD_NORMAL_CONDITIONS,
    gasMass: q(gas.massKg, 'kg'),
    gasAmount: q(gas.mol, 'mol'),
    freeLift: {
      ...q(freeLiftKg, 'kg'),
      from: checked.freeLiftKg === undefined ? 'version' : 'typed',
    },
    payloadMass: q(basis.payloadMassKg, 'kg'),
    envelopeMass: q(basis.envelopeMassKg, 'kg'),
    neckLift: q(neckLiftKg, 'kg'),
    fillerMass: q(checked.fillerMassKg, 'kg'),
    fillerWeight: q(fillerWeightKg, 'kg'),
    stopCriterion: fillCardStopText({
      weight: kg(fillerWeightKg),
      filler: kg(checked.fillerMassKg),
      neckLift: kg(neckLiftKg),
    }),
    ...(cylinders ? { cylinders } : {}),
    cautions: fillCardCautions(basis.gasId, cylinders !== undefined),
    notes: gas.notes,
    steps: d.result().steps,
  };
}

interface FillGas {
  readonly volumeM3: number;
  readonly normalVolumeM3: number;
  readonly massKg: number;
  readonly mol: number;
  /** The dry gas (without the water vapour it may carry) the supply delivers [mol]. */
  readonly dryMol: number;
  readonly notes: string[];
}

/** The gas that lifts envelope, payload and free lift at the version's air, in volume and amount. */
function deriveFillGas(
  d: Derivation,
  basis: FillBasis,
  freeLiftKg: number,
  typed: boolean,
): FillGas {
  const liftPerM3 = basis.airDensityKgM3 - basis.gasDensityKgM3;
  if (liftPerM3 <= 0) {
    throw new InputError('gas', basis.gasId, 'is not lighter than the air of this version');
  }
  const volumeM3 = d.step({
    id: 'fill-volume',
    label: "Gas to fill, at the day's conditions",
    formula: 'V = (m_env + m_payload + L_free) / (ρ_air − ρ_gas)',
    values: [
      v('m_env', basis.envelopeMassKg, 'kg'),
      v('m_payload', basis.payloadMassKg, 'kg'),
      v('L_free', freeLiftKg, 'kg'),
      v('ρ_air', basis.airDensityKgM3, 'kg/m³'),
      v('ρ_gas', basis.gasDensityKgM3, 'kg/m³'),
    ],
    result: v('V', (basis.envelopeMassKg + basis.payloadMassKg + freeLiftKg) / liftPerM3, 'm³'),
    source: SOURCES.archimedes,
  });
  const notes = checkEnvelopeHoldsIt(basis, volumeM3, freeLiftKg, typed);
  const massKg = d.step({
    id: 'fill-gas-mass',
    label: 'Mass of that gas',
    formula: 'm_gas = ρ_gas·V',
    values: [v('ρ_gas', basis.gasDensityKgM3, 'kg/m³'), v('V', volumeM3, 'm³')],
    result: v('m_gas', basis.gasDensityKgM3 * volumeM3, 'kg'),
    source: SOURCES.idealGas,
  });
  const mol = d.step({
    id: 'fill-gas-amount',
    label: 'Amount of that gas',
    formula: 'n = p_gas·V / (R·T_gas)',
    values: [
      v('p_gas', basis.gasPressurePa, 'Pa'),
      v('V', volumeM3, 'm³'),
      v('R', MOLAR_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v('T_gas', basis.gasTemperatureK, 'K'),
    ],
    result: v(
      'n',
      (basis.gasPressurePa * volumeM3) / (MOLAR_GAS_CONSTANT_J_PER_MOL_K * basis.gasTemperatureK),
      'mol',
    ),
    source: SOURCES.idealGas,
  });
  const normalVolumeM3 = d.step({
    id: 'fill-volume-normal',
    label: 'Gas to fill, at normal conditions (DIN 1343: 0 °C, 101.325 kPa)',
    formula: 'V_n = n·R·T_n / p_n',
    values: [
      v('n', mol, 'mol'),
      v('T_n', NORMAL_TEMPERATURE_K, 'K'),
      v('p_n', NORMAL_PRESSURE_PA, 'Pa'),
    ],
    result: v(
      'V_n',
      (mol * MOLAR_GAS_CONSTANT_J_PER_MOL_K * NORMAL_TEMPERATURE_K) / NORMAL_PRESSURE_PA,
      'm³',
    ),
    source: `${SOURCES.idealGas}; ${FILL_CARD_NORMAL_CONDITIONS.definition}`,
  });
  return {
    volumeM3,
    normalVolumeM3,
    massKg,
    mol,
    dryMol: mol * (1 - basis.gasVapourMoleFraction),
    notes,
  };
}

/**
 * A fixed-volume envelope cannot take more gas than it holds: a free lift asking for more is
 * refused, naming it, with the most this envelope gives. A stretching one just fills larger.
 */
function checkEnvelopeHoldsIt(
  basis: FillBasis,
  volumeM3: number,
  freeLiftKg: number,
  typed: boolean,
): string[] {
  const planned = basis.envelopeVolumeM3;
  if (!basis.stretches && volumeM3 > planned * (1 + 1e-9)) {
    const liftPerM3 = basis.airDensityKgM3 - basis.gasDensityKgM3;
    const mostKg = planned * liftPerM3 - basis.envelopeMassKg - basis.payloadMassKg;
    throw new InputError(
      'freeLiftKg',
      freeLiftKg,
      `needs ${volumeM3.toFixed(3)} m³ of gas, more than the envelope holds (${planned.toFixed(3)} m³): at most ${kg(Math.max(0, mostKg))} of free lift with this envelope`,
      { min: 0, max: Math.max(0, mostKg), unit: 'kg' },
    );
  }
  if (typed && Math.abs(volumeM3 - planned) > 1e-6 * planned) {
    return [
      `The free lift typed differs from the version's, so the gas (${volumeM3.toFixed(3)} m³) differs from the envelope volume the version planned (${planned.toFixed(3)} m³).`,
    ];
  }
  return [];
}
