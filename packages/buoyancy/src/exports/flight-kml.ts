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

function trackPlacemark(geography: FlightGeography): string {
  const coordinates = geography.drift.track.map(tuple).join(' ');
  // altitudeMode absolute: KML altitudes are then metres above sea level, as the engine's are.
  return `<Placemark><name>${xmlText(TRACK_NAME)}</name><styleUrl>#track</styleUrl><LineString><altitudeMode>absolute</altitudeMode><coordinates>${coordinates}</coordinates></LineString></Placemark>`;
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
  return (geography.landingArea?.regions ?? []).map((region) => {
    const ring = exteriorRing(region.boundary)
      .map(
        ([lon, lat]) =>
          `${fixedText(lon, EXPORT_DIGITS.degrees)},${fixedText(lat, EXPORT_DIGITS.degrees)}`,
      )
      .join(' ');
    const style = region.probability <= 0.5 ? '#area-50' : '#area-95';
    const extended = `<ExtendedData>${data('probability', 'Share of landings', String(region.probability))}${data('areaM2', 'Area (m²)', String(Math.round(region.areaM2)))}</ExtendedData>`;
    // No altitude: a polygon drawn on the ground (clampToGround, the KML default).
    return `<Placemark>${xmlElement('name', regionName(region))}<styleUrl>${style}</styleUrl>${extended}<Polygon><outerBoundaryIs><LinearRing><coordinates>${ring}</coordinates></LinearRing></outerBoundaryIs></Polygon></Placemark>`;
  });
}

/**
 * A flight as KML 2.2 (OGC 07-147r2): a Document with the track as a LineString (altitudeMode
 * absolute), Placemarks for launch, burst and landing with their time since launch and altitude
 * (and a TimeStamp when the launch time is known), and a Polygon for each landing region.
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
