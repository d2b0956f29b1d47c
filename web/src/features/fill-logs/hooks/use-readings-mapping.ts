import type { NumberFormat } from '@loftwright/buoyancy';
import { useMemo, useState } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { ParsedCsv } from '@/lib/parse-csv';
import type { FillLog } from '../api/fill-logs-api';
import { type MASS_UNITS, type ReadingColumns, readingsFromCsv } from '../lib/readings-from-csv';

export type LiftKind = 'ballast' | 'direct';

/** The column whose header looks like it, for a first guess the user can change. */
const guess = (columns: string[], pattern: RegExp) =>
  columns.find((column) => pattern.test(column));

/**
 * A logger's CSV file of lift readings and how its columns are read: time, lift (under a ballast
 * or net), air temperature and pressure, with their units and the file's number format; and the
 * readings they come to, each bad row listed by line.
 */
export function useReadingsMapping(log: FillLog) {
  const { numberFormat } = useReadingPreferences();
  const [fileFormat, setFileFormat] = useState<NumberFormat>(numberFormat);
  const [parsed, setParsed] = useState<ParsedCsv>();
  const [time, setTime] = useState<ReadingColumns['time']>({ column: '', unit: 's' });
  const [liftKind, setLiftKind] = useState<LiftKind>('ballast');
  const [liftColumn, setLiftColumn] = useState('');
  const [massUnit, setMassUnit] = useState<(typeof MASS_UNITS)[number]>('kg');
  const first = log.readings[0];
  const [ballastMassKg, setBallastMassKg] = useState<number | undefined>(
    first?.kind === 'ballast' ? first.ballastMassKg : undefined,
  );
  const [temperature, setTemperature] = useState<ReadingColumns['temperature']>();
  const [pressure, setPressure] = useState<ReadingColumns['pressure']>();

  /** A freshly read file: each column guessed from its header. */
  const choose = (next: ParsedCsv) => {
    setParsed(next);
    setTime({
      column: guess(next.columns, /time|^t\b|^t_|min|hour|sec/i) ?? next.columns[0] ?? '',
      unit: 's',
    });
    setLiftColumn(guess(next.columns, /scale|lift|kg|mass|weight/i) ?? next.columns[1] ?? '');
    const air = guess(next.columns, /temp|air/i);
    setTemperature(air ? { column: air, unit: 'degC' } : undefined);
    const baro = guess(next.columns, /press|baro|hpa/i);
    setPressure(baro ? { column: baro, unit: 'hPa' } : undefined);
  };

  const mapped = useMemo(() => {
    if (!parsed || !time.column || !liftColumn) return undefined;
    if (liftKind === 'ballast' && ballastMassKg === undefined) return undefined;
    const columns: ReadingColumns = {
      time,
      lift:
        liftKind === 'ballast'
          ? {
              kind: 'ballast',
              column: liftColumn,
              unit: massUnit,
              ballastMassKg: ballastMassKg ?? 0,
            }
          : { kind: 'direct', column: liftColumn, unit: massUnit },
      ...(temperature ? { temperature } : {}),
      ...(pressure ? { pressure } : {}),
    };
    return readingsFromCsv(parsed, columns, log.ambient, fileFormat);
  }, [
    parsed,
    time,
    liftKind,
    liftColumn,
    massUnit,
    ballastMassKg,
    temperature,
    pressure,
    log.ambient,
    fileFormat,
  ]);

  return {
    parsed,
    choose,
    fileFormat,
    setFileFormat,
    time,
    setTime,
    liftKind,
    setLiftKind,
    liftColumn,
    setLiftColumn,
    massUnit,
    setMassUnit,
    ballastMassKg,
    setBallastMassKg,
    temperature,
    setTemperature,
    pressure,
    setPressure,
    mapped,
  };
}

export type ReadingsMapping = ReturnType<typeof useReadingsMapping>;
