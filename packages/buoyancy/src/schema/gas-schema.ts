import * as z from 'zod';
import { GAS_IDS } from '../gas/gas-catalogue.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import { gasChoice } from './choice-schema.js';
import { fraction, quantity } from './quantity-schema.js';
import { usually } from './usual-range.js';
import { USUAL } from './usual-ranges.js';

/**
 * Published beside a field in the JSON Schema (`notWhen`): the sibling values for which the field
 * means nothing, so a form hides it. The schema itself refuses a value there.
 */
function notWhen<T extends z.ZodType>(schema: T, condition: Record<string, readonly string[]>): T {
  return schema.meta({ ...schema.meta(), notWhen: condition }) as T;
}

const NOT_FOR_HEATED_AIR = { gasId: ['hot-air'] } as const;

/** The gas in the envelope, relative to the air around it. */
export const gasSchema = z
  .object({
    gasId: gasChoice(GAS_IDS, 'lifting gas'),
    purity: notWhen(
      usually(
        fraction('mole fraction of the named gas in the dry gas; the rest is air', MIN_PURITY, 1),
        USUAL.gasPurity,
      ),
      NOT_FOR_HEATED_AIR,
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
    relativeHumidity: notWhen(
      fraction('water vapour in the gas at its own temperature (0 % dried, 100 % saturated)'),
      NOT_FOR_HEATED_AIR,
    ).default(0),
  })
  .strict()
  .superRefine((gas, context) => {
    // Heated air is the surrounding air itself: its make-up and water are the air's.
    if (gas.gasId !== 'hot-air') return;
    if (gas.purity !== 1) {
      context.addIssue({
        code: 'custom',
        path: ['purity'],
        message: 'means nothing for heated air, which is the surrounding air itself: leave it out',
      });
    }
    if (gas.relativeHumidity !== 0) {
      context.addIssue({
        code: 'custom',
        path: ['relativeHumidity'],
        message: 'is the surrounding air’s for heated air (set the air’s humidity): leave it out',
      });
    }
  })
  .meta({ description: 'Lifting gas' });

export type GasInput = z.output<typeof gasSchema>;
