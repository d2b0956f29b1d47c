import { type Derivation, v } from '../derivation.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import type { AmbientState } from '../steps/ambient-steps.js';
import type { AirModel } from './air-model.js';
import { type AscentResult, descentRateMS, integrateDescent } from './ascent-model.js';
import { thinRows } from './series-thinning.js';

type Parachute = NonNullable<FlightProfileValues['parachute']>;

/**
 * After burst: the fall under the parachute (landing rate, descent and whole flight time, the
 * `descent` series), or a caution when there is none.
 */
export function deriveDescent(
  d: Derivation,
  inputs: FlightProfileValues,
  ascent: AscentResult,
  launchAir: AmbientState,
  air: AirModel,
): DescentResult | undefined {
  if (!inputs.parachute) {
    d.warn({
      code: 'no-parachute',
      severity: 'caution',
      message:
        'No parachute given: the payload falls freely after burst. Fly a recovery system as the rules where you launch require.',
      field: 'parachute',
    });
    return undefined;
  }
  const parachute = inputs.parachute;
  const descentMassKg = deriveDescentMassKg(d, inputs, parachute);
  const descent = integrateDescent(
    descentMassKg,
    parachute.areaM2,
    parachute.dragCoefficient,
    ascent.endAltitudeM,
    inputs.launch.altitudeM,
    air,
    inputs.timeStepS,
  );
  deriveLandingRateMS(d, inputs, parachute, descentMassKg, launchAir, air);
  deriveFlightTimes(d, inputs, ascent, descent.durationS);
  d.addSeries('descent', {
    label: 'Descent',
    columns: [
      { key: 'time', label: 'Time since launch', unit: 's' },
      { key: 'altitude', label: 'Altitude', unit: 'm' },
      { key: 'ascentRate', label: 'Vertical rate', unit: 'm/s' },
    ],
    rows: thinRows(descent.points).map((pt) => [
      ascent.endTimeS + pt.timeS,
      pt.altitudeM,
      pt.rateMS,
    ]),
  });
  return descent;
}

type DescentResult = ReturnType<typeof integrateDescent>;

/**
 * Mass hanging under the canopy: the payload and what is left of the envelope, all of it unless
 * the inputs give the remnant.
 */
function deriveDescentMassKg(
  d: Derivation,
  inputs: FlightProfileValues,
  parachute: Parachute,
): number {
  const remnantKg = parachute.envelopeRemnantMassKg;
  if (remnantKg === undefined) {
    return d.step({
      id: 'descent-mass',
      label: 'Mass under the parachute (payload and envelope remnant)',
      formula: 'm_d = m_payload + m_env',
      values: [v('m_payload', inputs.payloadMassKg, 'kg'), v('m_env', inputs.envelopeMassKg, 'kg')],
      result: v('m_d', inputs.payloadMassKg + inputs.envelopeMassKg, 'kg'),
      source: 'the burst envelope usually stays on the line',
    });
  }
  return d.step({
    id: 'descent-mass',
    label: 'Mass under the parachute (payload and the envelope remnant given)',
    formula: 'm_d = m_payload + m_remnant',
    values: [v('m_payload', inputs.payloadMassKg, 'kg'), v('m_remnant', remnantKg, 'kg')],
    result: v('m_d', inputs.payloadMassKg + remnantKg, 'kg'),
    source: 'input, as entered: the part of the envelope still on the line after burst',
  });
}

/** Terminal rate of fall under the canopy at the launch site's altitude [m/s]. */
function deriveLandingRateMS(
  d: Derivation,
  inputs: FlightProfileValues,
  parachute: Parachute,
  descentMassKg: number,
  launchAir: AmbientState,
  air: AirModel,
): number {
  return d.step({
    id: 'landing-descent-rate',
    label: 'Descent rate at landing',
    formula: 'w_d = √(2·m_d·g / (ρ_air·C_d,p·A_p))',
    values: [
      v('m_d', descentMassKg, 'kg'),
      v('C_d,p', parachute.dragCoefficient, ''),
      v('A_p', parachute.areaM2, 'm²'),
      v('ρ_air', launchAir.densityKgM3, 'kg/m³'),
    ],
    result: v(
      'w_d',
      descentRateMS(
        descentMassKg,
        parachute.areaM2,
        parachute.dragCoefficient,
        inputs.launch.altitudeM,
        air,
      ),
      'm/s',
    ),
    source: 'terminal velocity under the canopy',
  });
}

/** Descent time and whole flight time [s]; publishes them with the landing rate. */
function deriveFlightTimes(
  d: Derivation,
  inputs: FlightProfileValues,
  ascent: AscentResult,
  descentS: number,
): void {
  d.step({
    id: 'descent-time',
    label: 'Descent time from burst to the ground',
    formula: 't_d = ∫ dz / w_d(z)  (Runge–Kutta, 4th order)',
    values: [v('z_b', ascent.endAltitudeM, 'm'), v('z_ground', inputs.launch.altitudeM, 'm')],
    result: v('t_d', descentS, 's'),
    source: 'classical fourth-order Runge–Kutta integration',
  });
  d.step({
    id: 'flight-time',
    label: 'Whole flight',
    formula: 't_flight = t + t_d',
    values: [v('t', ascent.endTimeS, 's'), v('t_d', descentS, 's')],
    result: v('t_flight', ascent.endTimeS + descentS, 's'),
    source: 'ascent time plus descent time',
  });
  d.output('landingDescentRate', 'Descent rate at landing', 'landing-descent-rate');
  d.output('descentTime', 'Descent time', 'descent-time');
  d.output('flightTime', 'Whole flight', 'flight-time');
}
