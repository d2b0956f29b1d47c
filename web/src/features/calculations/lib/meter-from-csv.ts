import {
  InputError,
  type MeterEnergy,
  meterEnergy,
  type MeterLog,
  type NumberFormat,
  parseQuantity,
} from '@loftwright/buoyancy';
import type { ParsedCsv } from '@/lib/parse-csv';

export const METER_TIME_UNITS = ['s', 'min', 'h'] as const;
export const POWER_UNITS = ['W', 'kW'] as const;
export const ENERGY_UNITS = ['Wh', 'kWh'] as const;

const capitalise = (text: string) => text.replace(/^./, (first) => first.toUpperCase());

export interface MeterColumns {
  time: { column: string; unit: (typeof METER_TIME_UNITS)[number] };
  value:
    | { kind: 'power'; column: string; unit: (typeof POWER_UNITS)[number] }
    | { kind: 'cumulative'; column: string; unit: (typeof ENERGY_UNITS)[number] };
}

/**
 * An energy meter's export as the energy used: each row read with its units, rows that cannot
 * be read listed by line, and the rest integrated by the engine. A sample out of order is
 * reported at its line too. Cells are read by the engine's reading rule in the file's number
 * format.
 */
export function meterFromCsv(
  parsed: ParsedCsv,
  columns: MeterColumns,
  numberFormat: NumberFormat,
): { energy?: MeterEnergy; bad: { line: number; reason: string }[] } {
  const bad = [...parsed.problems];
  const lines: number[] = [];
  const samples: { timeS: number; value: number }[] = [];
  for (const { line, cells } of parsed.rows) {
    try {
      const timeS = parseQuantity(
        `${cells[columns.time.column] ?? ''} ${columns.time.unit}`,
        'time',
        { field: 'time', numberFormat },
      );
      const value = parseQuantity(
        `${cells[columns.value.column] ?? ''} ${columns.value.unit}`,
        columns.value.kind === 'power' ? 'power' : 'energy',
        { field: columns.value.kind === 'power' ? 'power' : 'energy', numberFormat },
      );
      samples.push({ timeS, value });
      lines.push(line);
    } catch (error) {
      bad.push({
        line,
        reason:
          error instanceof InputError
            ? `${capitalise(error.field)} ${error.reason}`
            : String(error),
      });
    }
  }
  const log: MeterLog =
    columns.value.kind === 'power'
      ? { kind: 'power', samples: samples.map((s) => ({ timeS: s.timeS, powerW: s.value })) }
      : { kind: 'cumulative', samples: samples.map((s) => ({ timeS: s.timeS, energyJ: s.value })) };
  try {
    return { energy: meterEnergy(log), bad: bad.sort((a, b) => a.line - b.line) };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    for (const issue of error.issues) {
      const index = Number(issue.field.split('.')[1]);
      bad.push({
        line: Number.isInteger(index) ? (lines[index] ?? 0) : 0,
        reason: `${issue.field.split('.').pop() === 'timeS' ? 'Time' : 'Value'} ${issue.reason}`,
      });
    }
    return { bad: bad.sort((a, b) => a.line - b.line) };
  }
}
