import { FARADAY_C_PER_MOL, MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import type { GasSupplyValues } from '../kinds/gas-supply.kind.js';
import { SOURCES } from '../sources.js';
import {
  CELL_VOLTAGE_FLOOR_V,
  HYDROGEN_HHV_J_PER_KG,
  hydrogenMolarRateMolPerS,
} from '../supply/electrolysis.js';
import type { SupplyVolumes } from './supply-volume-steps.js';

type Electrolyser = NonNullable<GasSupplyValues['electrolyser']>;
type Fill = GasSupplyValues['fill'];

/**
 * Hydrogen from water electrolysis: its rate by Faraday's law, the running time for all fills,
 * the electrical power and energy, energy per cubic metre, efficiency against the higher heating
 * value, and the electricity cost when priced; with the cautions electrolysis needs.
 */
export function deriveElectrolysisSupply(
  d: Derivation,
  electrolyser: Electrolyser,
  fill: Fill,
  volumes: SupplyVolumes,
  prices: GasSupplyValues['prices'],
): void {
  refuseStackBelowCellFloor(electrolyser);
  const production = deriveHydrogenProduction(d, electrolyser, fill, volumes.totalVolumeM3);
  const { powerW, energyWh } = deriveElectricalEnergy(d, electrolyser, production.minutes);
  deriveSpecificEnergies(d, energyWh, volumes);
  deriveHhvEfficiency(d, production.molPerS, powerW);
  d.output(
    'hydrogenFlow',
    'Hydrogen flow',
    'hydrogen-flow',
    `at ${(fill.temperatureK - 273.15).toFixed(1)} °C, ${(fill.pressurePa / 1000).toFixed(2)} kPa`,
  );
  d.output('timeToFill', 'Running time for all fills', 'time-to-fill');
  d.output('electricalPower', 'Electrical power', 'electrical-power');
  d.output('electricalEnergy', 'Electrical energy', 'electrical-energy');
  d.output('specificEnergy', 'Energy per cubic metre', 'specific-energy');
  d.output('specificEnergyNormal', 'Energy per normal cubic metre', 'specific-energy-normal');
  d.output('hhvEfficiency', 'Efficiency against HHV', 'hhv-efficiency');
  if (prices?.electricityPerKWh !== undefined) {
    deriveElectricityCost(d, energyWh, volumes.totalVolumeM3, {
      currency: prices.currency,
      perKWh: prices.electricityPerKWh,
    });
  }
  warnAboutElectrolysis(d);
}

/**
 * A stack voltage shared by more cells than it can drive splits no water: refused, not turned
 * into hydrogen from nothing. The floor is the one a single cell's field has.
 */
function refuseStackBelowCellFloor(electrolyser: Electrolyser): void {
  if (electrolyser.voltage.kind !== 'stack') return;
  const perCellV = electrolyser.voltage.stackVoltageV / electrolyser.cellsInSeries;
  if (perCellV < CELL_VOLTAGE_FLOOR_V) {
    throw new InputError(
      'electrolyser.cellsInSeries',
      electrolyser.cellsInSeries,
      `leaves ${perCellV.toPrecision(3)} V across each cell of a ${electrolyser.voltage.stackVoltageV} V stack, below ${CELL_VOLTAGE_FLOOR_V} V: no water is split (the reversible voltage of water electrolysis is 1.2288 V at 25 °C); fewer cells or a higher stack voltage`,
    );
  }
}

/** Hydrogen rate [mol/s], its flow at fill conditions [L/min] and the running time [min]. */
function deriveHydrogenProduction(
  d: Derivation,
  electrolyser: Electrolyser,
  fill: Fill,
  totalVolumeM3: number,
): { molPerS: number; litresPerMin: number; minutes: number } {
  const { currentA, cellsInSeries, faradaicEfficiency } = electrolyser;
  const molPerS = d.step({
    id: 'hydrogen-rate',
    label: "Hydrogen produced (Faraday's law)",
    formula: 'ṅ = I·N·η_F / (2F)',
    values: [
      v('I', currentA, 'A'),
      v('N', cellsInSeries, ''),
      v('η_F', faradaicEfficiency, ''),
      v('F', FARADAY_C_PER_MOL, 'C/mol'),
    ],
    result: v('ṅ', hydrogenMolarRateMolPerS(currentA, cellsInSeries, faradaicEfficiency), 'mol/s'),
    source: "Faraday's law of electrolysis, F from CODATA 2018",
  });
  const litresPerMin = d.step({
    id: 'hydrogen-flow',
    label: 'Hydrogen flow at fill conditions',
    formula: 'V̇ = ṅ·R·T / p',
    values: [
      v('ṅ', molPerS, 'mol/s'),
      v('R', MOLAR_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
      v('T', fill.temperatureK, 'K'),
      v('p', fill.pressurePa, 'Pa'),
    ],
    result: v(
      'V̇',
      ((molPerS * MOLAR_GAS_CONSTANT_J_PER_MOL_K * fill.temperatureK) / fill.pressurePa) * 60000,
      'L/min',
    ),
    source: SOURCES.idealGas,
  });
  const minutes = d.step({
    id: 'time-to-fill',
    label: 'Electrolyser running time for all fills',
    formula: 't = V_total / V̇',
    values: [v('V_total', totalVolumeM3 * 1000, 'L'), v('V̇', litresPerMin, 'L/min')],
    result: v('t', (totalVolumeM3 * 1000) / litresPerMin, 'min'),
    source: 'constant production rate',
  });
  return { molPerS, litresPerMin, minutes };
}

/** Stack voltage [V], power drawn from the supply [W] and energy for all fills [Wh]. */
function deriveElectricalEnergy(
  d: Derivation,
  electrolyser: Electrolyser,
  minutes: number,
): { stackVoltageV: number; powerW: number; energyWh: number } {
  const { voltage, cellsInSeries, currentA, supplyEfficiency } = electrolyser;
  const stackVoltageV = d.step(
    voltage.kind === 'cell'
      ? {
          id: 'stack-voltage',
          label: 'Stack voltage',
          formula: 'U = N·U_cell',
          values: [v('N', cellsInSeries, ''), v('U_cell', voltage.cellVoltageV, 'V')],
          result: v('U', cellsInSeries * voltage.cellVoltageV, 'V'),
          source: 'cells in series',
        }
      : {
          id: 'stack-voltage',
          label: 'Stack voltage (measured)',
          formula: 'U = U_stack',
          values: [],
          result: v('U', voltage.stackVoltageV, 'V'),
          source: SOURCES.measured,
        },
  );
  const powerW = d.step({
    id: 'electrical-power',
    label: 'Electrical power drawn from the supply',
    formula: 'P = I·U / η_supply',
    values: [
      v('I', currentA, 'A'),
      v('U', stackVoltageV, 'V'),
      v('η_supply', supplyEfficiency, ''),
    ],
    result: v('P', (currentA * stackVoltageV) / supplyEfficiency, 'W'),
    source: 'electrical power, P = I·U',
  });
  const energyWh = d.step({
    id: 'electrical-energy',
    label: 'Electrical energy for all fills',
    formula: 'E = P·t',
    values: [v('P', powerW, 'W'), v('t', minutes / 60, 'h')],
    result: v('E', (powerW * minutes) / 60, 'Wh'),
    source: 'energy = power × time',
  });
  return { stackVoltageV, powerW, energyWh };
}

/** Energy per cubic metre at fill conditions and per normal cubic metre [kWh/m³]. */
function deriveSpecificEnergies(d: Derivation, energyWh: number, volumes: SupplyVolumes): void {
  d.step({
    id: 'specific-energy',
    label: 'Energy per cubic metre at fill conditions',
    formula: 'e = E / V_total',
    values: [v('E', energyWh / 1000, 'kWh'), v('V_total', volumes.totalVolumeM3, 'm³')],
    result: v('e', energyWh / 1000 / volumes.totalVolumeM3, 'kWh/m³'),
    source: 'energy per volume',
  });
  d.step({
    id: 'specific-energy-normal',
    label: 'Energy per normal cubic metre',
    formula: 'e_n = E / V_n',
    values: [v('E', energyWh / 1000, 'kWh'), v('V_n', volumes.normalVolumeM3, 'm³')],
    result: v('e_n', energyWh / 1000 / volumes.normalVolumeM3, 'kWh/m³'),
    source: 'energy per volume',
  });
}

/** Efficiency against the higher heating value of the hydrogen made [%]. */
function deriveHhvEfficiency(d: Derivation, molPerS: number, powerW: number): void {
  const hhvPowerW = molPerS * GAS_CATALOGUE.hydrogen.molarMassKgPerMol * HYDROGEN_HHV_J_PER_KG;
  d.step({
    id: 'hhv-efficiency',
    label: 'Efficiency against the higher heating value of hydrogen',
    formula: 'η_HHV = ṅ·M_H₂·HHV / P',
    values: [
      v('ṅ', molPerS, 'mol/s'),
      v('M_H₂', GAS_CATALOGUE.hydrogen.molarMassKgPerMol, 'kg/mol'),
      v('HHV', HYDROGEN_HHV_J_PER_KG / 1e6, 'MJ/kg'),
      v('P', powerW, 'W'),
    ],
    result: v('η_HHV', (100 * hhvPowerW) / powerW, '%'),
    source: 'HHV 141.88 MJ/kg: Hydrogen Analysis Resource Center (DOE/PNNL)',
  });
}

/** Electricity cost for all fills and per cubic metre at fill conditions; publishes both. */
function deriveElectricityCost(
  d: Derivation,
  energyWh: number,
  totalVolumeM3: number,
  price: { currency: string; perKWh: number },
): void {
  const { currency } = price;
  const cost = d.step({
    id: 'electrolysis-cost',
    label: 'Electricity cost for all fills',
    formula: 'C = E·price',
    values: [v('E', energyWh / 1000, 'kWh'), v('price', price.perKWh, `${currency}/kWh`)],
    result: v('C', (energyWh / 1000) * price.perKWh, currency),
    source: 'energy × price',
  });
  d.step({
    id: 'electrolysis-cost-per-m3',
    label: 'Electricity cost per cubic metre (fill conditions)',
    formula: 'c = C / V_total',
    values: [v('C', cost, currency), v('V_total', totalVolumeM3, 'm³')],
    result: v('c', cost / totalVolumeM3, `${currency}/m³`),
    source: 'cost per volume',
  });
  d.output('electrolysisCost', 'Electrolysis: electricity cost', 'electrolysis-cost');
  d.output('electrolysisCostPerM3', 'Electrolysis: cost per m³', 'electrolysis-cost-per-m3');
}

function warnAboutElectrolysis(d: Derivation): void {
  d.warn({
    code: 'electrolysis-hazard',
    severity: 'caution',
    message:
      'Electrolysis makes hydrogen and oxygen, which together are explosive: keep them apart, vent both outdoors, and keep sparks away. High-current supplies can burn and shock: follow the electrical rules where you are.',
  });
  d.warn({
    code: 'flammable-gas',
    severity: 'caution',
    message: `${GAS_CATALOGUE.hydrogen.hazard.note} Fill in open air or a well-ventilated space, away from ignition sources.`,
  });
}
