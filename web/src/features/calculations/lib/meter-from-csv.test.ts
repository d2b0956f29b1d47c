import { describe, expect, it } from 'vitest';
import { parseCsv } from '@/lib/parse-csv';
import { meterFromCsv } from './meter-from-csv';

describe('energy from a meter CSV', () => {
  it('integrates power samples given in kW against minutes', () => {
    // 1.2 kW held for 30 min: 1200 W × 1800 s = 2.16 MJ = 600 Wh.
    const parsed = parseCsv('minute,kw\n0,1.2\n10,1.2\n30,1.2\n');
    const { energy, bad } = meterFromCsv(
      parsed,
      {
        time: { column: 'minute', unit: 'min' },
        value: { kind: 'power', column: 'kw', unit: 'kW' },
      },
      'point-comma',
    );
    expect(bad).toEqual([]);
    expect(energy?.energyJ).toBeCloseTo(2.16e6, 6);
  });

  it('reads a decimal-comma meter file when told the file writes numbers that way', () => {
    // 1,2 kW for 30 min = 600 Wh, as in the first case.
    const parsed = parseCsv('minute;kw\n0;1,2\n30;1,2\n');
    const { energy, bad } = meterFromCsv(
      parsed,
      {
        time: { column: 'minute', unit: 'min' },
        value: { kind: 'power', column: 'kw', unit: 'kW' },
      },
      'comma-space',
    );
    expect(bad).toEqual([]);
    expect(energy?.energyJ).toBeCloseTo(2.16e6, 6);
  });

  it('reads a cumulative register in kWh and lists unreadable and out-of-order rows by line', () => {
    const parsed = parseCsv('t_h,total_kwh\n0,10.00\n0.5,n/a\n1,10.40\n0.75,10.45\n');
    const { energy, bad } = meterFromCsv(
      parsed,
      {
        time: { column: 't_h', unit: 'h' },
        value: { kind: 'cumulative', column: 'total_kwh', unit: 'kWh' },
      },
      'point-comma',
    );
    expect(energy).toBeUndefined();
    expect(bad.map((row) => row.line)).toEqual([3, 5]);
    expect(bad[0]?.reason).toMatch(/^Energy does not start with a number/);
    expect(bad[1]?.reason).toMatch(/^Time must be later than the sample before it/);
  });
});
