import { describe, expect, it } from 'vitest';
import { parseCsv } from '@/lib/parse-csv';
import { readingsFromCsv } from './readings-from-csv';

const ambient = { temperatureK: 288.15, pressurePa: 101325 };

describe('readings from a logger CSV', () => {
  it('maps columns with their units into SI readings', () => {
    const parsed = parseCsv('minutes,scale_g,air_F\n0,210,59\n\n30,214.5,57.2\n');
    const { readings, bad } = readingsFromCsv(
      parsed,
      {
        time: { column: 'minutes', unit: 'min' },
        lift: { kind: 'ballast', column: 'scale_g', unit: 'g', ballastMassKg: 0.5 },
        temperature: { column: 'air_F', unit: 'degF' },
      },
      ambient,
      'point-comma',
    );
    expect(bad).toEqual([]);
    expect(readings).toHaveLength(2);
    // 30 min = 1800 s; 214.5 g = 0.2145 kg; 57.2 °F = 14 °C = 287.15 K (NIST SP 811, Appendix B).
    expect(readings[1]).toMatchObject({ kind: 'ballast', timeS: 1800, ballastMassKg: 0.5 });
    expect(readings[1]?.kind === 'ballast' && readings[1].scaleReadingKg).toBeCloseTo(0.2145, 12);
    expect(readings[1]?.airTemperatureK).toBeCloseTo(287.15, 9);
  });

  it('lists bad rows by their line in the file, with the reason, and keeps the good ones', () => {
    // Line 1 header; line 3 has no number; line 4 is blank; line 5 is colder than the model allows.
    const parsed = parseCsv(
      't_s,lift_kg,air_C\n0,0.30,12\n60,lots,12\n\n120,0.29,-150\n180,0.29,11\n',
    );
    const { readings, bad } = readingsFromCsv(
      parsed,
      {
        time: { column: 't_s', unit: 's' },
        lift: { kind: 'direct', column: 'lift_kg', unit: 'kg' },
        temperature: { column: 'air_C', unit: 'degC' },
      },
      ambient,
      'point-comma',
      { unitSystem: 'si', numberFormat: 'comma-space' },
    );
    expect(readings.map((reading) => reading.timeS)).toEqual([0, 180]);
    expect(bad.map((row) => row.line)).toEqual([3, 5]);
    expect(bad[0]?.reason).toMatch(/^Net lift does not start with a number/);
    // The engine's air-density range, 173.15–423.15 K, named in °C in the person's number format.
    expect(bad[1]?.reason).toBe('Air temperature must be between \u2212100 °C and 150 °C');
  });

  it('reads cells in the number format the file is said to use, refusing a cell that reads two ways', () => {
    const parsed = parseCsv('t;kg\n0;1,25\n60;1.250\n');
    const comma = readingsFromCsv(
      parsed,
      { time: { column: 't', unit: 's' }, lift: { kind: 'direct', column: 'kg', unit: 'kg' } },
      ambient,
      'comma-point',
    );
    // 1,25 is 1.25 in a decimal-comma file; 1.250 groups thousands there, so it is 1250 kg and
    // outside the net-lift range, listed by its line rather than read as 1.25.
    expect(comma.readings.map((reading) => reading.kind === 'direct' && reading.netLiftKg)).toEqual(
      [1.25],
    );
    expect(comma.bad.map((row) => row.line)).toEqual([3]);
    const point = readingsFromCsv(
      parseCsv('t,kg\n0,"1,250"\n'),
      { time: { column: 't', unit: 's' }, lift: { kind: 'direct', column: 'kg', unit: 'kg' } },
      ambient,
      'point-comma',
    );
    expect(point.bad[0]?.reason).toMatch(/could be 1\.25 or 1250/);
  });

  it('reports an empty cell by its column', () => {
    const parsed = parseCsv('t,kg\n0,\n');
    const { bad } = readingsFromCsv(
      parsed,
      { time: { column: 't', unit: 's' }, lift: { kind: 'direct', column: 'kg', unit: 'kg' } },
      ambient,
      'point-comma',
    );
    expect(bad).toEqual([{ line: 2, reason: 'lift (column "kg") is empty' }]);
  });
});
