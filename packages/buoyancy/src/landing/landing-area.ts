import { type CalculationWarning, Derivation } from '../derivation.js';
import { InputError } from '../errors.js';
import { type DriftResult, driftTrack } from '../flight/drift.js';
import { chooseFlightAir } from '../flight/flight-air.js';
import { flightPathOf } from '../flight/flight-path.js';
import { deriveLaunch } from '../flight/launch-steps.js';
import {
  type FlightProfileInput,
  flightProfileSchema,
  type FlightProfileValues,
} from '../kinds/flight-profile.kind.js';
import { parseInputs } from '../schema/parse-inputs.js';
import type { LandingArea, LandingRun, LandingSpreads } from './landing-area-types.js';
import {
  LANDING_REGION_MIN_SIGMA_M,
  landingRegion,
  scatterOf,
  widenedScatter,
} from './landing-regions.js';
import { flyRun, LANDING_RUN_STEP_S, NOMINAL_FACTORS, type RunSetup } from './landing-run.js';
import { landingAreaSettingsSchema, type LandingAreaSettings } from './landing-spreads.js';
import { seededNormals } from './normal-draws.js';

/** Shares of the landings the regions are drawn for. */
export const LANDING_REGION_PROBABILITIES = [0.5, 0.95] as const;

/**
 * Fewest runs a region is drawn from: the fewest the settings allow (20), and at least half the
 * runs asked for, so the regions never rest on a lucky few or on the nominal flight alone.
 */
export const LANDING_MIN_SURVIVING_RUNS = 20;

/**
 * Refuses an estimate most of whose runs failed: the regions would say nothing.
 * @throws InputError on `landingArea.spreads` with fewer than 20 (or half the asked) runs left
 */
export function checkLandingSurvivors(survived: number, asked: number): void {
  const needed = Math.max(LANDING_MIN_SURVIVING_RUNS, Math.ceil(asked / 2));
  if (survived >= needed) return;
  throw new InputError(
    'landingArea.spreads',
    survived,
    `leave only ${survived} of ${asked} runs that burst and land within the longest flight time; a landing area needs at least ${needed} (20, and half the runs): narrow the spreads, or raise the longest flight time`,
  );
}

/** Notes on left-out runs and a widened region, with stable codes. */
function areaNotes(failedRuns: number, asked: number, widened: boolean): CalculationWarning[] {
  const notes: CalculationWarning[] = [];
  if (failedRuns > 0) {
    notes.push({
      code: 'landing-area-failed-runs',
      severity: 'note',
      message: `${failedRuns} of ${asked} runs were left out: the varied balloon did not rise, or did not burst and land within the longest flight time. The regions are drawn from the others.`,
    });
  }
  if (widened) {
    notes.push({
      code: 'landing-area-widened',
      severity: 'note',
      message: `The runs scatter along a line or not at all (only some inputs vary), so their spread across it is unknown: the regions are widened to at least ${LANDING_REGION_MIN_SIGMA_M} m (one standard deviation) in every direction.`,
    });
  }
  return notes;
}

/** What `landingArea` may change from the input's own `landingArea` settings. */
export interface LandingAreaOptions {
  /** Repeated flights, 20 to 2 000. */
  readonly runs?: number;
  /** Seed of the random numbers, 0 to 2³¹ − 1. */
  readonly seed?: number;
  /** Spreads to change, each one standard deviation as a fraction of nominal, 0 to 0.3. */
  readonly spreads?: Partial<LandingSpreads>;
}

/**
 * The drift of a flight-profile input: `driftTrack` over the unthinned `flightPath` with the
 * input's wind, from its launch site (from 0° N 0° E when it gives none: east, north, distance
 * and times hold, latitude and longitude are then only relative). Null without a wind.
 * @throws InputError as the flight-profile kind does
 */
export function flightDrift(input: FlightProfileInput): DriftResult | null {
  const inputs = parseInputs(flightProfileSchema, input);
  if (!inputs.wind) return null;
  const d = new Derivation();
  const wind = chooseFlightAir(d, inputs).wind;
  if (!wind) return null;
  const path = flightPathOf(inputs);
  return driftTrack({
    launch: {
      latitudeDeg: inputs.launch.latitudeDeg ?? 0,
      longitudeDeg: inputs.launch.longitudeDeg ?? 0,
      altitudeM: inputs.launch.altitudeM,
    },
    ascent: path.ascent,
    descent: path.descent,
    wind,
  });
}

/** The input's landing-area settings with the options laid over them; refusals name `landingArea.*`. */
function settingsOf(inputs: FlightProfileValues, options: LandingAreaOptions): LandingAreaSettings {
  const own = inputs.landingArea;
  const merged = {
    runs: options.runs ?? own?.runs,
    seed: options.seed ?? own?.seed,
    spreads: { ...own?.spreads, ...options.spreads },
  };
  try {
    return parseInputs(landingAreaSettingsSchema, merged);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    throw new InputError(
      error.issues.map((issue) => ({ ...issue, field: `landingArea.${issue.field}` })),
    );
  }
}

/** Checks that a landing area can be drawn, and prepares what every run shares. */
function setupOf(inputs: FlightProfileValues): RunSetup {
  const { latitudeDeg, longitudeDeg } = inputs.launch;
  if (latitudeDeg === undefined || longitudeDeg === undefined) {
    throw new InputError(
      'launch.latitudeDeg',
      latitudeDeg,
      'is required for a landing area: give the launch site’s latitude and longitude',
    );
  }
  if (!inputs.wind) {
    throw new InputError('wind', undefined, 'is required for a landing area: give the winds aloft');
  }
  if (inputs.envelope.kind !== 'extensible') {
    throw new InputError(
      'envelope.kind',
      inputs.envelope.kind,
      'must be a stretching envelope for a landing area: a fixed-volume envelope floats and does not land',
    );
  }
  if (!inputs.parachute) {
    throw new InputError(
      'parachute',
      undefined,
      'is required for a landing area: the landing is under it',
    );
  }
  const d = new Derivation();
  const air = chooseFlightAir(d, inputs);
  const launch = deriveLaunch(d, inputs, air);
  // Present whenever the inputs give a wind (checked above); this tells the type checker.
  if (!air.wind) throw new InputError('wind', undefined, 'is required for a landing area');
  return {
    inputs,
    launch,
    air,
    wind: air.wind,
    latitudeDeg,
    longitudeDeg,
    stepS: Math.max(inputs.timeStepS, LANDING_RUN_STEP_S),
  };
}

/**
 * Where the flight may land: the flight repeated `runs` times with its burst diameter, launch
 * ascent rate (through the amount of gas), parachute drag area and wind speed (all levels by one
 * factor) each multiplied by 1 + σ·z, z standard normal from a seeded generator, σ the spread;
 * and the 50 % and 95 % regions, ellipses of the runs' sample covariance in east and north
 * (r² = −2 ln(1 − p)), which assume the landings scatter like a two-dimensional normal
 * distribution. Runs use a 20 s time step (or the input’s, if coarser). Fewer than 20 surviving
 * runs (or fewer than half) are refused; a scatter narrower than 100 m (one standard deviation) in
 * some direction is widened to it, and `notes` say so.
 * @param input flight-profile inputs with `wind` and the launch site's latitude and longitude
 * @param options runs, seed and spreads, laid over the input's `landingArea`
 * @throws InputError naming `launch.latitudeDeg`, `wind`, `envelope.kind`, `parachute`,
 *   `landingArea.*` (`landingArea.spreads` when too few runs land), or when the nominal flight
 *   does not land (`envelope.burstDiameterM`)
 */
export function landingArea(
  input: FlightProfileInput,
  options: LandingAreaOptions = {},
): LandingArea {
  const inputs = parseInputs(flightProfileSchema, input);
  const settings = settingsOf(inputs, options);
  const setup = setupOf(inputs);
  const nominal = flyRun(setup, NOMINAL_FACTORS);
  if (!nominal) {
    throw new InputError(
      'envelope.burstDiameterM',
      inputs.envelope.kind === 'extensible' ? inputs.envelope.burstDiameterM : undefined,
      'gives a flight that does not burst and land within the longest flight time computed',
    );
  }
  const { spreads } = settings;
  const normal = seededNormals(settings.seed);
  const runs: LandingRun[] = [];
  for (let index = 0; index < settings.runs; index += 1) {
    // Four draws per run in a fixed order, so a run depends only on the seed and its index.
    const factors = {
      burstDiameter: 1 + spreads.burstDiameter * normal(),
      ascentRate: 1 + spreads.ascentRate * normal(),
      descentDrag: 1 + spreads.descentDrag * normal(),
      windSpeed: 1 + spreads.windSpeed * normal(),
    };
    const run = flyRun(setup, factors);
    if (run) runs.push(run);
  }
  checkLandingSurvivors(runs.length, settings.runs);
  const launch = { latitudeDeg: setup.latitudeDeg, longitudeDeg: setup.longitudeDeg };
  const { scatter, widened } = widenedScatter(scatterOf(runs));
  const failedRuns = settings.runs - runs.length;
  const notes = areaNotes(failedRuns, settings.runs, widened);
  return {
    runs,
    regions: LANDING_REGION_PROBABILITIES.map((p) => landingRegion(scatter, p, launch)),
    nominal,
    spreads: { ...spreads },
    seed: settings.seed,
    failedRuns,
    ...(notes.length > 0 ? { notes } : {}),
  };
}
