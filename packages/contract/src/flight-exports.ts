import type { LandingArea } from '@loftwright/buoyancy';

/**
 * Files a saved flight-profile version can be downloaded as, at
 * `GET /api/calculations/:id/versions/:n/exports/:file`.
 */
export const FLIGHT_EXPORT_FILES = [
  'track.geojson',
  'track.kml',
  'track.gpx',
  'profile.csv',
] as const;
export type FlightExportFile = (typeof FLIGHT_EXPORT_FILES)[number];

/** The media type each file is sent with. */
export const FLIGHT_EXPORT_MEDIA_TYPES: Readonly<Record<FlightExportFile, string>> = {
  'track.geojson': 'application/geo+json',
  'track.kml': 'application/vnd.google-earth.kml+xml',
  'track.gpx': 'application/gpx+xml',
  'profile.csv': 'text/csv',
};

/**
 * `GET /api/calculations/:id/versions/:n/landing-area`: the engine's landing area, recomputed on
 * the server from the version's inputs and its own landing-area settings.
 */
export type VersionLandingArea = LandingArea;
