import { type Derivation, v } from '../derivation.js';
import { fitLiftRetention } from './lift-retention.js';
import type { TimedLift } from './measured-lift-steps.js';

/**
 * Loss rate of lift over two or more readings (exponential fit) and its half-life, or a note
 * when the readings do not fall; publishes both.
 */
export function deriveLiftRetention(d: Derivation, series: readonly TimedLift[]): void {
  const fit = fitLiftRetention(series);
  d.step({
    id: 'loss-rate',
    label: 'Loss rate of lift (exponential fit)',
    formula: 'ln L = ln L₀ − k·t (least squares)',
    values: series.map((reading, index) =>
      v(`L(t${index + 1} = ${reading.timeS} s)`, reading.netLiftKg, 'kg'),
    ),
    result: v('k', fit.lossRatePerS * 86400 * 100, '%/day'),
    source: 'least-squares fit of ln L against t (exponential decay)',
  });
  if (Number.isFinite(fit.halfLifeS)) {
    d.step({
      id: 'half-life',
      label: 'Half-life of lift',
      formula: 't½ = ln 2 / k',
      values: [v('k', fit.lossRatePerS, '1/s')],
      result: v('t½', fit.halfLifeS / 86400, 'days'),
      source: 'exponential decay',
    });
    d.output('halfLife', 'Half-life of lift', 'half-life');
  } else {
    d.warn({
      code: 'lift-not-falling',
      severity: 'note',
      message: 'The readings do not fall over time, so no half-life can be given.',
      field: 'readings',
    });
  }
  d.output('lossRate', 'Loss rate of lift', 'loss-rate');
}
