import * as z from 'zod';
import { quantity } from '../schema/quantity-schema.js';
import { LAUNCH_LATITUDE_RANGE_DEG } from './drift.js';

/** An angle in degrees with its range: typed with decimals, read as degrees when bare. */
export function angleDeg(min: number, max: number, description: string) {
  return quantity('angle', min, max, description);
}

/** Latitude of the launch site (optional; needed with longitude for a ground track on a map). */
export const launchLatitudeSchema = angleDeg(
  LAUNCH_LATITUDE_RANGE_DEG.min,
  LAUNCH_LATITUDE_RANGE_DEG.max,
  'latitude of the launch site on WGS 84, north positive (for the landing point on a map)',
).optional();

export const launchLongitudeSchema = angleDeg(
  -180,
  180,
  'longitude of the launch site, east positive (for the landing point on a map)',
).optional();

/** Launch time: ISO 8601 date and time with its offset (`2026-12-04T09:30:00+01:00` or `…Z`). */
export const launchTimeSchema = z.iso
  .datetime({
    offset: true,
    error: 'must be a date and time in ISO 8601 with its offset, e.g. 2026-12-04T09:30:00+01:00',
  })
  .meta({ description: 'launch time, ISO 8601 with offset (to match the wind forecast)' })
  .optional();

/** Both coordinates of the site or neither: refuses the one missing, by its field. */
export function requireBothCoordinates(
  launch: { latitudeDeg?: number | undefined; longitudeDeg?: number | undefined },
  context: z.core.$RefinementCtx,
): void {
  const hasLatitude = launch.latitudeDeg !== undefined;
  const hasLongitude = launch.longitudeDeg !== undefined;
  if (hasLatitude && !hasLongitude) {
    context.addIssue({
      code: 'custom',
      path: ['longitudeDeg'],
      message: 'is required with the latitude of the launch site',
    });
  }
  if (hasLongitude && !hasLatitude) {
    context.addIssue({
      code: 'custom',
      path: ['latitudeDeg'],
      message: 'is required with the longitude of the launch site',
    });
  }
}
