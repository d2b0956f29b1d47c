import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { readWindProfile } from './read-wind-profile.js';
import { windAt } from './wind-profile.js';

describe('readWindProfile', () => {
  it('reads named CSV columns in feet, knots and °F, converting to SI', () => {
    const text = [
      'Forecast for the launch site',
      'alt_ft,dir,spd_kt,temp_F',
      '1000,270,10,59',
      '5000,280,20,41',
      '',
      '10000,290,30,23',
    ].join('\n');
    const reading = readWindProfile(text, {
      skipLines: 1,
      height: { column: 'alt_ft', unit: 'ft' },
      direction: { column: 'dir' },
      speed: { column: 'spd_kt', unit: 'kn' },
      temperature: { column: 'temp_F', unit: '°F' },
    });
    expect(reading.bad).toEqual([]);
    expect(reading.columns).toEqual(['alt_ft', 'dir', 'spd_kt', 'temp_F']);
    expect(reading.lines).toEqual([3, 4, 6]);
    // NIST SP 811, Appendix B: 1 ft = 0.3048 m, 1 kn = 1852/3600 m/s (exact); 59 °F = 15 °C =
    // 288.15 K (the standard sea-level temperature, 15 °C, 59 °F).
    expect(reading.layers[0]?.heightM).toBeCloseTo(304.8, 9);
    expect(reading.layers[1]?.speedMS).toBeCloseTo(20 * (1852 / 3600), 12);
    expect(reading.layers[0]?.temperatureK).toBeCloseTo(288.15, 9);
    expect(reading.profile?.heightsM).toHaveLength(3);
  });

  it('reads a whitespace listing by column position in mb, km/h, mph and km', () => {
    const text = ['  1000.0  250   36', '   850.0  260   72', '   700.0  270  108'].join('\n');
    const reading = readWindProfile(text, {
      pressure: { column: 1, unit: 'mb' },
      direction: { column: 2 },
      speed: { column: 3, unit: 'km/h' },
    });
    expect(reading.bad).toEqual([]);
    expect(reading.layers.map((layer) => layer.pressurePa)).toEqual([100000, 85000, 70000]);
    expect(reading.layers[0]?.speedMS).toBeCloseTo(10, 12);
    // 29.92 inHg is 1013.2 hPa (standard sea-level pressure as aviation states it), NIST SP 811:
    // 1 inHg (conventional) = 3386.389 Pa.
    const inHg = readWindProfile('29.92 0 10\n20.00 0 10', {
      pressure: { column: 1, unit: 'inHg' },
      direction: { column: 2 },
      speed: { column: 3, unit: 'mph' },
    });
    expect((inHg.layers[0]?.pressurePa ?? 0) / 100).toBeCloseTo(1013.2, 1);
    // NIST SP 811: 1 mi/h = 0.44704 m/s.
    expect(inHg.layers[0]?.speedMS).toBeCloseTo(4.4704, 12);
    const km = readWindProfile('0.5;90;1,5\n1,5;90;2', {
      height: { column: 1, unit: 'km' },
      direction: { column: 2 },
      speed: { column: 3, unit: 'm/s' },
      numberFormat: 'comma-point',
    });
    expect(km.layers.map((layer) => layer.heightM)).toEqual([500, 1500]);
    expect(km.layers[0]?.speedMS).toBe(1.5);
  });

  it('lists every bad line by number with the reason and keeps the rest', () => {
    const text = [
      'height,direction,speed,temperature', // 1
      '100,270,5,15', // 2
      '200,,5,14', // 3: empty direction
      '300,270,abc,13', // 4: unreadable speed
      '400,400,5,12', // 5: direction out of range
      '50,270,5,12', // 6: not above the line before
      '500,270,5,11', // 7
      '600,270,500,10', // 8: speed out of range
      '# a comment', // 9
      '700,270,5,9', // 10
    ].join('\n');
    const reading = readWindProfile(text, {
      height: { column: 'height', unit: 'm' },
      direction: { column: 'direction' },
      speed: { column: 'speed', unit: 'm/s' },
      temperature: { column: 'temperature', unit: '°C' },
    });
    expect(reading.lines).toEqual([2, 7, 10]);
    expect(reading.bad.map((bad) => bad.line)).toEqual([3, 4, 5, 6, 8]);
    expect(reading.bad[0]?.reason).toMatch(/direction \(column 2\) is empty/);
    expect(reading.bad[1]?.reason).toMatch(/speed \(column 3\) “abc”/);
    expect(reading.bad[2]?.reason).toMatch(/direction 400 must be between 0 and 360/);
    expect(reading.bad[3]?.reason).toMatch(
      /height 50 m is not above the level before it \(100 m\)/,
    );
    expect(reading.bad[4]?.reason).toMatch(/speed in m\/s 500 must be between 0 and 150 m\/s/);
    expect(reading.profile?.heightsM).toEqual(new Float64Array([100, 500, 700]));
  });

  it('turns a downward listing round', () => {
    const reading = readWindProfile('3000 90 10\n2000 90 10\n1000 90 10', {
      height: { column: 1, unit: 'm' },
      direction: { column: 2 },
      speed: { column: 3, unit: 'm/s' },
    });
    expect(reading.lines).toEqual([3, 2, 1]);
    expect(Array.from(reading.profile?.heightsM ?? [])).toEqual([1000, 2000, 3000]);
  });

  it('places pressure levels by the temperature column when there is one', () => {
    // A sounding's surface line gives both; the others only pressure and temperature.
    const reading = readWindProfile(
      'PRES HGHT TEMP DWPT DRCT SKNT\n1000 111 20 10 180 10\n850 x 10 0 200 20\n700 x 0 -10 220 30',
      {
        pressure: { column: 'PRES', unit: 'hPa' },
        height: { column: 'HGHT', unit: 'm' },
        temperature: { column: 'TEMP', unit: '°C' },
        dewPoint: { column: 'DWPT', unit: '°C' },
        direction: { column: 'DRCT' },
        speed: { column: 'SKNT', unit: 'kn' },
      },
    );
    // With both columns mapped a line needs only one of them, but a cell that does not read
    // ("x") is a bad line, not a blank.
    expect(reading.bad.map((bad) => bad.line)).toEqual([3, 4]);
    const blanks = readWindProfile(
      'PRES,HGHT,TEMP,DWPT,DRCT,SKNT\n1000,111,20,10,180,10\n850,,10,0,200,20\n700,,0,-10,220,30',
      {
        pressure: { column: 'PRES', unit: 'hPa' },
        height: { column: 'HGHT', unit: 'm' },
        temperature: { column: 'TEMP', unit: '°C' },
        dewPoint: { column: 'DWPT', unit: '°C' },
        direction: { column: 'DRCT' },
        speed: { column: 'SKNT', unit: 'kn' },
      },
    );
    expect(blanks.bad).toEqual([]);
    expect(blanks.profile?.heightSources).toEqual(['given', 'hypsometric', 'hypsometric']);
    const heights = blanks.profile?.heightsM ?? new Float64Array();
    // Hypsometric thickness 1000–850 hPa at a mean virtual temperature near 15 °C + 1 K: about
    // 29.3 m/K·289 K·ln(1000/850) ≈ 1376 m (Wallace & Hobbs, Atmospheric Science, §3.2.2).
    expect((heights[1] ?? 0) - 111).toBeGreaterThan(1360);
    expect((heights[1] ?? 0) - 111).toBeLessThan(1390);
    expect(blanks.profile && windAt(blanks.profile, 111).directionDeg).toBeCloseTo(180, 9);
  });

  it('says why there is no profile when fewer than two lines read', () => {
    const reading = readWindProfile('100 270 5\nfoo bar baz', {
      height: { column: 1, unit: 'm' },
      direction: { column: 2 },
      speed: { column: 3, unit: 'm/s' },
    });
    expect(reading.profile).toBeUndefined();
    expect(reading.problem).toMatch(/Only 1 usable line/);
    expect(reading.bad[0]?.line).toBe(2);
  });

  it('refuses a mapping it cannot use, naming the mapping field', () => {
    const error = (() => {
      try {
        readWindProfile('a,b,c\n1,2,3', {
          height: { column: 'altitude', unit: 'm' },
          direction: { column: 'b' },
          speed: { column: 'c', unit: 'm/s' },
        });
      } catch (caught) {
        return caught;
      }
      return undefined;
    })();
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('mapping.height.column');
    expect(() =>
      readWindProfile('1 2 3', { direction: { column: 2 }, speed: { column: 3, unit: 'm/s' } }),
    ).toThrow(/mapping.height/);
  });
});
