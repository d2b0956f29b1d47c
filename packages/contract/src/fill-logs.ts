import type {
  CalculationResult,
  FillAmbient,
  FillReading,
  LiftInstrument,
} from '@loftwright/buoyancy';
import type { UserRef } from './common.js';

/** Where the gas of a fill came from. */
export const GAS_SOURCES = ['electrolysis', 'cylinder', 'delivered', 'other'] as const;
export type GasSource = (typeof GAS_SOURCES)[number];

/** A measured lift against the version's prediction at the same moment. */
export interface FillLogPoint {
  timeS: number;
  measuredKg: number;
  predictedKg: number | null;
}

/** GET /api/fill-logs/:id: a fill of a saved version, its readings and the engine's reading of them. */
export interface FillLog {
  id: string;
  calculationId: string;
  versionNumber: number;
  filledAt: string;
  place: string;
  envelopeLabel: string;
  /** The library envelope that was filled, if the log names one. */
  envelopeId: string | null;
  gasSource: GasSource;
  ambient: FillAmbient;
  readings: FillReading[];
  instrument: LiftInstrument | null;
  note: string;
  outputs: CalculationResult['outputs'];
  steps: CalculationResult['steps'];
  warnings: CalculationResult['warnings'];
  points: FillLogPoint[];
  engineVersion: string;
  createdBy: UserRef | null;
  createdAt: string;
  updatedAt: string;
}

/** POST /api/calculations/:id/versions/:n/fill-logs; PATCH /api/fill-logs/:id takes any part. */
export interface FillLogBody {
  filledAt: string;
  place?: string;
  envelopeLabel?: string;
  /** A library envelope (GET /api/envelopes); null on PATCH unlinks it. */
  envelopeId?: string | null;
  gasSource: GasSource;
  ambient: FillAmbient;
  readings: FillReading[];
  instrument?: LiftInstrument;
  note?: string;
}

/** POST /api/fill-logs/:id/readings: an import, added to or replacing what is there. */
export interface AddReadingsBody {
  mode: 'append' | 'replace';
  readings: FillReading[];
}
