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
} from './flight-geography.js';
import { xmlElement, xmlText } from './xml-text.js';

/** KML's "lon,lat,alt" tuple (KML 2.2, OGC 07-147r2, section 16.9.1): no spaces inside. */
function tuple(point: DriftPoint): string {
  return [
    fixedText(point.longitudeDeg, EXPORT_DIGITS.degrees),
    fixedText(point.latitudeDeg, EXPORT_DIGITS.degrees),
    fixedText(point.altitudeM, EXPORT_DIGITS.metres),
  ].join(',');
}

function data(name: string, displayName: string, value: string): string {
  return `<Data name="${xmlText(name)}"><displayName>${xmlText(displayName)}</displayName><value>${xmlText(value)}</value></Data>`;
}

// Colours are aabbggrr (KML 2.2 section 16.7): a red track, orange and yellow areas at 30 %.
const STYLES = [
  '<Style id="track"><LineStyle><color>ff1c1ce0</color><width>3</width></LineStyle></Style>',
  '<Style id="area-50"><LineStyle><color>ff0080ff</color><width>2</width></LineStyle><PolyStyle><color>4d0080ff</color></PolyStyle></Style>',
  '<Style id="area-95"><LineStyle><color>ff00d7ff</color><width>2</width></LineStyle><PolyStyle><color>4d00d7ff</color></PolyStyle></Style>',
].join('');

/** One geometry as it is, several in a MultiGeometry (KML 2.2 section 10.2). */
const oneOrMulti = (geometries: string[]): string =>
  geometries.length === 1
    ? (geometries[0] as string)
    : `<MultiGeometry>${geometries.join('')}</MultiGeometry>`;

function trackPlacemark(geography: FlightGeography): string {
  // Cut at the antimeridian (as for GeoJSON), so no piece jumps round the globe and every
  // longitude stays in −180 to 180, the range of KML's coordinates.
  const lines = flightTrackPieces(geography).map(
    (piece) =>
      // altitudeMode absolute: KML altitudes are then metres above sea level, as the engine's are.
      `<LineString><altitudeMode>absolute</altitudeMode><coordinates>${piece.map(tuple).join(' ')}</coordinates></LineString>`,
  );
  return `<Placemark><name>${xmlText(TRACK_NAME)}</name><styleUrl>#track</styleUrl>${oneOrMulti(lines)}</Placemark>`;
}

/** The estimate's runs left out and notes, in words, for each region's description. */
function areaDescription(geography: FlightGeography): string {
  const area = geography.landingArea;
  if (!area) return '';
  const runs = `${area.runs.length} of ${area.runs.length + area.failedRuns} runs landed; ${area.failedRuns} left out.`;
  const notes = (area.notes ?? []).map((note) => `${note.message} [${note.code}]`);
  return xmlElement('description', [runs, ...notes].join(' '));
}

function pointPlacemarks(geography: FlightGeography): string[] {
  return namedFlightPoints(geography.drift).map(({ name, point }) => {
    const time = pointTimeText(geography.launchTime, point.timeS);
    const stamp = time === undefined ? '' : `<TimeStamp><when>${time}</when></TimeStamp>`;
    const extended = `<ExtendedData>${data('timeS', 'Time since launch (s)', fixedText(point.timeS, EXPORT_DIGITS.seconds))}${data('altitudeM', 'Altitude above mean sea level (m)', fixedText(point.altitudeM, EXPORT_DIGITS.metres))}</ExtendedData>`;
    return `<Placemark>${xmlElement('name', name)}${stamp}${extended}<Point><altitudeMode>absolute</altitudeMode><coordinates>${tuple(point)}</coordinates></Point></Placemark>`;
  });
}

function regionPlacemarks(geography: FlightGeography): string[] {
  const failedRuns = String(geography.landingArea?.failedRuns ?? 0);
  const description = areaDescription(geography);
  return (geography.landingArea?.regions ?? []).map((region) => {
    const polygons = exteriorRingPieces(region.boundary, launchLongitudeDeg(geography)).map(
      (piece) => {
        const ring = piece
          .map(
            ([lon, lat]) =>
              `${fixedText(lon, EXPORT_DIGITS.degrees)},${fixedText(lat, EXPORT_DIGITS.degrees)}`,
          )
          .join(' ');
        // No altitude: a polygon drawn on the ground (clampToGround, the KML default).
        return `<Polygon><outerBoundaryIs><LinearRing><coordinates>${ring}</coordinates></LinearRing></outerBoundaryIs></Polygon>`;
      },
    );
    const style = region.probability <= 0.5 ? '#area-50' : '#area-95';
    const extended = `<ExtendedData>${data('probability', 'Share of landings', String(region.probability))}${data('areaM2', 'Area (m²)', String(Math.round(region.areaM2)))}${data('failedRuns', 'Runs left out', failedRuns)}</ExtendedData>`;
    return `<Placemark>${xmlElement('name', regionName(region))}${description}<styleUrl>${style}</styleUrl>${extended}${oneOrMulti(polygons)}</Placemark>`;
  });
}

/**
 * A flight as KML 2.2 (OGC 07-147r2): a Document with the track as a LineString (altitudeMode
 * absolute), Placemarks for launch, burst and landing with their time since launch and altitude
 * (and a TimeStamp when the launch time is known), and a Polygon for each landing region with
 * the runs left out and the estimate's notes in its description. A track or region across the
 * antimeridian is cut there into a MultiGeometry, one piece per side.
 */
export function flightKml(geography: FlightGeography): string {
  const body = [
    xmlElement('name', geography.title),
    STYLES,
    trackPlacemark(geography),
    ...pointPlacemarks(geography),
    ...regionPlacemarks(geography),
  ].join('\n');
  return `<?xml version="1.0" encoding="UTF-8"?>\n<kml xmlns="http://www.opengis.net/kml/2.2">\n<Document>\n${body}\n</Document>\n</kml>\n`;
}
