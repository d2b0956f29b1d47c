import { AIR_PRESSURE_RANGE_PA, AIR_TEMPERATURE_RANGE_K } from '../atmosphere/air-density.js';
import type { CalculationResult } from '../derivation.js';
import { InputError, type InputIssue } from '../errors.js';
import { evaluate } from '../kinds/registry.js';
import type { LiftInstrument } from '../kinds/lift-measurement.kind.js';

/** One lift reading of a fill, with the air at that moment where it was logged. */
export type FillReading =
  | {
      kind: 'ballast';
      timeS: number;
      ballastMassKg: number;
      scaleReadingKg: number;
      airTemperatureK?: number;
      pressurePa?: number;
    }
  | {
      kind: 'direct';
      timeS: number;
      netLiftKg: number;
      airTemperatureK?: number;
      pressurePa?: number;
    };

/** The air logged at the fill (outdoors or in the hall where the envelope was weighed). */
export interface FillAmbient {
  temperatureK: number;
  pressurePa: number;
  /** 0 to 1; dry air when not logged. */
  relativeHumidity?: number;
}

/** What the fill was meant to be: the envelope, its mass and its gas, from a lift check. */
export interface FillDesign {
  envelope: unknown;
  envelopeMass: unknown;
  gas: unknown;
}

export interface FillLogReduction {
  /** The lift-measurement kind's result: measured lift, difference, explaining purity, loss fit. */
  result: CalculationResult;
  /** Per reading: measured net lift, and the prediction at that reading's own air. */
  points: { timeS: number; measuredKg: number; predictedKg: number | null }[];
}

const measuredAir = (ambient: FillAmbient, reading?: FillReading) => ({
  mode: 'measured' as const,
  temperatureK: reading?.airTemperatureK ?? ambient.temperatureK,
  pressurePa: reading?.pressurePa ?? ambient.pressurePa,
  humidity:
    ambient.relativeHumidity === undefined
      ? { kind: 'dry' as const }
      : { kind: 'relative' as const, relativeHumidity: ambient.relativeHumidity },
});

function checkAir(ambient: FillAmbient, readings: readonly FillReading[]): void {
  const issues: InputIssue[] = [];
  const check = (
    field: string,
    value: number | undefined,
    range: { min: number; max: number },
    unit: string,
  ) => {
    if (value === undefined) return;
    if (!Number.isFinite(value) || value < range.min || value > range.max)
      issues.push({
        field,
        value,
        reason: `must be between ${range.min} and ${range.max} ${unit}`,
        range: { ...range, unit },
      });
  };
  check('ambient.temperatureK', ambient.temperatureK, AIR_TEMPERATURE_RANGE_K, 'K');
  check('ambient.pressurePa', ambient.pressurePa, AIR_PRESSURE_RANGE_PA, 'Pa');
  check('ambient.relativeHumidity', ambient.relativeHumidity, { min: 0, max: 1 }, '');
  readings.forEach((reading, index) => {
    check(
      `readings.${index}.airTemperatureK`,
      reading.airTemperatureK,
      AIR_TEMPERATURE_RANGE_K,
      'K',
    );
    check(`readings.${index}.pressurePa`, reading.pressurePa, AIR_PRESSURE_RANGE_PA, 'Pa');
  });
  if (issues.length > 0) throw new InputError(issues);
}

/**
 * The design a lift check version describes, as a fill log predicts from it; undefined for
 * other kinds (their logs record measured lift only).
 */
export function fillDesignFromVersion(kind: string, inputs: unknown): FillDesign | undefined {
  if (kind !== 'lift-check' || inputs === null || typeof inputs !== 'object') return undefined;
  const { envelope, envelopeMass, gas } = inputs as Record<string, unknown>;
  return { envelope, envelopeMass, gas };
}

/**
 * Reduces a fill log: the readings through the lift-measurement kind, compared with the design's
 * lift at the logged air (not at the design's air), and each reading's prediction at the air
 * measured with it, for a measured-against-predicted chart. Errors name fields as the log holds
 * them (`readings.2.scaleReadingKg`, `ambient.temperatureK`).
 */
export function reduceFillLog(log: {
  ambient: FillAmbient;
  readings: readonly FillReading[];
  design?: FillDesign;
  /** The scale's resolution and the ballast's tolerance; the kind's stated defaults when absent. */
  instrument?: LiftInstrument;
}): FillLogReduction {
  checkAir(log.ambient, log.readings);
  const readings = log.readings.map((reading) =>
    reading.kind === 'ballast'
      ? {
          kind: reading.kind,
          timeS: reading.timeS,
          ballastMassKg: reading.ballastMassKg,
          scaleReadingKg: reading.scaleReadingKg,
        }
      : { kind: reading.kind, timeS: reading.timeS, netLiftKg: reading.netLiftKg },
  );
  const prediction = log.design ? { ...log.design, ambient: measuredAir(log.ambient) } : undefined;
  let result: CalculationResult;
  try {
    result = evaluate('lift-measurement', {
      readings,
      ...(prediction ? { prediction } : {}),
      ...(log.instrument ? { instrument: log.instrument } : {}),
    });
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    // The prediction's air is the log's ambient; everything else keeps its own path.
    throw new InputError(
      error.issues.map((issue) => ({
        ...issue,
        field: issue.field
          .replace(/^prediction\.ambient\./, 'ambient.')
          .replace(/^prediction\./, 'design.'),
      })),
    );
  }
  const predictedAt = (reading: FillReading): number | null =>
    log.design
      ? (evaluate('lift-check', {
          ...log.design,
          payloadMassKg: 0,
          ambient: measuredAir(log.ambient, reading),
        }).outputs.netLift?.value ?? null)
      : null;
  const points = log.readings.map((reading) => ({
    timeS: reading.timeS,
    measuredKg:
      reading.kind === 'ballast'
        ? reading.ballastMassKg - reading.scaleReadingKg
        : reading.netLiftKg,
    predictedKg: predictedAt(reading),
  }));
  return { result, points };
}
