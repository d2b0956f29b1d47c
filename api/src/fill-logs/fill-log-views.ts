import type { FillLog as FillLogShape, UserRef } from '@loftwright/contract';
import type { FillLog } from './fill-log.entity';

/** A fill log as the API shows it (the contract's FillLog). */
export type FillLogView = FillLogShape;

export function fillLogView(log: FillLog, author: UserRef | null): FillLogView {
  return {
    id: log.id,
    calculationId: log.calculationId,
    versionNumber: log.versionNumber,
    filledAt: log.filledAt,
    place: log.place,
    envelopeLabel: log.envelopeLabel,
    envelopeId: log.envelopeId ?? null,
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
