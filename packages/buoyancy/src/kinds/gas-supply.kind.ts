import * as z from 'zod';
import { Derivation } from '../derivation.js';
import { gasChoice } from '../schema/choice-schema.js';
import { count, fraction, money, quantity } from '../schema/quantity-schema.js';
import { deriveElectrolysisSupply } from '../steps/supply-electrolysis-steps.js';
import { deriveCylinderSupply } from '../steps/supply-cylinder-steps.js';
import { deriveMeteredSupply } from '../steps/supply-metered-steps.js';
import { deriveBulkGasCost, deriveSupplyVolumes } from '../steps/supply-volume-steps.js';
import { CYLINDER_GAS_IDS, CYLINDER_REFUSAL_REASON } from '../supply/cylinder.js';
import { CELL_VOLTAGE_FLOOR_V } from '../supply/electrolysis.js';
import { defineKind } from './kind.js';
import { usually } from '../schema/usual-range.js';
import { USUAL } from '../schema/usual-ranges.js';

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
/** The inputs as the kind reads them, defaults filled in. */
export type GasSupplyValues = z.output<typeof gasSupplySchema>;

export const gasSupplyKind = defineKind({
  id: 'gas-supply',
  capabilities: {
    charts: ['supply-cost'],
    predictsFillLift: false,
    meterImport: true,
    landingArea: false,
  },
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
    const { fill, prices } = inputs;
    const volumes = deriveSupplyVolumes(d, fill);
    if (inputs.electrolyser) {
      deriveElectrolysisSupply(d, inputs.electrolyser, fill, volumes, prices);
    }
    if (inputs.measured) deriveMeteredSupply(d, inputs.measured, prices);
    if (inputs.cylinder) {
      deriveCylinderSupply(d, inputs.cylinder, fill, volumes.totalVolumeM3, prices);
    }
    if (prices?.bulkGasPerM3 !== undefined) {
      deriveBulkGasCost(d, volumes.normalVolumeM3, prices.bulkGasPerM3, prices.currency);
    }
    return d.result();
  },
});
