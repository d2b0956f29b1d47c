import * as z from 'zod';
import {
  FARADAY_C_PER_MOL,
  MOLAR_GAS_CONSTANT_J_PER_MOL_K,
  NORMAL_PRESSURE_PA,
  NORMAL_TEMPERATURE_K,
} from '../constants.js';
import { Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { gasChoice } from '../schema/choice-schema.js';
import { count, fraction, money, quantity } from '../schema/quantity-schema.js';
import { SOURCES } from '../sources.js';
import {
  assertWithinCompressibilityModel,
  CYLINDER_COMPRESSIBILITY,
  CYLINDER_GAS_IDS,
  CYLINDER_REFUSAL_REASON,
  cylinderCompressibility,
  cylinderDeliverableMol,
} from '../supply/cylinder.js';
import { HYDROGEN_HHV_J_PER_KG, hydrogenMolarRateMolPerS } from '../supply/electrolysis.js';
import { defineKind } from './kind.js';
import { usually } from '../schema/usual-range.js';
import { USUAL } from '../schema/usual-ranges.js';

const J_PER_WH = 3600;
/** Lowest voltage across one cell the kind accepts, typed or from a stack [V]. */
const CELL_VOLTAGE_FLOOR_V = 1;

const electrolyserSchema = z
  .object({
    currentA: quantity('current', 0.01, 100000, 'current through the cells'),
    cellsInSeries: count('cells in series', 1, 1000),
    faradaicEfficiency: fraction('share of the charge that makes hydrogen', 0.5, 1).default(1),
    voltage: z.discriminatedUnion('kind', [
      z
        .object({
          kind: z.literal('cell'),
          cellVoltageV: usually(
            quantity('voltage', CELL_VOLTAGE_FLOOR_V, 5, 'voltage across one cell'),
            USUAL.cellVoltageV,
          ),
        })
        .strict(),
      z
        .object({
          kind: z.literal('stack'),
          stackVoltageV: quantity('voltage', 1, 5000, 'voltage across the whole stack'),
        })
        .strict(),
    ]),
    supplyEfficiency: fraction('power supply efficiency, mains to stack', 0.3, 1).default(1),
  })
  .strict();

const cylinderSchema = z
  .object({
    gasId: gasChoice(CYLINDER_GAS_IDS, 'gas in the cylinders', CYLINDER_REFUSAL_REASON),
    waterVolumeM3: quantity('volume', 0.0001, 10, 'internal (water) volume of one cylinder'),
    fillPressurePa: quantity('pressureDifference', 1e5, 1e8, 'gauge pressure of a full cylinder'),
    residualPressurePa: quantity(
      'pressureDifference',
      0,
      1e7,
      'gauge pressure left when it is returned',
    ).default(0),
    temperatureK: quantity('temperature', 233.15, 333.15, 'cylinder temperature'),
  })
  .strict();

export const gasSupplySchema = z
  .object({
    fill: z
      .object({
        volumeM3: quantity('volume', 1e-6, 1e7, 'gas needed for one fill, at fill conditions'),
        temperatureK: usually(
          quantity('temperature', 173.15, 423.15, 'gas temperature at filling'),
          USUAL.fillAirTemperatureK,
        ),
        pressurePa: quantity('pressure', 1000, 1.2e6, 'absolute gas pressure at filling'),
        count: count('number of fills', 1, 100000).default(1),
      })
      .strict(),
    electrolyser: electrolyserSchema.optional(),
    measured: z
      .object({
        energyJ: quantity('energy', 1, 1e13, 'energy used, as metered'),
        volumeM3: quantity('volume', 1e-6, 1e7, 'gas volume produced, as measured'),
      })
      .strict()
      .optional(),
    cylinder: cylinderSchema.optional(),
    prices: z
      .object({
        currency: z
          .string()
          .regex(/^[A-Z]{3}$/, { error: 'must be a three-letter currency code such as EUR' })
          .meta({ description: 'currency of the prices', currencyCode: true }),
        electricityPerKWh: money('electricity price', 100, 'kWh').optional(),
        cylinderEach: money('price of one full cylinder', 1e6).optional(),
        bulkGasPerM3: money('delivered gas price per normal cubic metre', 1e5, 'm³').optional(),
      })
      .strict()
      .optional(),
  })
  .strict();

export type GasSupplyInput = z.input<typeof gasSupplySchema>;

export const gasSupplyKind = defineKind({
  id: 'gas-supply',
  capabilities: { charts: ['supply-cost'], predictsFillLift: false, meterImport: true },
  title: 'Gas supply and cost',
  description:
    'Hydrogen from water electrolysis by Faraday’s law (rate, time to fill, energy, efficiency against the higher heating value), metered energy per litre, gas delivered by cylinders, and the cost of each source per fill.',
  schema: gasSupplySchema,
  example: {
    fill: { volumeM3: 0.5, temperatureK: 288.15, pressurePa: 101325, count: 4 },
    electrolyser: {
      currentA: 30,
      cellsInSeries: 6,
      faradaicEfficiency: 0.95,
      voltage: { kind: 'cell', cellVoltageV: 2.1 },
      supplyEfficiency: 0.88,
    },
    cylinder: { gasId: 'helium', waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15 },
    prices: { currency: 'EUR', electricityPerKWh: 0.3, cylinderEach: 320, bulkGasPerM3: 40 },
  },
  compute(inputs) {
    const d = new Derivation();
    const { fill } = inputs;
    const currency = inputs.prices?.currency ?? '';
    const totalVolumeM3 = d.step({
      id: 'total-volume',
      label: 'Gas needed for all fills, at fill conditions',
      formula: 'V_total = V_fill·n_fills',
      values: [v('V_fill', fill.volumeM3, 'm³'), v('n_fills', fill.count, '')],
      result: v('V_total', fill.volumeM3 * fill.count, 'm³'),
      source: SOURCES.given,
    });
    const normalVolumeM3 = d.step({
      id: 'total-volume-normal',
      label: 'Gas needed at normal conditions (0 °C, 101.325 kPa)',
      formula: 'V_n = V_total·(p / p_n)·(T_n / T)',
      values: [
        v('V_total', totalVolumeM3, 'm³'),
        v('p', fill.pressurePa, 'Pa'),
        v('T', fill.temperatureK, 'K'),
      ],
      result: v(
        'V_n',
        (totalVolumeM3 * fill.pressurePa * NORMAL_TEMPERATURE_K) /
          (NORMAL_PRESSURE_PA * fill.temperatureK),
        'm³',
      ),
      source: SOURCES.normalConditions,
    });
    d.output('totalVolume', 'Gas needed, at fill conditions', 'total-volume');
    d.output('totalVolumeNormal', 'Gas needed, at normal conditions', 'total-volume-normal');

    if (inputs.electrolyser) {
      const e = inputs.electrolyser;
      if (e.voltage.kind === 'stack') {
        // A stack voltage shared by more cells than it can drive splits no water: refused, not
        // turned into hydrogen from nothing. The floor is the one a single cell's field has.
        const perCellV = e.voltage.stackVoltageV / e.cellsInSeries;
        if (perCellV < CELL_VOLTAGE_FLOOR_V) {
          throw new InputError(
            'electrolyser.cellsInSeries',
            e.cellsInSeries,
            `leaves ${perCellV.toPrecision(3)} V across each cell of a ${e.voltage.stackVoltageV} V stack, below ${CELL_VOLTAGE_FLOOR_V} V: no water is split (the reversible voltage of water electrolysis is 1.2288 V at 25 °C); fewer cells or a higher stack voltage`,
          );
        }
      }
      const molPerS = d.step({
        id: 'hydrogen-rate',
        label: "Hydrogen produced (Faraday's law)",
        formula: 'ṅ = I·N·η_F / (2F)',
        values: [
          v('I', e.currentA, 'A'),
          v('N', e.cellsInSeries, ''),
          v('η_F', e.faradaicEfficiency, ''),
          v('F', FARADAY_C_PER_MOL, 'C/mol'),
        ],
        result: v(
          'ṅ',
          hydrogenMolarRateMolPerS(e.currentA, e.cellsInSeries, e.faradaicEfficiency),
          'mol/s',
        ),
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
          ((molPerS * MOLAR_GAS_CONSTANT_J_PER_MOL_K * fill.temperatureK) / fill.pressurePa) *
            60000,
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
      const stackVoltageV = d.step(
        e.voltage.kind === 'cell'
          ? {
              id: 'stack-voltage',
              label: 'Stack voltage',
              formula: 'U = N·U_cell',
              values: [v('N', e.cellsInSeries, ''), v('U_cell', e.voltage.cellVoltageV, 'V')],
              result: v('U', e.cellsInSeries * e.voltage.cellVoltageV, 'V'),
              source: 'cells in series',
            }
          : {
              id: 'stack-voltage',
              label: 'Stack voltage (measured)',
              formula: 'U = U_stack',
              values: [],
              result: v('U', e.voltage.stackVoltageV, 'V'),
              source: SOURCES.measured,
            },
      );
      const powerW = d.step({
        id: 'electrical-power',
        label: 'Electrical power drawn from the supply',
        formula: 'P = I·U / η_supply',
        values: [
          v('I', e.currentA, 'A'),
          v('U', stackVoltageV, 'V'),
          v('η_supply', e.supplyEfficiency, ''),
        ],
        result: v('P', (e.currentA * stackVoltageV) / e.supplyEfficiency, 'W'),
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
      d.step({
        id: 'specific-energy',
        label: 'Energy per cubic metre at fill conditions',
        formula: 'e = E / V_total',
        values: [v('E', energyWh / 1000, 'kWh'), v('V_total', totalVolumeM3, 'm³')],
        result: v('e', energyWh / 1000 / totalVolumeM3, 'kWh/m³'),
        source: 'energy per volume',
      });
      d.step({
        id: 'specific-energy-normal',
        label: 'Energy per normal cubic metre',
        formula: 'e_n = E / V_n',
        values: [v('E', energyWh / 1000, 'kWh'), v('V_n', normalVolumeM3, 'm³')],
        result: v('e_n', energyWh / 1000 / normalVolumeM3, 'kWh/m³'),
        source: 'energy per volume',
      });
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
      if (inputs.prices?.electricityPerKWh !== undefined) {
        const cost = d.step({
          id: 'electrolysis-cost',
          label: 'Electricity cost for all fills',
          formula: 'C = E·price',
          values: [
            v('E', energyWh / 1000, 'kWh'),
            v('price', inputs.prices.electricityPerKWh, `${currency}/kWh`),
          ],
          result: v('C', (energyWh / 1000) * inputs.prices.electricityPerKWh, currency),
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

    if (inputs.measured) {
      const m = inputs.measured;
      const whPerL = d.step({
        id: 'measured-specific-energy',
        label: 'Metered energy per litre of gas',
        formula: 'e = E / V',
        values: [v('E', m.energyJ / J_PER_WH, 'Wh'), v('V', m.volumeM3 * 1000, 'L')],
        result: v('e', m.energyJ / J_PER_WH / (m.volumeM3 * 1000), 'Wh/L'),
        source: SOURCES.measured,
      });
      d.output('measuredSpecificEnergy', 'Metered energy per litre', 'measured-specific-energy');
      if (inputs.prices?.electricityPerKWh !== undefined) {
        // Wh/L and kWh/m³ are the same number.
        d.step({
          id: 'measured-cost-per-m3',
          label: 'Electricity cost per cubic metre (metered)',
          formula: 'c = e·price',
          values: [
            v('e', whPerL, 'kWh/m³'),
            v('price', inputs.prices.electricityPerKWh, `${currency}/kWh`),
          ],
          result: v('c', whPerL * inputs.prices.electricityPerKWh, `${currency}/m³`),
          source: 'energy × price',
        });
        d.output('measuredCostPerM3', 'Metered electricity cost per m³', 'measured-cost-per-m3');
      }
    }

    if (inputs.cylinder) {
      const c = inputs.cylinder;
      // A cylinder returned fuller than it came gives no gas: refused, not turned into a
      // negative volume and zero cylinders.
      if (c.residualPressurePa >= c.fillPressurePa) {
        throw new InputError(
          'cylinder.residualPressurePa',
          c.residualPressurePa,
          'must be below the gauge pressure of a full cylinder: a cylinder returned at or above its fill pressure gives no gas',
        );
      }
      const fillAbsPa = c.fillPressurePa + NORMAL_PRESSURE_PA;
      const residualAbsPa = c.residualPressurePa + NORMAL_PRESSURE_PA;
      const model = CYLINDER_COMPRESSIBILITY[c.gasId];
      assertWithinCompressibilityModel(model, fillAbsPa, c.temperatureK);
      const zFill = d.step({
        id: 'cylinder-compressibility',
        label: 'Compressibility of the full cylinder',
        formula: model.formula,
        values: [v('p', fillAbsPa, 'Pa'), v('T', c.temperatureK, 'K')],
        result: v('Z_f', cylinderCompressibility(c.gasId, fillAbsPa, c.temperatureK), ''),
        source: model.source,
      });
      const zResidual = d.step({
        id: 'cylinder-residual-compressibility',
        label: 'Compressibility of the gas left in a returned cylinder',
        formula: model.formula,
        values: [v('p', residualAbsPa, 'Pa'), v('T', c.temperatureK, 'K')],
        result: v('Z_r', cylinderCompressibility(c.gasId, residualAbsPa, c.temperatureK), ''),
        source: model.source,
      });
      const mol = d.step({
        id: 'cylinder-amount',
        label: 'Gas one cylinder delivers',
        formula: 'n = V_w·(p_f/Z_f − p_r/Z_r) / (R·T)',
        values: [
          v('V_w', c.waterVolumeM3, 'm³'),
          v('p_f', fillAbsPa, 'Pa'),
          v('Z_f', zFill, ''),
          v('p_r', residualAbsPa, 'Pa'),
          v('Z_r', zResidual, ''),
          v('T', c.temperatureK, 'K'),
        ],
        result: v(
          'n',
          cylinderDeliverableMol(
            c.gasId,
            c.waterVolumeM3,
            fillAbsPa,
            residualAbsPa,
            c.temperatureK,
          ),
          'mol',
        ),
        source: 'real-gas law p = Z·(n/V)·R·T at both pressures',
      });
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
      if (inputs.prices?.cylinderEach !== undefined) {
        d.step({
          id: 'cylinder-cost',
          label: 'Cylinder cost for all fills',
          formula: 'C = N_cyl·price',
          values: [v('N_cyl', cylinders, ''), v('price', inputs.prices.cylinderEach, currency)],
          result: v('C', cylinders * inputs.prices.cylinderEach, currency),
          source: 'count × price',
        });
        d.step({
          id: 'cylinder-cost-per-m3',
          label: 'Cylinder gas cost per cubic metre (fill conditions)',
          formula: 'c = price / V_cyl',
          values: [
            v('price', inputs.prices.cylinderEach, currency),
            v('V_cyl', perCylinderM3, 'm³'),
          ],
          result: v('c', inputs.prices.cylinderEach / perCylinderM3, `${currency}/m³`),
          source: 'cost per volume',
        });
        d.output('cylinderCost', 'Cylinders: cost', 'cylinder-cost');
        d.output('cylinderCostPerM3', 'Cylinders: cost per m³', 'cylinder-cost-per-m3');
      }
      if (GAS_CATALOGUE[c.gasId].hazard.flammable) {
        d.warn({
          code: 'flammable-gas',
          severity: 'caution',
          message: `${GAS_CATALOGUE[c.gasId].name} is flammable. ${GAS_CATALOGUE[c.gasId].hazard.note} Secure cylinders upright, use the right regulator, and follow the supplier's instructions and your local fire code.`,
        });
      }
      d.warn({
        code: 'pressurised-cylinder',
        severity: 'caution',
        message:
          'Gas cylinders hold very high pressure: chain them upright, use a regulator rated for the gas, and never heat them.',
      });
    }

    if (inputs.prices?.bulkGasPerM3 !== undefined) {
      d.step({
        id: 'bulk-cost',
        label: 'Delivered gas cost for all fills',
        formula: 'C = V_n·price',
        values: [
          v('V_n', normalVolumeM3, 'm³'),
          v('price', inputs.prices.bulkGasPerM3, `${currency}/m³`),
        ],
        result: v('C', normalVolumeM3 * inputs.prices.bulkGasPerM3, currency),
        source: 'volume × price',
      });
      d.output('bulkCost', 'Delivered gas: cost', 'bulk-cost');
    }
    return d.result();
  },
});
