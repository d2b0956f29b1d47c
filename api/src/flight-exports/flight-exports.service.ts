import {
  type DriftResult,
  type FlightGeography,
  type FlightProfileInput,
  flightDrift,
  flightGeoJsonText,
  flightGpx,
  flightKml,
  flightProfileTable,
  KINDS,
  type LandingArea,
  landingArea,
  evaluate,
  ENGINE_VERSION,
} from '@loftwright/buoyancy';
import type { FlightExportFile, VersionLandingArea } from '@loftwright/contract';
import { FLIGHT_EXPORT_MEDIA_TYPES } from '@loftwright/contract';
import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import type { AuthUser } from '../auth/auth-user';
import { type ExportColumn, tableToCsv } from '../common/export/table-export';
import { CalculationsService } from '../calculations/calculations.service';
import { attachmentHeader } from './flight-export-name';

const FLIGHT_KIND = 'flight-profile';

/** A file ready to send: its text, media type and Content-Disposition. */
export interface FlightExportDownload {
  body: string;
  contentType: string;
  disposition: string;
}

interface SavedFlight {
  title: string;
  versionNumber: number;
  inputs: FlightProfileInput;
  /** The version's content fingerprint: the same inputs give the same landing area. */
  fingerprint: string;
}

/** Landing areas kept, newest last: each costs up to a second of processor time to redo. */
const LANDING_AREA_CACHE_SIZE = 32;

/** A 422 that names the input by its label in the message and by its path in `field`. */
function refuse(field: string, fieldLabel: string, reason: string): UnprocessableEntityException {
  return new UnprocessableEntityException({ message: `${fieldLabel}: ${reason}`, field });
}

/**
 * Track and profile downloads of a saved flight, and its landing area. Everything is recomputed
 * here with the engine from the version's saved inputs; no stored or sent number is used.
 */
@Injectable()
export class FlightExportsService {
  /**
   * Landing areas by version fingerprint and engine version. A repeat download of the same
   * version reuses it; every instance would compute the same area, so nothing here needs sharing.
   */
  private readonly landingAreas = new Map<string, LandingArea>();

  constructor(private readonly calculations: CalculationsService) {}

  async download(
    user: AuthUser,
    id: string,
    versionNumber: number,
    file: FlightExportFile,
  ): Promise<FlightExportDownload> {
    const flight = await this.savedFlight(user, id, versionNumber);
    const body = file === 'profile.csv' ? this.profileCsv(flight) : this.trackText(flight, file);
    return {
      body,
      contentType: FLIGHT_EXPORT_MEDIA_TYPES[file],
      disposition: attachmentHeader(flight.title, versionNumber, file),
    };
  }

  async landingArea(
    user: AuthUser,
    id: string,
    versionNumber: number,
  ): Promise<VersionLandingArea> {
    const flight = await this.savedFlight(user, id, versionNumber);
    this.requireDrift(flight.inputs);
    return this.cachedLandingArea(flight);
  }

  private cachedLandingArea(flight: SavedFlight): LandingArea {
    const key = `${flight.fingerprint}:${ENGINE_VERSION}`;
    const cached = this.landingAreas.get(key);
    if (cached) {
      // Refresh its place, so the least recently used one leaves first.
      this.landingAreas.delete(key);
      this.landingAreas.set(key, cached);
      return cached;
    }
    const area = landingArea(flight.inputs);
    this.landingAreas.set(key, area);
    if (this.landingAreas.size > LANDING_AREA_CACHE_SIZE) {
      const oldest = this.landingAreas.keys().next().value;
      if (oldest !== undefined) this.landingAreas.delete(oldest);
    }
    return area;
  }

  /** The version if the user may read it (404 otherwise) and it is a flight profile (422). */
  private async savedFlight(
    user: AuthUser,
    id: string,
    versionNumber: number,
  ): Promise<SavedFlight> {
    const calculation = await this.calculations.findReadable(user, id);
    const version = await this.calculations.findVersion(id, versionNumber);
    if (calculation.kind !== FLIGHT_KIND) {
      throw new UnprocessableEntityException({
        message: `Kind: only a flight profile has a track or profile to download, not a ${KINDS.find((kind) => kind.id === calculation.kind)?.title ?? calculation.kind}.`,
        field: 'kind',
      });
    }
    return {
      title: calculation.title,
      versionNumber,
      inputs: version.inputs as FlightProfileInput,
      fingerprint: version.fingerprint,
    };
  }

  /** The drift of the nominal flight, or a 422 naming what the version lacks for one. */
  private requireDrift(inputs: FlightProfileInput): DriftResult {
    if (!inputs.wind) {
      throw refuse('wind', 'Winds aloft', 'this version has none, so it has no ground track.');
    }
    if (inputs.launch.latitudeDeg === undefined || inputs.launch.longitudeDeg === undefined) {
      throw refuse(
        'launch.latitudeDeg',
        'Launch site latitude and longitude',
        'this version has none, so its track cannot be placed on a map.',
      );
    }
    const drift = flightDrift(inputs);
    if (!drift) {
      throw refuse('wind', 'Winds aloft', 'no wind could be read from this version for a track.');
    }
    return drift;
  }

  private trackText(flight: SavedFlight, file: Exclude<FlightExportFile, 'profile.csv'>): string {
    const drift = this.requireDrift(flight.inputs);
    const geography: FlightGeography = {
      title: flight.title,
      drift,
      // A flight that does not come down (float, no parachute) has no landing to spread.
      ...(drift.landed ? { landingArea: this.cachedLandingArea(flight) } : {}),
      ...(flight.inputs.launch.time ? { launchTime: flight.inputs.launch.time } : {}),
    };
    if (file === 'track.geojson') return flightGeoJsonText(geography);
    if (file === 'track.kml') return flightKml(geography);
    return flightGpx(geography);
  }

  /** The profile, with east and north where the version has winds and latitude and longitude where it also has a site. */
  private profileCsv(flight: SavedFlight): string {
    const { inputs } = flight;
    // Winds alone give the drift east and north; a launch site also places it on the map.
    const drift = inputs.wind ? flightDrift(inputs) : null;
    const hasSite = inputs.launch.latitudeDeg !== undefined;
    const table = flightProfileTable(
      evaluate(FLIGHT_KIND, inputs),
      drift,
      inputs.launch.time,
      hasSite,
    );
    const columns: ExportColumn<readonly (number | string | null)[]>[] = table.columns.map(
      (column, index) => ({ header: column.header, value: (row) => row[index] ?? null }),
    );
    return tableToCsv(columns, table.rows);
  }
}
