import * as z from 'zod';
import { TEMPERATURE_OFFSET_RANGE_K } from '../atmosphere/standard-atmosphere.js';
import { Derivation } from '../derivation.js';
import { deriveAscent } from '../flight/ascent-steps.js';
import { deriveDescent } from '../flight/descent-steps.js';
import { deriveDrift } from '../flight/drift-steps.js';
import { chooseFlightAir, noteAirAboveProfile } from '../flight/flight-air.js';
import { pathOf } from '../flight/flight-path.js';
import { deriveLaunch } from '../flight/launch-steps.js';
import { deriveStopAltitudeM } from '../flight/stop-altitude-steps.js';
import { GAS_IDS, type GasId } from '../gas/gas-catalogue.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import { gasChoice } from '../schema/choice-schema.js';
import { envelopeSchema } from '../schema/envelope-schema.js';
import { fraction, quantity } from '../schema/quantity-schema.js';
import { defineKind } from './kind.js';
import {
  DEFAULT_BALLOON_DRAG_COEFFICIENT,
  DEFAULT_PARACHUTE_DRAG_COEFFICIENT,
} from '../flight/drag-defaults.js';
import {
  launchLatitudeSchema,
  launchLongitudeSchema,
  launchTimeSchema,
  requireBothCoordinates,
} from '../flight/launch-site-schema.js';
import { landingAreaSettingsSchema } from '../landing/landing-spreads.js';
import { usually } from '../schema/usual-range.js';
import { windProfileSchema } from '../wind/wind-profile-schema.js';
import { USUAL } from '../schema/usual-ranges.js';

export const flightProfileSchema = z
  .object({
    envelope: z.discriminatedUnion('kind', [
      z
        .object({
          kind: z.literal('extensible'),
          launchDiameterM: quantity('length', 0.1, 20, 'diameter when filled, at launch'),
          burstDiameterM: quantity(
            'length',
            0.2,
            50,
            'diameter at which the envelope bursts (from its maker)',
          ),
        })
        .strict(),
      z.object({ kind: z.literal('fixed'), shape: envelopeSchema }).strict(),
    ]),
    envelopeMassKg: quantity('mass', 0, 1000, 'envelope mass'),
    payloadMassKg: usually(
      quantity('mass', 0, 1000, 'payload, parachute and line'),
      USUAL.payloadMassKg,
    ),
    gas: z
      .object({
        gasId: gasChoice(
          GAS_IDS.filter((id): id is Exclude<GasId, 'hot-air'> => id !== 'hot-air'),
          'lifting gas',
        ),
        purity: usually(
          fraction('mole fraction of the named gas; the rest is air', MIN_PURITY, 1),
          USUAL.gasPurity,
        ).default(1),
      })
      .strict(),
    launch: z
      .object({
        altitudeM: quantity('length', -500, 6000, 'launch site altitude above mean sea level'),
        temperatureOffsetK: quantity(
          'temperatureDifference',
          TEMPERATURE_OFFSET_RANGE_K.min,
          TEMPERATURE_OFFSET_RANGE_K.max,
          'day warmer (+) or colder (−) than the 1976 standard',
        ).default(0),
        latitudeDeg: launchLatitudeSchema,
        longitudeDeg: launchLongitudeSchema,
        time: launchTimeSchema,
      })
      .strict()
      .superRefine(requireBothCoordinates),
    dragCoefficient: quantity(
      'coefficient',
      0.05,
      2,
      'drag coefficient of the envelope on its frontal area',
    ).default(DEFAULT_BALLOON_DRAG_COEFFICIENT),
    parachute: z
      .object({
        areaM2: quantity('area', 0.01, 200, 'canopy area'),
        dragCoefficient: quantity(
          'coefficient',
          0.2,
          3,
          'drag coefficient on the canopy area',
        ).default(DEFAULT_PARACHUTE_DRAG_COEFFICIENT),
        envelopeRemnantMassKg: quantity(
          'mass',
          0,
          1000,
          'part of the envelope still on the line after burst (default: all of it)',
        ).optional(),
      })
      .strict()
      .optional(),
    wind: windProfileSchema
      .meta({
        description:
          'Winds aloft by level (and temperatures, if known): the drift, landing point and landing area',
      })
      .optional(),
    landingArea: landingAreaSettingsSchema.optional(),
    timeStepS: quantity('time', 0.05, 30, 'integration time step').default(1),
    maxTimeS: quantity('time', 60, 172800, 'longest flight time computed').default(43200),
  })
  .strict()
  .superRefine((inputs, context) => {
    const remnantKg = inputs.parachute?.envelopeRemnantMassKg;
    if (remnantKg !== undefined && remnantKg > inputs.envelopeMassKg) {
      context.addIssue({
        code: 'custom',
        path: ['parachute', 'envelopeRemnantMassKg'],
        message: `must not be more than the envelope mass (${inputs.envelopeMassKg} kg)`,
      });
    }
  });

export type FlightProfileInput = z.input<typeof flightProfileSchema>;
/** The inputs as the kind reads them, defaults filled in. */
export type FlightProfileValues = z.output<typeof flightProfileSchema>;

export const flightProfileKind = defineKind({
  id: 'flight-profile',
  capabilities: {
    charts: ['drift-track'],
    // The gas the envelope holds at launch: what a gas plan fills (the design chain).
    volumeOutput: 'launchVolume',
    predictsFillLift: false,
    meterImport: false,
    landingArea: true,
    fillCard: true,
  },
  title: 'Flight profile',
  description:
    'Ascent of a free balloon in the 1976 standard atmosphere (or the air of a wind profile with temperatures): for a stretching (latex-like) envelope the burst altitude and time, ascent rate and diameter on the way, and the descent under a parachute; for a fixed-volume envelope the float altitude and the superpressure there. With winds aloft, the drift to burst and landing, and a landing area from repeated flights with varied inputs.',
  schema: flightProfileSchema,
  example: {
    envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
    envelopeMassKg: 0.6,
    payloadMassKg: 0.9,
    gas: { gasId: 'helium' },
    launch: { altitudeM: 120 },
    parachute: { areaM2: 0.8 },
  },
  compute(inputs) {
    const d = new Derivation();
    const air = chooseFlightAir(d, inputs);
    const launch = deriveLaunch(d, inputs, air);
    d.output(
      'launchVolume',
      'Envelope volume at launch (gas at launch conditions)',
      'volume',
      launch.air.context,
    );
    if (launch.ascentRateMS <= 0) {
      d.warn({
        code: 'no-ascent',
        severity: 'warning',
        message: 'Free lift at launch is not positive: the balloon will not rise.',
        field: 'payloadMassKg',
      });
      return d.result();
    }
    const stopAltitudeM = deriveStopAltitudeM(d, inputs, launch);
    const ascent = deriveAscent(d, inputs, launch.model, stopAltitudeM);
    const descent =
      ascent.end === 'burst' ? deriveDescent(d, inputs, ascent, launch.air, air.model) : undefined;
    noteAirAboveProfile(d, air, ascent.endAltitudeM);
    if (air.wind) deriveDrift(d, inputs, pathOf(ascent, descent), air.wind);
    return d.result();
  },
});
