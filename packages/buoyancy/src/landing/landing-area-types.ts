import type { CalculationWarning } from '../derivation.js';

/** A point on the ground: geodetic latitude and longitude on WGS 84 [°]. */
export interface GroundPoint {
  readonly latitudeDeg: number;
  readonly longitudeDeg: number;
}

/** One repeated flight of a landing-area estimate. */
export interface LandingRun extends GroundPoint {
  /** Displacement of the landing point from launch, east and north [m]. */
  readonly eastM: number;
  readonly northM: number;
  /** Launch to landing [s]. */
  readonly flightTimeS: number;
  /** Altitude where the envelope burst [m]. */
  readonly burstAltitudeM: number;
}

/** An area expected to hold a share of the landings. */
export interface LandingRegion {
  /** Share of landings it is drawn to contain, 0.5 or 0.95. */
  readonly probability: number;
  /** The boundary, closed (first point repeated last), counter-clockwise seen from above. */
  readonly boundary: readonly GroundPoint[];
  /** The same boundary as east and north of launch [m]. */
  readonly boundaryEastNorthM: readonly (readonly [number, number])[];
  /** Its area [m²]. */
  readonly areaM2: number;
}

/**
 * How much each varied input spreads: one standard deviation as a fraction of its nominal value
 * (burst diameter, ascent rate through the launch free lift, descent drag, wind speed).
 */
export interface LandingSpreads {
  readonly burstDiameter: number;
  readonly ascentRate: number;
  readonly descentDrag: number;
  readonly windSpeed: number;
}

/** The landing area: every run, and the 50 % and 95 % regions drawn from them. */
export interface LandingArea {
  readonly runs: readonly LandingRun[];
  readonly regions: readonly LandingRegion[];
  /** The nominal flight's landing point. */
  readonly nominal: LandingRun;
  readonly spreads: LandingSpreads;
  /** Seed of the random numbers: the same seed and inputs give the same runs. */
  readonly seed: number;
  /** Runs left out because the varied balloon did not rise or did not come down in time. */
  readonly failedRuns: number;
  /**
   * What the reader should know about how the regions were drawn, with stable codes:
   * `landing-area-failed-runs` (some runs left out), `landing-area-widened` (the scatter was too
   * narrow in some direction, so the regions were widened to the stated minimum). Absent when
   * there is nothing to say.
   */
  readonly notes?: readonly CalculationWarning[];
}
