import { InputError, type InputIssue } from '../errors.js';

/** A meter log: each sample's time [s] and either the power then [W] or the energy so far [J]. */
export type MeterLog =
  | { kind: 'power'; samples: readonly { timeS: number; powerW: number }[] }
  | { kind: 'cumulative'; samples: readonly { timeS: number; energyJ: number }[] };

export interface MeterEnergy {
  energyJ: number;
  durationS: number;
  meanPowerW: number;
  samples: number;
}

/**
 * Energy used over a meter log. Power samples are integrated with the trapezoidal rule (exact for
 * power that changes linearly between samples); a cumulative register is read as its last value
 * less its first. Times must rise; the log needs two samples.
 */
export function meterEnergy(log: MeterLog): MeterEnergy {
  const samples = log.samples;
  const issues: InputIssue[] = [];
  if (samples.length < 2)
    issues.push({ field: 'samples', value: samples.length, reason: 'needs at least two samples' });
  samples.forEach((sample, index) => {
    if (!Number.isFinite(sample.timeS))
      issues.push({
        field: `samples.${index}.timeS`,
        value: sample.timeS,
        reason: 'is not a number',
      });
    const previous = samples[index - 1];
    if (previous && sample.timeS <= previous.timeS)
      issues.push({
        field: `samples.${index}.timeS`,
        value: sample.timeS,
        reason: 'must be later than the sample before it',
      });
    const value = 'powerW' in sample ? sample.powerW : sample.energyJ;
    if (!Number.isFinite(value) || value < 0)
      issues.push({
        field: `samples.${index}.${'powerW' in sample ? 'powerW' : 'energyJ'}`,
        value,
        reason: 'must be a number, 0 or more',
      });
  });
  if (log.kind === 'cumulative') {
    log.samples.forEach((sample, index) => {
      const previous = log.samples[index - 1];
      if (previous && sample.energyJ < previous.energyJ)
        issues.push({
          field: `samples.${index}.energyJ`,
          value: sample.energyJ,
          reason: 'falls below the reading before it (a meter register only counts up)',
        });
    });
  }
  if (issues.length > 0) throw new InputError(issues);
  const first = samples[0];
  const last = samples[samples.length - 1];
  const durationS = (last?.timeS ?? 0) - (first?.timeS ?? 0);
  let energyJ = 0;
  if (log.kind === 'power') {
    for (let index = 1; index < log.samples.length; index += 1) {
      const a = log.samples[index - 1];
      const b = log.samples[index];
      if (a && b) energyJ += ((a.powerW + b.powerW) / 2) * (b.timeS - a.timeS);
    }
  } else {
    energyJ = (log.samples.at(-1)?.energyJ ?? 0) - (log.samples[0]?.energyJ ?? 0);
  }
  return { energyJ, durationS, meanPowerW: energyJ / durationS, samples: samples.length };
}
