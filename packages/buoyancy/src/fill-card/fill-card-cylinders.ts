import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE, type GasId } from '../gas/gas-catalogue.js';
import { findRoot } from '../numerics/find-root.js';
import {
  assertWithinCompressibilityModel,
  CYLINDER_COMPRESSIBILITY,
  cylinderCompressibility,
  cylinderDeliverableMol,
  type CylinderGasId,
} from '../supply/cylinder.js';
import type { CheckedFillCardOptions } from './fill-card-options.js';

type Cylinder = NonNullable<CheckedFillCardOptions['cylinder']>;

/** What the fill takes from the team's cylinders. All pressures are gauge, as the gauge reads. */
export interface FillCardCylinders {
  readonly waterVolumeM3: number;
  readonly fillPressurePa: number;
  readonly temperatureK: number;
  /** Full cylinders the team has. */
  readonly available: number;
  /** The day's air pressure the gauges read against, and cylinders are emptied to [Pa]. */
  readonly airPressurePa: number;
  /** Gas one full cylinder gives down to the day's air pressure [mol]. */
  readonly perCylinderMol: number;
  /** Cylinders the fill opens: all but the last emptied, the last drawn down. */
  readonly needed: number;
  readonly enough: boolean;
  /** Gauge pressure the last opened cylinder is left at [Pa]. */
  readonly lastEndPressurePa: number;
  /** How far the last opened cylinder's gauge falls [Pa]. */
  readonly lastPressureDropPa: number;
  /** The drop in words, for the card. */
  readonly text: string;
}

const cylinderGas = (gasId: GasId): CylinderGasId => {
  if (gasId in CYLINDER_COMPRESSIBILITY) return gasId as CylinderGasId;
  throw new InputError(
    'cylinder',
    gasId,
    `cannot be worked out for ${GAS_CATALOGUE[gasId].name.toLowerCase()}: only helium and hydrogen have a published real-gas model here`,
  );
};

/**
 * The fill as cylinders: what one full cylinder gives down to the day's air pressure (real gas),
 * how many the fill opens, and the gauge pressure the last one falls to, found from
 * V_w·(p_f/Z_f − p_e/Z_e)/(R·T) = n_last with the engine's published compressibility models.
 * A gauge reads against the air around it, so absolute pressures are gauge + the day's air
 * pressure, and an opened cylinder empties to that air pressure, not to 101 325 Pa: at a high
 * site it keeps less gas back.
 * @param airPressurePa the day's air pressure at the launch site [Pa]
 */
export function deriveFillCylinders(
  d: Derivation,
  gasId: GasId,
  cylinder: Cylinder,
  neededMol: number,
  airPressurePa: number,
): FillCardCylinders {
  const gas = cylinderGas(gasId);
  const model = CYLINDER_COMPRESSIBILITY[gas];
  const { waterVolumeM3, temperatureK } = cylinder;
  const fullAbsPa = cylinder.fillPressurePa + airPressurePa;
  assertWithinCompressibilityModel(model, fullAbsPa, temperatureK);
  const zFull = d.step({
    id: 'fill-cylinder-compressibility',
    label: 'Compressibility of a full cylinder',
    formula: model.formula,
    values: [v('p_f', fullAbsPa, 'Pa'), v('T_cyl', temperatureK, 'K')],
    result: v('Z_f', cylinderCompressibility(gas, fullAbsPa, temperatureK), ''),
    source: model.source,
  });
  const perCylinderMol = d.step({
    id: 'fill-cylinder-amount',
    label: 'Gas one full cylinder gives, down to the day’s air pressure',
    formula: 'n_cyl = V_w·(p_f/Z_f − p_a/Z_a) / (R·T_cyl)',
    values: [
      v('V_w', waterVolumeM3, 'm³'),
      v('p_f', fullAbsPa, 'Pa'),
      v('Z_f', zFull, ''),
      v('p_a', airPressurePa, 'Pa'),
      v('T_cyl', temperatureK, 'K'),
    ],
    result: v(
      'n_cyl',
      cylinderDeliverableMol(gas, waterVolumeM3, fullAbsPa, airPressurePa, temperatureK),
      'mol',
    ),
    source:
      'real-gas law p = Z·(n/V)·R·T at both pressures; p_f = gauge fill pressure + p_a, p_a the day’s air pressure the gauge reads against and the cylinder empties to',
  });
  // A hair of tolerance so a fill of exactly k cylinders does not open a (k+1)th for rounding.
  const needed = Math.max(1, Math.ceil(neededMol / perCylinderMol - 1e-9));
  d.step({
    id: 'fill-cylinders-needed',
    label: 'Cylinders the fill opens',
    formula: 'N = ⌈n_fill / n_cyl⌉',
    values: [v('n_fill', neededMol, 'mol'), v('n_cyl', perCylinderMol, 'mol')],
    result: v('N', needed, ''),
    source: 'whole cylinders',
  });
  const lastMol = neededMol - (needed - 1) * perCylinderMol;
  const endAbsPa = lastCylinderEndPa(gas, cylinder, { fullAbsPa, zFull, airPressurePa }, lastMol);
  d.step({
    id: 'fill-cylinder-end-pressure',
    label: 'Gauge pressure the last opened cylinder falls to',
    formula: 'p_e/Z(p_e) = p_f/Z_f − n_last·R·T_cyl/V_w; gauge = p_e − p_a',
    values: [
      v('p_f', fullAbsPa, 'Pa'),
      v('Z_f', zFull, ''),
      v('n_last', lastMol, 'mol'),
      v('V_w', waterVolumeM3, 'm³'),
      v('T_cyl', temperatureK, 'K'),
      v('p_a', airPressurePa, 'Pa'),
    ],
    result: v('p_e,gauge', endAbsPa - airPressurePa, 'Pa'),
    source: `${model.source}; solved by Brent's method`,
  });
  const lastEndPressurePa = endAbsPa - airPressurePa;
  const lastPressureDropPa = cylinder.fillPressurePa - lastEndPressurePa;
  return {
    waterVolumeM3,
    fillPressurePa: cylinder.fillPressurePa,
    temperatureK,
    airPressurePa,
    available: cylinder.count,
    perCylinderMol,
    needed,
    enough: needed <= cylinder.count,
    lastEndPressurePa,
    lastPressureDropPa,
    text: dropText(needed, cylinder, lastEndPressurePa, lastPressureDropPa),
  };
}

/** Absolute pressure left in a cylinder after `lastMol` is drawn from it full [Pa]. */
function lastCylinderEndPa(
  gas: CylinderGasId,
  cylinder: Cylinder,
  full: { readonly fullAbsPa: number; readonly zFull: number; readonly airPressurePa: number },
  lastMol: number,
): number {
  const { fullAbsPa, zFull, airPressurePa } = full;
  const { waterVolumeM3, temperatureK } = cylinder;
  const target =
    fullAbsPa / zFull - (lastMol * MOLAR_GAS_CONSTANT_J_PER_MOL_K * temperatureK) / waterVolumeM3;
  // p/Z(p) rises with p over the cylinder range, so the root between p_a and p_f is the one.
  const excess = (pressurePa: number) =>
    pressurePa / cylinderCompressibility(gas, pressurePa, temperatureK) - target;
  if (excess(airPressurePa) >= 0) return airPressurePa;
  return findRoot(excess, airPressurePa, fullAbsPa, { xTolerance: 1e-6 });
}

const bar = (pressurePa: number) => `${(pressurePa / 1e5).toFixed(1)} bar`;

function dropText(needed: number, cylinder: Cylinder, endPa: number, dropPa: number): string {
  const last = `from ${bar(cylinder.fillPressurePa)} to ${bar(endPa)} (a drop of ${bar(dropPa)}, gauge)`;
  const opened =
    needed === 1
      ? `One cylinder is enough: its gauge falls ${last}.`
      : `${needed} cylinders: empty ${needed - 1} to the day’s air pressure (gauge 0), then the last falls ${last}.`;
  return needed > cylinder.count
    ? `${opened} Not enough: the team has ${cylinder.count}, the fill needs ${needed}.`
    : opened;
}
