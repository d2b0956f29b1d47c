import type { FillCard } from '@loftwright/buoyancy';

/**
 * Query of GET /api/calculations/:id/versions/:number/fill-card (and `.pdf`): what the crew types,
 * in SI. `freeLiftKg` defaults to the version's own; the cylinder fields go together.
 */
export interface FillCardQuery {
  fillerMassKg: number;
  freeLiftKg?: number;
  cylinderWaterVolumeM3?: number;
  /** Gauge pressure of a full cylinder [Pa]. */
  cylinderFillPressurePa?: number;
  cylinderTemperatureK?: number;
  cylinderCount?: number;
}

/**
 * GET /api/calculations/:id/versions/:number/fill-card: the engine's fill card of the version,
 * recomputed from its saved inputs, with what identifies the version on the printed card.
 */
export interface FillCardAnswer {
  calculationId: string;
  title: string;
  kind: string;
  kindTitle: string;
  versionNumber: number;
  fingerprint: string;
  engineVersion: string;
  /** The verify page of the fingerprint, with host; printed and drawn as a QR code. */
  verifyUrl: string;
  card: FillCard;
}
