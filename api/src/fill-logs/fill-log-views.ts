import type { FillLog } from './fill-log.entity';

export interface FillLogView {
  id: string;
  calculationId: string;
  versionNumber: number;
  filledAt: string;
  place: string;
  envelopeLabel: string;
  gasSource: string;
  ambient: unknown;
  readings: unknown[];
  instrument: { scaleResolutionKg: number; ballastToleranceKg: number } | null;
  note: string;
  outputs: unknown;
  steps: unknown;
  warnings: unknown;
  points: unknown;
  engineVersion: string;
  createdBy: { id: string; displayName: string } | null;
  createdAt: string;
  updatedAt: string;
}

export function fillLogView(
  log: FillLog,
  author: { id: string; displayName: string } | null,
): FillLogView {
  return {
    id: log.id,
    calculationId: log.calculationId,
    versionNumber: log.versionNumber,
    filledAt: log.filledAt,
    place: log.place,
    envelopeLabel: log.envelopeLabel,
    gasSource: log.gasSource,
    ambient: log.ambient,
    readings: log.readings,
    instrument: log.instrument,
    note: log.note,
    outputs: log.outputs,
    steps: log.steps,
    warnings: log.warnings,
    points: log.points,
    engineVersion: log.engineVersion,
    createdBy: author,
    createdAt: log.createdAt.toISOString(),
    updatedAt: log.updatedAt.toISOString(),
  };
}
