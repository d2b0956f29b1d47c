import * as z from 'zod';
import { GAS_IDS } from '../gas/gas-catalogue.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import { gasChoice } from './choice-schema.js';
import { fraction, quantity } from './quantity-schema.js';
import { usually } from './usual-range.js';
import { USUAL } from './usual-ranges.js';

/** The gas in the envelope, relative to the air around it. */
export const gasSchema = z
  .object({
    gasId: gasChoice(GAS_IDS, 'lifting gas'),
    purity: usually(
      fraction('mole fraction of the named gas in the dry gas; the rest is air', MIN_PURITY, 1),
      USUAL.gasPurity,
    ).default(1),
    superheatK: quantity(
      'temperatureDifference',
      -30,
      200,
      'gas temperature above the air temperature',
    ).default(0),
    superpressurePa: quantity(
      'pressureDifference',
      0,
      1e6,
      'gas pressure above the air pressure',
    ).default(0),
    relativeHumidity: fraction(
      'water vapour in the gas at its own temperature (0 % dried, 100 % saturated)',
    ).default(0),
  })
  .strict()
  .meta({ description: 'Lifting gas' });

export type GasInput = z.output<typeof gasSchema>;
