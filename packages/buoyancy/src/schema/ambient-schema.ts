import * as z from 'zod';
import { AIR_PRESSURE_RANGE_PA, AIR_TEMPERATURE_RANGE_K } from '../atmosphere/air-density.js';
import {
  STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M,
  TEMPERATURE_OFFSET_RANGE_K,
} from '../atmosphere/standard-atmosphere.js';
import { fraction, quantity } from './quantity-schema.js';
import { usually } from './usual-range.js';
import { USUAL } from './usual-ranges.js';

export const humiditySchema = z
  .discriminatedUnion('kind', [
    z.object({ kind: z.literal('dry') }).strict(),
    z
      .object({
        kind: z.literal('relative'),
        relativeHumidity: fraction('relative humidity over liquid water'),
      })
      .strict(),
    z
      .object({
        kind: z.literal('dewPoint'),
        dewPointK: quantity(
          'temperature',
          233.15,
          AIR_TEMPERATURE_RANGE_K.max,
          'dew-point temperature',
        ),
      })
      .strict(),
  ])
  .default({ kind: 'dry' })
  .meta({ description: 'Water vapour in the air: dry, a relative humidity, or a dew point' });

/** The air around the envelope: the standard atmosphere at an altitude, or measured values. */
export const ambientSchema = z
  .discriminatedUnion('mode', [
    z
      .object({
        mode: z.literal('standard'),
        altitudeM: quantity(
          'length',
          STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.min,
          STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max,
          'geometric altitude above mean sea level',
        ),
        temperatureOffsetK: quantity(
          'temperatureDifference',
          TEMPERATURE_OFFSET_RANGE_K.min,
          TEMPERATURE_OFFSET_RANGE_K.max,
          'difference from the standard temperature (ISA + ΔT)',
        ).default(0),
        humidity: humiditySchema,
      })
      .strict(),
    z
      .object({
        mode: z.literal('measured'),
        temperatureK: usually(
          quantity(
            'temperature',
            AIR_TEMPERATURE_RANGE_K.min,
            AIR_TEMPERATURE_RANGE_K.max,
            'air temperature',
          ),
          USUAL.fillAirTemperatureK,
        ),
        pressurePa: usually(
          quantity(
            'pressure',
            AIR_PRESSURE_RANGE_PA.min,
            AIR_PRESSURE_RANGE_PA.max,
            'absolute air pressure',
          ),
          USUAL.fillAirPressurePa,
        ),
        humidity: humiditySchema,
      })
      .strict(),
  ])
  .meta({ description: 'Ambient air' });

export type AmbientInput = z.output<typeof ambientSchema>;
