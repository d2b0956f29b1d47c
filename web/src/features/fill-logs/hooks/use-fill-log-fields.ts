import { type FillReading, INSTRUMENT_DEFAULTS } from '@loftwright/buoyancy';
import { useState } from 'react';
import type { FillLogBody } from '../api/fill-logs-api';
import { airOfVersion, NO_AIR, type VersionAir } from '../lib/air-of-version';

/** The version a fill is logged against, as far as it has been read from the server. */
export type FillLogVersion =
  | { status: 'pending' }
  | { status: 'error'; message: string }
  | { status: 'success'; inputs: unknown };

/** One lift reading as typed: any number may not read (yet). */
export interface ReadingRow {
  kind: 'ballast' | 'direct';
  timeS?: number;
  ballastMassKg?: number;
  scaleReadingKg?: number;
  netLiftKg?: number;
}

const localNow = () => {
  const now = new Date();
  now.setMinutes(now.getMinutes() - now.getTimezoneOffset());
  return now.toISOString().slice(0, 16);
};

const startingAir = (version: FillLogVersion): VersionAir =>
  version.status === 'success' ? airOfVersion(version.inputs) : NO_AIR;

/** A reading row as the server takes it, once every number it needs reads. */
function toReading(row: ReadingRow): FillReading | undefined {
  if (row.timeS === undefined) return undefined;
  if (row.kind === 'ballast') {
    if (row.ballastMassKg === undefined || row.scaleReadingKg === undefined) return undefined;
    return {
      kind: 'ballast',
      timeS: row.timeS,
      ballastMassKg: row.ballastMassKg,
      scaleReadingKg: row.scaleReadingKg,
    };
  }
  if (row.netLiftKg === undefined) return undefined;
  return { kind: 'direct', timeS: row.timeS, netLiftKg: row.netLiftKg };
}

/**
 * Every field of the fill-log form: when and where, the air (starting from the air the version
 * was computed for), the instruments, the readings and the note.
 */
export function useFillLogFields(version: FillLogVersion) {
  const air = startingAir(version);
  const [filledAt, setFilledAt] = useState(localNow);
  const [place, setPlace] = useState('');
  const [envelopeLabel, setEnvelopeLabel] = useState('');
  /** The library envelope filled, if the person names one. */
  const [envelopeId, setEnvelopeId] = useState<string | undefined>();
  const [gasSource, setGasSource] = useState<FillLogBody['gasSource']>('cylinder');
  const [temperatureK, setTemperatureK] = useState<number | undefined>(air.temperatureK);
  const [pressurePa, setPressurePa] = useState<number | undefined>(air.pressurePa);
  const [relativeHumidity, setRelativeHumidity] = useState<number | undefined>(
    air.relativeHumidity,
  );
  // The version arriving after the dialog opened (the fields are not shown until then): the air
  // starts from it, as React recommends, by adjusting state while rendering.
  const [airFrom, setAirFrom] = useState(version.status);
  if (airFrom !== version.status) {
    setAirFrom(version.status);
    setTemperatureK(air.temperatureK);
    setPressurePa(air.pressurePa);
    setRelativeHumidity(air.relativeHumidity);
  }
  const [scaleResolutionKg, setScaleResolutionKg] = useState<number | undefined>(
    INSTRUMENT_DEFAULTS.scaleResolutionKg,
  );
  const [ballastToleranceKg, setBallastToleranceKg] = useState<number | undefined>(
    INSTRUMENT_DEFAULTS.ballastToleranceKg,
  );
  const [note, setNote] = useState('');
  const [rows, setRows] = useState<ReadingRow[]>([{ kind: 'ballast', timeS: 0 }]);

  return {
    /** The air the version was computed for, where the fields started. */
    air,
    filledAt,
    setFilledAt,
    place,
    setPlace,
    envelopeLabel,
    setEnvelopeLabel,
    envelopeId,
    setEnvelopeId,
    gasSource,
    setGasSource,
    temperatureK,
    setTemperatureK,
    pressurePa,
    setPressurePa,
    relativeHumidity,
    setRelativeHumidity,
    scaleResolutionKg,
    setScaleResolutionKg,
    ballastToleranceKg,
    setBallastToleranceKg,
    note,
    setNote,
    rows,
    setRow: (index: number, change: Partial<ReadingRow>) =>
      setRows((current) => current.map((row, i) => (i === index ? { ...row, ...change } : row))),
    /** A new reading of the last one's kind, with its ballast. */
    addRow: () =>
      setRows((current) => [
        ...current,
        { kind: current.at(-1)?.kind ?? 'ballast', ballastMassKg: current.at(-1)?.ballastMassKg },
      ]),
    removeLastRow: () => setRows((current) => current.slice(0, -1)),
  };
}

export type FillLogFields = ReturnType<typeof useFillLogFields>;

/** The numbers the fill log needs, once every one of them reads; undefined before. */
function readNumbers(fields: FillLogFields) {
  const { temperatureK, pressurePa, scaleResolutionKg, ballastToleranceKg } = fields;
  const readings = fields.rows.map(toReading);
  if (
    temperatureK === undefined ||
    pressurePa === undefined ||
    fields.filledAt === '' ||
    scaleResolutionKg === undefined ||
    ballastToleranceKg === undefined ||
    !readings.every((reading) => reading !== undefined)
  )
    return undefined;
  return {
    temperatureK,
    pressurePa,
    scaleResolutionKg,
    ballastToleranceKg,
    readings: readings as FillReading[],
  };
}

/** Whether every field the fill log needs reads. */
export const isComplete = (fields: FillLogFields) => readNumbers(fields) !== undefined;

/** The fill log to send, once every field it needs reads (`isComplete`). */
export function fillLogDraftOf(fields: FillLogFields): FillLogBody | undefined {
  const numbers = readNumbers(fields);
  if (!numbers) return undefined;
  const { relativeHumidity } = fields;
  return {
    filledAt: new Date(fields.filledAt).toISOString(),
    place: fields.place,
    envelopeLabel: fields.envelopeLabel,
    ...(fields.envelopeId ? { envelopeId: fields.envelopeId } : {}),
    gasSource: fields.gasSource,
    ambient: {
      temperatureK: numbers.temperatureK,
      pressurePa: numbers.pressurePa,
      ...(relativeHumidity === undefined ? {} : { relativeHumidity }),
    },
    readings: numbers.readings,
    instrument: {
      scaleResolutionKg: numbers.scaleResolutionKg,
      ballastToleranceKg: numbers.ballastToleranceKg,
    },
    note: fields.note,
  };
}
