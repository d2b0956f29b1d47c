import type { DriftPoint } from '../flight/drift.js';
import {
  EXPORT_DIGITS,
  exteriorRing,
  type FlightGeography,
  fixedText,
  namedFlightPoints,
  pointTimeText,
  regionName,
  TRACK_NAME,
  wrappedLongitudeDeg,
} from './flight-geography.js';
import { xmlElement } from './xml-text.js';

/** `lat="…" lon="…"`, longitude in −180 to 180 as GPX 1.1's longitudeType asks. */
function latLon(latitudeDeg: number, longitudeDeg: number): string {
  const lon = fixedText(wrappedLongitudeDeg(longitudeDeg), EXPORT_DIGITS.degrees);
  return `lat="${fixedText(latitudeDeg, EXPORT_DIGITS.degrees)}" lon="${lon === '180.000000' ? '-180.000000' : lon}"`;
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
    const points = exteriorRing(region.boundary)
      .map(([lon, lat]) => `<trkpt ${latLon(lat, lon)}/>`)
      .join('');
    const desc = `Drawn to hold ${Math.round(region.probability * 100)} % of the landings; area ${Math.round(region.areaM2)} m²`;
    return `<trk>${xmlElement('name', regionName(region))}${xmlElement('desc', desc)}${xmlElement('type', 'landing-area')}<trkseg>${points}</trkseg></trk>`;
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
  const trackPoints = drift.track.map((point) => trackPoint(point, launchTime)).join('\n');
  const track = `<trk>${xmlElement('name', TRACK_NAME)}${xmlElement('type', 'track')}<trkseg>\n${trackPoints}\n</trkseg></trk>`;
  const body = [metadata, ...waypoints(geography), track, ...regionTracks(geography)].join('\n');
  return `<?xml version="1.0" encoding="UTF-8"?>\n<gpx version="1.1" creator="Loftwright" xmlns="http://www.topografix.com/GPX/1/1" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://www.topografix.com/GPX/1/1 http://www.topografix.com/GPX/1/1/gpx.xsd">\n${body}\n</gpx>\n`;
}
