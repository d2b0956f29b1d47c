import { MOLAR_GAS_CONSTANT_J_PER_MOL_K, NORMAL_PRESSURE_PA } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import type { GasSupplyValues } from '../kinds/gas-supply.kind.js';
import { SOURCES } from '../sources.js';
import {
  assertWithinCompressibilityModel,
  CYLINDER_COMPRESSIBILITY,
  cylinderCompressibility,
  cylinderDeliverableMol,
} from '../supply/cylinder.js';

type Cylinder = NonNullable<GasSupplyValues['cylinder']>;

/**
 * Gas delivered in cylinders: what one cylinder gives between its fill and its residual pressure
 * (real gas), how many all fills take, and their cost when priced; with the cylinder cautions.
 */
export function deriveCylinderSupply(
  d: Derivation,
  cylinder: Cylinder,
  fill: GasSupplyValues['fill'],
  totalVolumeM3: number,
  prices: GasSupplyValues['prices'],
): void {
  refuseResidualAtFillPressure(cylinder);
  const mol = deriveCylinderAmountMol(d, cylinder);
  const perCylinderM3 = d.step({
    id: 'cylinder-volume',
    label: 'Gas one cylinder delivers, at fill conditions',
    formula: 'V_cyl = n·R·T_fill / p_fill',
    values: [
      v('n', mol, 'mol'),
      v('T_fill', fill.temperatureK, 'K'),
      v('p_fill', fill.pressurePa, 'Pa'),
    ],
    result: v(
      'V_cyl',
      (mol * MOLAR_GAS_CONSTANT_J_PER_MOL_K * fill.temperatureK) / fill.pressurePa,
      'm³',
    ),
    source: SOURCES.idealGas,
  });
  const cylinders = d.step({
    id: 'cylinders-needed',
    label: 'Cylinders needed for all fills',
    formula: 'N_cyl = ⌈V_total / V_cyl⌉',
    values: [v('V_total', totalVolumeM3, 'm³'), v('V_cyl', perCylinderM3, 'm³')],
    result: v('N_cyl', Math.ceil(totalVolumeM3 / perCylinderM3 - 1e-9), ''),
    source: 'whole cylinders',
  });
  d.output('cylinderVolume', 'Gas per cylinder, at fill conditions', 'cylinder-volume');
  d.output('cylindersNeeded', 'Cylinders needed', 'cylinders-needed');
  if (prices?.cylinderEach !== undefined) {
    deriveCylinderCost(d, cylinders, perCylinderM3, {
      currency: prices.currency,
      each: prices.cylinderEach,
    });
  }
  warnAboutCylinders(d, cylinder);
}

/**
 * A cylinder returned fuller than it came gives no gas: refused, not turned into a negative
 * volume and zero cylinders.
 */
function refuseResidualAtFillPressure(cylinder: Cylinder): void {
  if (cylinder.residualPressurePa >= cylinder.fillPressurePa) {
    throw new InputError(
      'cylinder.residualPressurePa',
      cylinder.residualPressurePa,
      'must be below the gauge pressure of a full cylinder: a cylinder returned at or above its fill pressure gives no gas',
    );
  }
}

/** Compressibility full and as returned, and the gas one cylinder delivers between them [mol]. */
function deriveCylinderAmountMol(d: Derivation, cylinder: Cylinder): number {
  const { gasId, temperatureK, waterVolumeM3 } = cylinder;
  const fillAbsPa = cylinder.fillPressurePa + NORMAL_PRESSURE_PA;
  const residualAbsPa = cylinder.residualPressurePa + NORMAL_PRESSURE_PA;
  const model = CYLINDER_COMPRESSIBILITY[gasId];
  assertWithinCompressibilityModel(model, fillAbsPa, temperatureK);
  const zFill = d.step({
    id: 'cylinder-compressibility',
    label: 'Compressibility of the full cylinder',
    formula: model.formula,
    values: [v('p', fillAbsPa, 'Pa'), v('T', temperatureK, 'K')],
    result: v('Z_f', cylinderCompressibility(gasId, fillAbsPa, temperatureK), ''),
    source: model.source,
  });
  const zResidual = d.step({
    id: 'cylinder-residual-compressibility',
    label: 'Compressibility of the gas left in a returned cylinder',
    formula: model.formula,
    values: [v('p', residualAbsPa, 'Pa'), v('T', temperatureK, 'K')],
    result: v('Z_r', cylinderCompressibility(gasId, residualAbsPa, temperatureK), ''),
    source: model.source,
  });
  return d.step({
    id: 'cylinder-amount',
    label: 'Gas one cylinder delivers',
    formula: 'n = V_w·(p_f/Z_f − p_r/Z_r) / (R·T)',
    values: [
      v('V_w', waterVolumeM3, 'm³'),
      v('p_f', fillAbsPa, 'Pa'),
      v('Z_f', zFill, ''),
      v('p_r', residualAbsPa, 'Pa'),
      v('Z_r', zResidual, ''),
      v('T', temperatureK, 'K'),
    ],
    result: v(
      'n',
      cylinderDeliverableMol(gasId, waterVolumeM3, fillAbsPa, residualAbsPa, temperatureK),
      'mol',
    ),
    source: 'real-gas law p = Z·(n/V)·R·T at both pressures',
  });
}

/** Cylinder cost for all fills and per cubic metre at fill conditions; publishes both. */
function deriveCylinderCost(
  d: Derivation,
  cylinders: number,
  perCylinderM3: number,
  price: { currency: string; each: number },
): void {
  const { currency } = price;
  d.step({
    id: 'cylinder-cost',
    label: 'Cylinder cost for all fills',
    formula: 'C = N_cyl·price',
    values: [v('N_cyl', cylinders, ''), v('price', price.each, currency)],
    result: v('C', cylinders * price.each, currency),
    source: 'count × price',
  });
  d.step({
    id: 'cylinder-cost-per-m3',
    label: 'Cylinder gas cost per cubic metre (fill conditions)',
    formula: 'c = price / V_cyl',
    values: [v('price', price.each, currency), v('V_cyl', perCylinderM3, 'm³')],
    result: v('c', price.each / perCylinderM3, `${currency}/m³`),
    source: 'cost per volume',
  });
  d.output('cylinderCost', 'Cylinders: cost', 'cylinder-cost');
  d.output('cylinderCostPerM3', 'Cylinders: cost per m³', 'cylinder-cost-per-m3');
}

function warnAboutCylinders(d: Derivation, cylinder: Cylinder): void {
  const gas = GAS_CATALOGUE[cylinder.gasId];
  if (gas.hazard.flammable) {
    d.warn({
      code: 'flammable-gas',
      severity: 'caution',
      message: `${gas.name} is flammable. ${gas.hazard.note} Secure cylinders upright, use the right regulator, and follow the supplier's instructions and your local fire code.`,
    });
  }
  d.warn({
    code: 'pressurised-cylinder',
    severity: 'caution',
    message:
      'Gas cylinders hold very high pressure: chain them upright, use a regulator rated for the gas, and never heat them.',
  });
}
