import { type Derivation, v } from '../derivation.js';
import type { FlightProfileValues } from '../kinds/flight-profile.kind.js';
import type { WindProfile } from '../wind/wind-profile.js';
import { type DriftPoint, type DriftResult, driftTrack } from './drift.js';
import type { FlightPath } from './flight-path.js';
import { thinRows } from './series-thinning.js';

const DRIFT_SOURCE =
  'the balloon moves with the wind: x = ∫u(z(t)) dt, y = ∫v(z(t)) dt (trapezoidal rule)';

/**
 * The drift of a flight: the ground track under the unthinned path with the given wind, from the
 * launch site when the inputs give one (else from 0° N 0° E, and only east and north are
 * published). Publishes the burst and landing displacements, and with a site their latitude and
 * longitude, the geodesic distance and bearing; adds the `track` series.
 */
export function deriveDrift(
  d: Derivation,
  inputs: FlightProfileValues,
  path: FlightPath,
  wind: WindProfile,
): DriftResult {
  const { latitudeDeg, longitudeDeg, altitudeM } = inputs.launch;
  const hasSite = latitudeDeg !== undefined && longitudeDeg !== undefined;
  const drift = driftTrack({
    launch: { latitudeDeg: latitudeDeg ?? 0, longitudeDeg: longitudeDeg ?? 0, altitudeM },
    ascent: path.ascent,
    descent: path.descent,
    wind,
  });
  for (const note of drift.notes) d.warn(note);
  // A float has no burst: the `burst*` results then hold the end of the ascent, and say so.
  const burstWhere = path.end === 'burst' ? 'Burst point' : 'End of the ascent';
  derivePoint(d, 'burst', drift.burst, burstWhere, hasSite);
  if (drift.landed) {
    derivePoint(d, 'landing', drift.landing, 'Landing point', hasSite);
    deriveDistanceAndBearing(d, drift, hasSite);
  }
  d.addSeries('track', {
    label: 'Ground track',
    columns: [
      { key: 'time', label: 'Time since launch', unit: 's' },
      { key: 'east', label: 'East of launch', unit: 'm' },
      { key: 'north', label: 'North of launch', unit: 'm' },
      { key: 'altitude', label: 'Altitude', unit: 'm' },
      ...(hasSite
        ? [
            { key: 'latitude', label: 'Latitude', unit: '°' },
            { key: 'longitude', label: 'Longitude', unit: '°' },
          ]
        : []),
    ],
    rows: thinRows(drift.track).map((p) => [
      p.timeS,
      p.eastM,
      p.northM,
      p.altitudeM,
      ...(hasSite ? [p.latitudeDeg, p.longitudeDeg] : []),
    ]),
  });
  return drift;
}

/** East and north of launch at a point of the track, and with a site its latitude and longitude. */
function derivePoint(
  d: Derivation,
  name: 'burst' | 'landing',
  point: DriftPoint,
  where: string,
  hasSite: boolean,
): void {
  const t = v('t', point.timeS, 's');
  d.step({
    id: `${name}-east`,
    label: `${where}: drift east of launch (west negative)`,
    formula: 'x = ∫₀ᵗ u(z(t′)) dt′',
    values: [t],
    result: v('x', point.eastM, 'm'),
    source: DRIFT_SOURCE,
  });
  d.step({
    id: `${name}-north`,
    label: `${where}: drift north of launch (south negative)`,
    formula: 'y = ∫₀ᵗ v(z(t′)) dt′',
    values: [t],
    result: v('y', point.northM, 'm'),
    source: DRIFT_SOURCE,
  });
  d.output(`${name}East`, `${where}, east of launch`, `${name}-east`);
  d.output(`${name}North`, `${where}, north of launch`, `${name}-north`);
  if (!hasSite) return;
  const source =
    'each step moved on the WGS 84 ellipsoid by its radii of curvature (meridian and prime vertical)';
  const values = [v('x', point.eastM, 'm'), v('y', point.northM, 'm')];
  d.step({
    id: `${name}-latitude`,
    label: `${where}: latitude`,
    formula: 'φ = φ₀ + Σ Δy / M(φ)',
    values,
    result: v('φ', point.latitudeDeg, '°'),
    source,
  });
  d.step({
    id: `${name}-longitude`,
    label: `${where}: longitude`,
    formula: 'λ = λ₀ + Σ Δx / (N(φ)·cos φ)',
    values,
    result: v('λ', point.longitudeDeg, '°'),
    source,
  });
  d.output(`${name}Latitude`, `${where}, latitude`, `${name}-latitude`);
  d.output(`${name}Longitude`, `${where}, longitude`, `${name}-longitude`);
}

/** Launch to landing: distance and initial bearing (geodesic with a site, else on the plane). */
function deriveDistanceAndBearing(d: Derivation, drift: DriftResult, hasSite: boolean): void {
  const { eastM, northM } = drift.landing;
  const values = [v('x', eastM, 'm'), v('y', northM, 'm')];
  const planeDistanceM = Math.hypot(eastM, northM);
  const planeBearingDeg =
    planeDistanceM === 0 ? 0 : ((Math.atan2(eastM, northM) * 180) / Math.PI + 360) % 360;
  d.step({
    id: 'ground-distance',
    label: 'Ground distance from launch to landing',
    formula: hasSite ? 's = geodesic on WGS 84 (inverse problem)' : 's = √(x² + y²)',
    values,
    result: v('s', hasSite ? drift.groundDistanceM : planeDistanceM, 'm'),
    source: hasSite
      ? 'Vincenty (1975), inverse formula on the WGS 84 ellipsoid'
      : 'displacement on a local plane (no launch site given)',
  });
  d.step({
    id: 'initial-bearing',
    label: 'Bearing from launch to landing, clockwise from true north',
    formula: hasSite ? 'α₁ = azimuth of the geodesic at launch' : 'α = atan2(x, y)',
    values,
    result: v('α', hasSite ? drift.initialBearingDeg : planeBearingDeg, '°'),
    source: hasSite
      ? 'Vincenty (1975), inverse formula on the WGS 84 ellipsoid'
      : 'direction on a local plane (no launch site given)',
  });
  d.output('groundDistance', 'Ground distance to landing', 'ground-distance');
  d.output('initialBearing', 'Bearing to landing', 'initial-bearing');
}
