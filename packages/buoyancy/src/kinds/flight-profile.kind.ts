import * as z from 'zod';
import {
  STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M,
  standardAtmosphere,
  TEMPERATURE_OFFSET_RANGE_K,
} from '../atmosphere/standard-atmosphere.js';
import { MOLAR_GAS_CONSTANT_J_PER_MOL_K } from '../constants.js';
import { Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import {
  ascentState,
  descentRateMS,
  integrateAscent,
  integrateDescent,
  type AscentModel,
} from '../flight/ascent-model.js';
import { GAS_IDS, type GasId } from '../gas/gas-catalogue.js';
import { MIN_PURITY } from '../gas/lifting-gas-density.js';
import { findRoot } from '../numerics/find-root.js';
import { gasChoice } from '../schema/choice-schema.js';
import { envelopeSchema } from '../schema/envelope-schema.js';
import { fraction, quantity } from '../schema/quantity-schema.js';
import { deriveAmbient } from '../steps/ambient-steps.js';
import { deriveGas } from '../steps/gas-steps.js';
import { deriveGeometry } from '../steps/geometry-steps.js';
import { deriveLift } from '../steps/lift-steps.js';
import { defineKind } from './kind.js';
import {
  DEFAULT_BALLOON_DRAG_COEFFICIENT,
  DEFAULT_PARACHUTE_DRAG_COEFFICIENT,
} from '../flight/drag-defaults.js';
import { usually } from '../schema/usual-range.js';
import { USUAL } from '../schema/usual-ranges.js';

/** Rows kept in a profile series; longer integrations are thinned evenly (end points kept). */
const MAX_SERIES_ROWS = 600;

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
      })
      .strict(),
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
      })
      .strict()
      .optional(),
    timeStepS: quantity('time', 0.05, 30, 'integration time step').default(1),
    maxTimeS: quantity('time', 60, 172800, 'longest flight time computed').default(43200),
  })
  .strict();

export type FlightProfileInput = z.input<typeof flightProfileSchema>;

function thin<T>(rows: readonly T[]): T[] {
  if (rows.length <= MAX_SERIES_ROWS) return [...rows];
  const stride = (rows.length - 1) / (MAX_SERIES_ROWS - 1);
  return Array.from(
    { length: MAX_SERIES_ROWS },
    (_, index) => rows[Math.round(index * stride)] as T,
  );
}

export const flightProfileKind = defineKind({
  id: 'flight-profile',
  title: 'Flight profile',
  description:
    'Ascent of a free balloon in the 1976 standard atmosphere: for a stretching (latex-like) envelope the burst altitude and time, ascent rate and diameter on the way, and the descent under a parachute; for a fixed-volume envelope the float altitude and the superpressure there.',
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
    const offsetK = inputs.launch.temperatureOffsetK;
    const air = deriveAmbient(d, {
      mode: 'standard',
      altitudeM: inputs.launch.altitudeM,
      temperatureOffsetK: offsetK,
      humidity: { kind: 'dry' },
    });
    const gas = deriveGas(
      d,
      {
        gasId: inputs.gas.gasId,
        purity: inputs.gas.purity,
        superheatK: 0,
        superpressurePa: 0,
        relativeHumidity: 0,
      },
      air,
    );
    const launchShape =
      inputs.envelope.kind === 'extensible'
        ? { shape: 'sphere' as const, diameterM: inputs.envelope.launchDiameterM }
        : inputs.envelope.shape;
    const geometry = deriveGeometry(d, launchShape);
    const gasMol = d.step({
      id: 'gas-amount',
      label: 'Amount of gas in the envelope (constant in flight)',
      formula: 'n = p·V / (R·T)',
      values: [
        v('p', air.pressurePa, 'Pa'),
        v('V', geometry.volumeM3, 'm³'),
        v('R', MOLAR_GAS_CONSTANT_J_PER_MOL_K, 'J/(mol·K)'),
        v('T', air.temperatureK, 'K'),
      ],
      result: v(
        'n',
        (air.pressurePa * geometry.volumeM3) / (MOLAR_GAS_CONSTANT_J_PER_MOL_K * air.temperatureK),
        'mol',
      ),
      source: 'ideal-gas law',
    });
    const lift = deriveLift(
      d,
      geometry.volumeM3,
      air.densityKgM3,
      gas.densityKgM3,
      inputs.envelopeMassKg,
      inputs.payloadMassKg,
    );
    const model: AscentModel = {
      temperatureOffsetK: offsetK,
      gasMol,
      gasMolarMassKgPerMol: gas.molarMassKgPerMol,
      carriedMassKg: inputs.envelopeMassKg + inputs.payloadMassKg,
      envelope:
        inputs.envelope.kind === 'extensible'
          ? { kind: 'extensible', burstDiameterM: inputs.envelope.burstDiameterM }
          : { kind: 'fixed', volumeM3: geometry.volumeM3, frontalAreaM2: geometry.frontalAreaM2 },
      dragCoefficient: inputs.dragCoefficient,
    };
    const launchRate = d.step({
      id: 'launch-ascent-rate',
      label: 'Ascent rate at launch (drag balances free lift)',
      formula: 'w = √(2·L_free·g / (ρ_air·C_d·A))',
      values: [
        v('L_free', lift.freeLiftKg, 'kg'),
        v('g', standardAtmosphere(inputs.launch.altitudeM).gravityMS2, 'm/s²'),
        v('ρ_air', air.densityKgM3, 'kg/m³'),
        v('C_d', inputs.dragCoefficient, ''),
        v('A', geometry.frontalAreaM2, 'm²'),
      ],
      result: v('w', ascentState(model, inputs.launch.altitudeM).ascentRateMS, 'm/s'),
      source: 'terminal velocity: drag ½·ρ·w²·C_d·A equal to the free lift force',
    });
    d.output('freeLift', 'Free lift at launch', 'free-lift', air.context);
    d.output('launchAscentRate', 'Ascent rate at launch', 'launch-ascent-rate', air.context);
    d.warn({
      code: 'free-balloon-rules',
      severity: 'caution',
      message:
        'A free balloon is an aircraft in most countries: check the payload against the rules (Balloon rules check) and notify the aviation authority as it requires before launch.',
    });
    if (launchRate <= 0) {
      d.warn({
        code: 'no-ascent',
        severity: 'warning',
        message: 'Free lift at launch is not positive: the balloon will not rise.',
        field: 'payloadMassKg',
      });
      return d.result();
    }

    const ceilingM = STANDARD_ATMOSPHERE_ALTITUDE_RANGE_M.max;
    let stopAltitudeM: number;
    if (model.envelope.kind === 'extensible') {
      const burstDiameterM = model.envelope.burstDiameterM;
      if (
        burstDiameterM <=
        (inputs.envelope.kind === 'extensible' ? inputs.envelope.launchDiameterM : 0)
      ) {
        throw new InputError(
          'envelope.burstDiameterM',
          burstDiameterM,
          'must be larger than the launch diameter',
        );
      }
      const burstVolumeM3 = d.step({
        id: 'burst-volume',
        label: 'Volume at burst',
        formula: 'V_b = π·d_b³ / 6',
        values: [v('d_b', burstDiameterM, 'm')],
        result: v('V_b', (Math.PI * burstDiameterM ** 3) / 6, 'm³'),
        source: 'sphere',
      });
      const volumeAt = (altitudeM: number) =>
        ascentState(model, altitudeM).volumeM3 - burstVolumeM3;
      stopAltitudeM =
        volumeAt(ceilingM) < 0
          ? Number.POSITIVE_INFINITY
          : findRoot(volumeAt, inputs.launch.altitudeM, ceilingM, { xTolerance: 1e-6 });
      if (Number.isFinite(stopAltitudeM)) {
        d.step({
          id: 'burst-altitude',
          label: 'Burst altitude (the gas has expanded to the burst volume)',
          formula: 'n·R·T(z) / p(z) = V_b',
          values: [v('n', gasMol, 'mol'), v('V_b', burstVolumeM3, 'm³')],
          result: v('z_b', stopAltitudeM, 'm'),
          source:
            'ideal gas at ambient temperature and pressure in the U.S. Standard Atmosphere 1976 (zero pressure difference across the envelope)',
        });
        d.output('burstAltitude', 'Burst altitude', 'burst-altitude');
      } else {
        d.warn({
          code: 'no-burst-below-ceiling',
          severity: 'warning',
          message: `The envelope would still be smaller than its burst diameter at ${ceilingM / 1000} km, the top of the atmosphere model.`,
          field: 'envelope.burstDiameterM',
        });
      }
    } else {
      const totalMassKg = model.carriedMassKg + gasMol * model.gasMolarMassKgPerMol;
      const floatDensity = d.step({
        id: 'float-density',
        label: 'Air density at which the balloon floats',
        formula: 'ρ_f = (m_gas + m_env + m_payload) / V',
        values: [
          v('m_gas', gasMol * model.gasMolarMassKgPerMol, 'kg'),
          v('m_env', inputs.envelopeMassKg, 'kg'),
          v('m_payload', inputs.payloadMassKg, 'kg'),
          v('V', geometry.volumeM3, 'm³'),
        ],
        result: v('ρ_f', totalMassKg / geometry.volumeM3, 'kg/m³'),
        source: "Archimedes' principle at neutral buoyancy",
      });
      const densityAt = (altitudeM: number) =>
        standardAtmosphere(altitudeM, { temperatureOffsetK: offsetK }).densityKgM3 - floatDensity;
      stopAltitudeM =
        densityAt(ceilingM) > 0
          ? Number.POSITIVE_INFINITY
          : findRoot(densityAt, inputs.launch.altitudeM, ceilingM, { xTolerance: 1e-6 });
      if (Number.isFinite(stopAltitudeM)) {
        const floatAir = standardAtmosphere(stopAltitudeM, { temperatureOffsetK: offsetK });
        d.step({
          id: 'float-altitude',
          label: 'Float altitude (neutral buoyancy)',
          formula: 'ρ_air(z_f) = ρ_f',
          values: [v('ρ_f', floatDensity, 'kg/m³')],
          result: v('z_f', stopAltitudeM, 'm'),
          source: 'U.S. Standard Atmosphere, 1976, density profile',
        });
        d.step({
          id: 'float-superpressure',
          label: 'Superpressure at float (gas above the air)',
          formula: 'Δp = n·R·T_f / V − p_f',
          values: [
            v('n', gasMol, 'mol'),
            v('T_f', floatAir.temperatureK, 'K'),
            v('V', geometry.volumeM3, 'm³'),
            v('p_f', floatAir.pressurePa, 'Pa'),
          ],
          result: v(
            'Δp',
            (gasMol * MOLAR_GAS_CONSTANT_J_PER_MOL_K * floatAir.temperatureK) / geometry.volumeM3 -
              floatAir.pressurePa,
            'Pa',
          ),
          source: 'ideal-gas law, gas at the air temperature',
        });
        d.output('floatAltitude', 'Float altitude', 'float-altitude');
        d.output('floatSuperpressure', 'Superpressure at float', 'float-superpressure');
      } else {
        d.warn({
          code: 'no-float-below-ceiling',
          severity: 'warning',
          message: `The balloon would still be rising at ${ceilingM / 1000} km, the top of the atmosphere model.`,
        });
      }
    }

    const ascent = integrateAscent(
      model,
      inputs.launch.altitudeM,
      stopAltitudeM,
      inputs.timeStepS,
      inputs.maxTimeS,
    );
    const lastRate = ascent.points.at(-1)?.ascentRateMS ?? 0;
    if (ascent.end === 'time-limit') {
      d.warn({
        code: 'time-limit',
        severity: 'warning',
        message: `The flight had not ended after ${inputs.maxTimeS} s, the longest time computed.`,
        field: 'maxTimeS',
      });
    }
    d.step({
      id: 'ascent-time',
      label:
        ascent.end === 'burst'
          ? 'Time to burst'
          : ascent.end === 'float'
            ? 'Time to reach float'
            : 'Time of the ascent computed',
      formula: 't = ∫ dz / w(z)  (Runge–Kutta, 4th order)',
      values: [
        v('Δt', inputs.timeStepS, 's'),
        v('z_0', inputs.launch.altitudeM, 'm'),
        v('z_end', ascent.endAltitudeM, 'm'),
      ],
      result: v('t', ascent.endTimeS, 's'),
      source: 'classical fourth-order Runge–Kutta integration of the terminal-velocity ascent',
    });
    d.step({
      id: 'end-ascent-rate',
      label:
        ascent.end === 'burst' ? 'Ascent rate at burst' : 'Ascent rate at the end of the ascent',
      formula: 'w = √(2·L_free·g / (ρ_air·C_d·A))',
      values: [],
      result: v('w', lastRate, 'm/s'),
      source: 'terminal velocity',
    });
    d.output(
      'ascentTime',
      ascent.end === 'burst' ? 'Time to burst' : 'Time to float',
      'ascent-time',
    );
    d.output(
      'endAscentRate',
      ascent.end === 'burst' ? 'Ascent rate at burst' : 'Ascent rate at the end',
      'end-ascent-rate',
    );
    d.addSeries('ascent', {
      label: 'Ascent',
      columns: [
        { key: 'time', label: 'Time', unit: 's' },
        { key: 'altitude', label: 'Altitude', unit: 'm' },
        { key: 'ascentRate', label: 'Ascent rate', unit: 'm/s' },
        { key: 'diameter', label: 'Diameter', unit: 'm' },
        { key: 'freeLift', label: 'Free lift', unit: 'kg' },
      ],
      rows: thin(ascent.points).map((p) => [
        p.timeS,
        p.altitudeM,
        p.ascentRateMS,
        p.diameterM,
        p.freeLiftKg,
      ]),
    });

    if (ascent.end === 'burst') {
      if (!inputs.parachute) {
        d.warn({
          code: 'no-parachute',
          severity: 'caution',
          message:
            'No parachute given: the payload falls freely after burst. Fly a recovery system as the rules where you launch require.',
          field: 'parachute',
        });
      } else {
        const p = inputs.parachute;
        const descentMassKg = d.step({
          id: 'descent-mass',
          label: 'Mass under the parachute (payload and envelope remnant)',
          formula: 'm_d = m_payload + m_env',
          values: [
            v('m_payload', inputs.payloadMassKg, 'kg'),
            v('m_env', inputs.envelopeMassKg, 'kg'),
          ],
          result: v('m_d', inputs.payloadMassKg + inputs.envelopeMassKg, 'kg'),
          source: 'the burst envelope usually stays on the line',
        });
        const descent = integrateDescent(
          descentMassKg,
          p.areaM2,
          p.dragCoefficient,
          ascent.endAltitudeM,
          inputs.launch.altitudeM,
          offsetK,
          inputs.timeStepS,
        );
        d.step({
          id: 'landing-descent-rate',
          label: 'Descent rate at landing',
          formula: 'w_d = √(2·m_d·g / (ρ_air·C_d,p·A_p))',
          values: [
            v('m_d', descentMassKg, 'kg'),
            v('C_d,p', p.dragCoefficient, ''),
            v('A_p', p.areaM2, 'm²'),
            v('ρ_air', air.densityKgM3, 'kg/m³'),
          ],
          result: v(
            'w_d',
            descentRateMS(
              descentMassKg,
              p.areaM2,
              p.dragCoefficient,
              inputs.launch.altitudeM,
              offsetK,
            ),
            'm/s',
          ),
          source: 'terminal velocity under the canopy',
        });
        d.step({
          id: 'descent-time',
          label: 'Descent time from burst to the ground',
          formula: 't_d = ∫ dz / w_d(z)  (Runge–Kutta, 4th order)',
          values: [v('z_b', ascent.endAltitudeM, 'm'), v('z_ground', inputs.launch.altitudeM, 'm')],
          result: v('t_d', descent.durationS, 's'),
          source: 'classical fourth-order Runge–Kutta integration',
        });
        d.step({
          id: 'flight-time',
          label: 'Whole flight',
          formula: 't_flight = t + t_d',
          values: [v('t', ascent.endTimeS, 's'), v('t_d', descent.durationS, 's')],
          result: v('t_flight', ascent.endTimeS + descent.durationS, 's'),
          source: 'ascent time plus descent time',
        });
        d.output('landingDescentRate', 'Descent rate at landing', 'landing-descent-rate');
        d.output('descentTime', 'Descent time', 'descent-time');
        d.output('flightTime', 'Whole flight', 'flight-time');
        d.addSeries('descent', {
          label: 'Descent',
          columns: [
            { key: 'time', label: 'Time since launch', unit: 's' },
            { key: 'altitude', label: 'Altitude', unit: 'm' },
            { key: 'ascentRate', label: 'Vertical rate', unit: 'm/s' },
          ],
          rows: thin(descent.points).map((pt) => [
            ascent.endTimeS + pt.timeS,
            pt.altitudeM,
            pt.rateMS,
          ]),
        });
      }
    }
    return d.result();
  },
});
