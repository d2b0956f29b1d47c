import { type Derivation, v } from '../derivation.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import { type AscentModel, type AscentResult, integrateAscent } from './ascent-model.js';
import { thinRows } from './series-thinning.js';

/**
 * The ascent integrated from launch to burst, float or the time limit: its duration and final
 * rate as steps and outputs, and the profile as the `ascent` series.
 */
export function deriveAscent(
  d: Derivation,
  inputs: FlightProfileValues,
  model: AscentModel,
  stopAltitudeM: number,
): AscentResult {
  const ascent = integrateAscent(
    model,
    inputs.launch.altitudeM,
    stopAltitudeM,
    inputs.timeStepS,
    inputs.maxTimeS,
  );
  if (ascent.end === 'time-limit') {
    d.warn({
      code: 'time-limit',
      severity: 'warning',
      message: `The flight had not ended after ${inputs.maxTimeS} s, the longest time computed.`,
      field: 'maxTimeS',
    });
  }
  deriveAscentTimeS(d, inputs, ascent);
  d.step({
    id: 'end-ascent-rate',
    label: ascent.end === 'burst' ? 'Ascent rate at burst' : 'Ascent rate at the end of the ascent',
    formula: 'w = √(2·L_free·g / (ρ_air·C_d·A))',
    values: [],
    result: v('w', ascent.points.at(-1)?.ascentRateMS ?? 0, 'm/s'),
    source: 'terminal velocity',
  });
  d.output('ascentTime', ascent.end === 'burst' ? 'Time to burst' : 'Time to float', 'ascent-time');
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
    rows: thinRows(ascent.points).map((p) => [
      p.timeS,
      p.altitudeM,
      p.ascentRateMS,
      p.diameterM,
      p.freeLiftKg,
    ]),
  });
  return ascent;
}

/** Time from launch to the end of the ascent, t = ∫ dz / w(z) [s]. */
function deriveAscentTimeS(
  d: Derivation,
  inputs: FlightProfileValues,
  ascent: AscentResult,
): number {
  return d.step({
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
}
