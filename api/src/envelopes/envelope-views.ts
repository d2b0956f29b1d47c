import type { Envelope as EnvelopeView, EnvelopeFill } from '@loftwright/contract';
import type { Calculation } from '../calculations/calculation.entity';
import type { FillLog } from '../fill-logs/fill-log.entity';
import type { Envelope } from './envelope.entity';

export function envelopeView(
  envelope: Envelope,
  /** Fills of calculations the reader may open. */
  fillCount: number,
  /** The reader may remove it: a manager, and no fill log at all names it. */
  mayRemove: boolean,
  mayManage: boolean,
): EnvelopeView {
  return {
    id: envelope.id,
    name: envelope.name,
    kind: envelope.kind,
    massKg: envelope.massKg,
    burstDiameterM: envelope.burstDiameterM,
    ratedSuperpressurePa: envelope.ratedSuperpressurePa,
    dragCoefficient: envelope.dragCoefficient,
    film: envelope.film,
    notes: envelope.notes,
    version: envelope.version,
    fillCount,
    permissions: { edit: mayManage, remove: mayRemove },
    createdAt: envelope.createdAt.toISOString(),
    updatedAt: envelope.updatedAt.toISOString(),
  };
}

/** A value [kg] of the fill log's stored outputs, as the engine reduced it on the server. */
function storedKg(log: FillLog, name: string): number | null {
  const output = (log.outputs as Record<string, { value: number } | undefined>)[name];
  return typeof output?.value === 'number' ? output.value : null;
}

export function envelopeFill(log: FillLog, calculation: Calculation): EnvelopeFill {
  return {
    fillLogId: log.id,
    calculationId: log.calculationId,
    calculationTitle: calculation.title,
    versionNumber: log.versionNumber,
    filledAt: log.filledAt,
    place: log.place,
    measuredNetLiftKg: storedKg(log, 'measuredNetLift'),
    predictedNetLiftKg: storedKg(log, 'predictedNetLift'),
  };
}
