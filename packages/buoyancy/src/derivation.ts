import { ComputationError } from './errors.js';

/** A number with its unit, as results and substituted values are shown. */
export interface Quantity {
  readonly value: number;
  readonly unit: string;
}

/** A named value that went into a step: `p = 101325 Pa`. */
export interface SubstitutedValue extends Quantity {
  readonly symbol: string;
}

/**
 * One line of a derivation, as a teacher shows it on the board: what is computed, the formula,
 * the numbers put into it, the result, and where the formula comes from.
 */
export interface DerivationStep {
  /** Stable identifier within a kind (`air-density`), used to link outputs, notes and exercises. */
  readonly id: string;
  /** What the step computes, in words: "Density of the surrounding air". */
  readonly label: string;
  /** The formula as text, with the result's symbol on the left: `ρ = p·M / (R·T)`. */
  readonly formula: string;
  /** The values substituted into the formula, each with its unit. */
  readonly values: readonly SubstitutedValue[];
  /** The result, with its symbol and unit. */
  readonly result: SubstitutedValue;
  /** Publication, standard or textbook the formula comes from. */
  readonly source: string;
}

/** How much a warning matters: a hazard, a result to doubt, or a note on the model. */
export type WarningSeverity = 'caution' | 'warning' | 'note';

export interface CalculationWarning {
  /** Stable code (`gas-not-lighter-than-air`), for tests, filters and translations. */
  readonly code: string;
  readonly severity: WarningSeverity;
  readonly message: string;
  /** Input the warning is about, when it is about one. */
  readonly field?: string;
}

/** An output value, labelled for display, with the step that produced it. */
export interface OutputQuantity extends Quantity {
  readonly label: string;
  /** Id of the derivation step that computes it. */
  readonly stepId: string;
  /** The conditions it holds for, in a few words: "at 15.0 °C, 101.33 kPa, dry air". */
  readonly context?: string;
}

/** A table of numbers for a chart: named columns with units, one row per point. */
export interface DataSeries {
  readonly label: string;
  readonly columns: readonly {
    readonly key: string;
    readonly label: string;
    readonly unit: string;
  }[];
  readonly rows: readonly (readonly number[])[];
}

/** What every calculation kind returns. */
export interface CalculationResult {
  readonly outputs: Readonly<Record<string, OutputQuantity>>;
  readonly steps: readonly DerivationStep[];
  readonly warnings: readonly CalculationWarning[];
  /** Data for charts, where a kind produces a profile or a sweep. */
  readonly series?: Readonly<Record<string, DataSeries>>;
}

/**
 * Collects steps, outputs and warnings while a kind computes, so each output is recorded with the
 * step that produced it, and no output can exist without one.
 */
export class Derivation {
  private readonly steps: DerivationStep[] = [];
  private readonly outputs: Record<string, OutputQuantity> = {};
  private readonly warnings: CalculationWarning[] = [];
  private readonly series: Record<string, DataSeries> = {};

  /** Records a step and returns its result value, so code reads like the formula it shows. */
  step(step: DerivationStep): number {
    if (this.steps.some((existing) => existing.id === step.id)) {
      throw new Error(`Duplicate derivation step id "${step.id}"`);
    }
    if (!Number.isFinite(step.result.value)) {
      throw new ComputationError(`Step "${step.id}" gave ${step.result.value}`);
    }
    this.steps.push(step);
    return step.result.value;
  }

  /** Publishes the result of a recorded step as a named output. */
  output(name: string, label: string, stepId: string, context?: string): void {
    const step = this.steps.find((candidate) => candidate.id === stepId);
    if (!step) throw new Error(`Output "${name}" refers to unknown step "${stepId}"`);
    this.outputs[name] = {
      value: step.result.value,
      unit: step.result.unit,
      label,
      stepId,
      ...(context === undefined ? {} : { context }),
    };
  }

  warn(warning: CalculationWarning): void {
    if (!this.warnings.some((existing) => existing.code === warning.code)) {
      this.warnings.push(warning);
    }
  }

  /** Attaches a data series for a chart; every value must be finite. */
  addSeries(name: string, series: DataSeries): void {
    for (const row of series.rows) {
      if (row.length !== series.columns.length || !row.every(Number.isFinite)) {
        throw new ComputationError(
          `Series "${name}" has a row that is not ${series.columns.length} finite numbers`,
        );
      }
    }
    this.series[name] = series;
  }

  /** Appends another derivation's steps and warnings (its outputs stay its own). */
  include(other: Pick<CalculationResult, 'steps' | 'warnings'>): void {
    for (const step of other.steps) this.step(step);
    for (const warning of other.warnings) this.warn(warning);
  }

  result(): CalculationResult {
    for (const [name, output] of Object.entries(this.outputs)) {
      if (!Number.isFinite(output.value)) {
        throw new ComputationError(`Output "${name}" is not a finite number (${output.value})`);
      }
    }
    const hasSeries = Object.keys(this.series).length > 0;
    return {
      outputs: { ...this.outputs },
      steps: [...this.steps],
      warnings: [...this.warnings],
      ...(hasSeries ? { series: { ...this.series } } : {}),
    };
  }
}

/** Shorthand for a substituted value. */
export const v = (symbol: string, value: number, unit: string): SubstitutedValue => ({
  symbol,
  value,
  unit,
});
