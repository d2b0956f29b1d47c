import type { NumberFormat } from '@loftwright/buoyancy';
import { useMemo, useState } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { ParsedCsv } from '@/lib/parse-csv';
import {
  type ENERGY_UNITS,
  type MeterColumns,
  meterFromCsv,
  type POWER_UNITS,
} from '../lib/meter-from-csv';

export type MeterKind = 'power' | 'cumulative';

/**
 * A meter file and how its columns are read: which holds the time, which the power or the energy
 * so far, in which units and number format; and the energy they come to.
 */
export function useMeterMapping() {
  const preferences = useReadingPreferences();
  const [parsed, setParsed] = useState<ParsedCsv>();
  const [time, setTime] = useState<MeterColumns['time']>({ column: '', unit: 's' });
  const [kind, setKind] = useState<MeterKind>('power');
  const [valueColumn, setValueColumn] = useState('');
  const [valueUnit, setValueUnit] = useState<string>('W');
  const [fileFormat, setFileFormat] = useState<NumberFormat>(preferences.numberFormat);

  const mapped = useMemo(() => {
    if (!parsed || !time.column || !valueColumn) return undefined;
    const value =
      kind === 'power'
        ? { kind, column: valueColumn, unit: valueUnit as (typeof POWER_UNITS)[number] }
        : { kind, column: valueColumn, unit: valueUnit as (typeof ENERGY_UNITS)[number] };
    return meterFromCsv(parsed, { time, value }, fileFormat);
  }, [parsed, time, kind, valueColumn, valueUnit, fileFormat]);

  return {
    parsed,
    /** A freshly read file: time from its first column, the value from its second. */
    choose: (next: ParsedCsv) => {
      setParsed(next);
      setTime({ column: next.columns[0] ?? '', unit: 's' });
      setValueColumn(next.columns[1] ?? '');
    },
    time,
    setTime,
    kind,
    /** What the meter logs; the unit goes back to the first of that kind. */
    chooseKind: (next: MeterKind) => {
      setKind(next);
      setValueUnit(next === 'power' ? 'W' : 'Wh');
    },
    valueColumn,
    setValueColumn,
    valueUnit,
    setValueUnit,
    fileFormat,
    setFileFormat,
    mapped,
  };
}

export type MeterMapping = ReturnType<typeof useMeterMapping>;
