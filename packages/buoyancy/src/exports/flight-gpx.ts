import type { DriftPoint } from '../flight/drift.js';
import {
  EXPORT_DIGITS,
  exteriorRingPieces,
  type FlightGeography,
  fixedText,
  flightTrackPieces,
  launchLongitudeDeg,
  namedFlightPoints,
  pointTimeText,
  regionName,
  TRACK_NAME,
  wrappedLongitudeDeg,
} from './flight-geography.js';
import { xmlElement } from './xml-text.js';

/**
 * `lat="…" lon="…"`, longitude in −180 (inclusive) to 180 (exclusive) as GPX 1.1's longitudeType
 * asks. A point on +180° ends a piece west of the antimeridian (see `trackPieces`); written as
 * −180 it would sit at that piece's far end, so it is written one export step west, 179.999999°
 * (about 0.1 m at the equator), and the piece stays on its side.
 */
function latLon(latitudeDeg: number, longitudeDeg: number): string {
  const lon = fixedText(wrappedLongitudeDeg(longitudeDeg), EXPORT_DIGITS.degrees);
  const onEastEdge = longitudeDeg === 180 || lon === '180.000000';
  return `lat="${fixedText(latitudeDeg, EXPORT_DIGITS.degrees)}" lon="${onEastEdge ? '179.999999' : lon}"`;
}

function trackPoint(point: DriftPoint, launchTime: string | undefined): string {
  const ele = `<ele>${fixedText(point.altitudeM, EXPORT_DIGITS.metres)}</ele>`;
  return `<trkpt ${latLon(point.latitudeDeg, point.longitudeDeg)}>${ele}${xmlElement('time', pointTimeText(launchTime, point.timeS))}</trkpt>`;
}

function waypoints(geography: FlightGeography): string[] {
  return namedFlightPoints(geography.drift).map(({ name, role, point }) => {
    const ele = `<ele>${fixedText(point.altitudeM, EXPORT_DIGITS.metres)}</ele>`;
    const time = xmlElement('time', pointTimeText(geography.launchTime, point.timeS));
    const desc = `${fixedText(point.timeS, EXPORT_DIGITS.seconds)} s after launch`;
    // Child order is fixed by the GPX 1.1 schema's wptType: ele, time, name, desc, type.
    return `<wpt ${latLon(point.latitudeDeg, point.longitudeDeg)}>${ele}${time}${xmlElement('name', name)}${xmlElement('desc', desc)}${xmlElement('type', role)}</wpt>`;
  });
}

/**
 * Landing regions as tracks without times. A GPX route (rte) is a list of points to navigate to
 * in turn, and GPS units offer to guide you along it; a boundary is a line to look at, which is
 * what a track is. Each region is its own trk with a `type` of "landing-area".
 */
function regionTracks(geography: FlightGeography): string[] {
  return (geography.landingArea?.regions ?? []).map((region) => {
    // One trkseg per side of the antimeridian, as the flight track.
    const segments = exteriorRingPieces(region.boundary, launchLongitudeDeg(geography))
      .map(
        (piece) =>
          `<trkseg>${piece.map(([lon, lat]) => `<trkpt ${latLon(lat, lon)}/>`).join('')}</trkseg>`,
      )
      .join('');
    const desc = `Drawn to hold ${Math.round(region.probability * 100)} % of the landings; area ${Math.round(region.areaM2)} m²`;
    return `<trk>${xmlElement('name', regionName(region))}${xmlElement('desc', desc)}${xmlElement('type', 'landing-area')}${segments}</trk>`;
  });
}

/**
 * A flight as GPX 1.1 (Topografix schema): waypoints for launch, burst and landing, the flight
 * as a trk whose trkpt carry `ele` (metres above mean sea level) and `time` (UTC, launch time plus
 * time since launch, when the launch time is known), and one more trk per landing region.
 */
export function flightGpx(geography: FlightGeography): string {
  const { drift, launchTime } = geography;
  const launchStamp = xmlElement('time', pointTimeText(launchTime, drift.track[0]?.timeS ?? 0));
  const metadata = `<metadata>${xmlElement('name', geography.title)}${launchStamp}</metadata>`;
  // A trkseg is a run of points "logically connected in order" (GPX 1.1 trksegType): the track
  // is cut at the antimeridian into one per side, so no reader joins 179.99° to −179.99° the
  // long way round; the points on ±180° are interpolated.
  const segments = flightTrackPieces(geography)
    .map(
      (piece) =>
        `<trkseg>\n${piece.map((point) => trackPoint(point, launchTime)).join('\n')}\n</trkseg>`,
    )
    .join('');
  const track = `<trk>${xmlElement('name', TRACK_NAME)}${xmlElement('type', 'track')}${segments}</trk>`;
  const body = [metadata, ...waypoints(geography), track, ...regionTracks(geography)].join('\n');
  return `<?xml version="1.0" encoding="UTF-8"?>\n<gpx version="1.1" creator="Loftwright" xmlns="http://www.topografix.com/GPX/1/1" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://www.topografix.com/GPX/1/1 http://www.topografix.com/GPX/1/1/gpx.xsd">\n${body}\n</gpx>\n`;
}
