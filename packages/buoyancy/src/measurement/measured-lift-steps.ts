import { type Derivation, v } from '../derivation.js';
import type { LiftMeasurementValues } from '../kinds/lift-measurement.kind.js';

type Reading = LiftMeasurementValues['readings'][number];

/** One measured net lift and when it was read. */
export interface TimedLift {
  readonly timeS: number;
  readonly netLiftKg: number;
}

/** The net lift of every reading, one step each; publishes the first as the measured net lift. */
export function deriveMeasuredLifts(d: Derivation, readings: readonly Reading[]): TimedLift[] {
  const series = readings.map((reading, index) => ({
    timeS: reading.timeS,
    netLiftKg: deriveMeasuredNetLiftKg(d, reading, index, readings.length),
  }));
  d.output('measuredNetLift', 'Measured net lift', 'measured-net-lift');
  return series;
}

/** Net lift of one reading: ballast less scale, or read directly [kg]. */
function deriveMeasuredNetLiftKg(
  d: Derivation,
  reading: Reading,
  index: number,
  readingCount: number,
): number {
  const suffix = readingCount > 1 ? ` (reading ${index + 1})` : '';
  const id = index === 0 ? 'measured-net-lift' : `measured-net-lift-${index + 1}`;
  if (reading.kind === 'ballast') {
    return d.step({
      id,
      label: `Measured net lift${suffix}`,
      formula: 'L_net,measured = m_ballast − m_scale',
      values: [
        v('m_ballast', reading.ballastMassKg, 'kg'),
        v('m_scale', reading.scaleReadingKg, 'kg'),
      ],
      result: v('L_net,measured', reading.ballastMassKg - reading.scaleReadingKg, 'kg'),
      source:
        'force balance on the tethered ballast: the scale carries the ballast less the net lift',
    });
  }
  return d.step({
    id,
    label: `Measured net lift${suffix}`,
    formula: 'L_net,measured = reading',
    values: [],
    result: v('L_net,measured', reading.netLiftKg, 'kg'),
    source: 'measured value, as entered',
  });
}

const SQRT3 = Math.sqrt(3);

/**
 * Expanded uncertainty of the measured net lift, k = 2 (about 95 %), after the GUM (JCGM
 * 100:2008): a scale's resolution δ as a rectangular distribution of half-width δ/2, u = δ/(2√3)
 * (F.2.2.1); a ballast's tolerance ±a likewise, u = a/√3 (4.3.7); combined in quadrature (5.1.2).
 * Publishes it as the measured uncertainty [kg].
 */
export function deriveLiftUncertaintyKg(
  d: Derivation,
  instrument: { scaleResolutionKg: number; ballastToleranceKg: number },
  readingKind: 'ballast' | 'direct' | undefined,
): number {
  const uScaleKg = instrument.scaleResolutionKg / (2 * SQRT3);
  const uBallastKg = readingKind === 'ballast' ? instrument.ballastToleranceKg / SQRT3 : 0;
  const uncertaintyKg = d.step({
    id: 'lift-uncertainty',
    label: 'Uncertainty of the measured lift (k = 2, about 95 %)',
    formula: readingKind === 'ballast' ? 'U = 2·√((δ/(2√3))² + (a/√3)²)' : 'U = 2·δ/(2√3)',
    values: [
      v('δ', instrument.scaleResolutionKg, 'kg'),
      ...(readingKind === 'ballast' ? [v('a', instrument.ballastToleranceKg, 'kg')] : []),
    ],
    result: v('U', 2 * Math.hypot(uScaleKg, uBallastKg), 'kg'),
    source: 'GUM (JCGM 100:2008) 4.3.7, 5.1.2 and F.2.2.1: rectangular distributions, k = 2',
  });
  d.output('measuredUncertainty', 'Uncertainty of the measured lift (k = 2)', 'lift-uncertainty');
  return uncertaintyKg;
}
