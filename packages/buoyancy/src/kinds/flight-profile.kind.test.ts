import { describe, expect, it } from 'vitest';
import { geometricAltitudeM, standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { evaluate } from './registry.js';

const FT = 0.3048;
const output = (result: ReturnType<typeof evaluate>, name: string) =>
  result.outputs[name]?.value ?? Number.NaN;

describe('flight-profile: extensible envelope', () => {
  const launchDiameterM = 1.5;
  // U.S. Standard Atmosphere 1976 at 20 km geometric (PDAS table: δ = 0.054569, so p = 5529.2 Pa;
  // T = 216.65 K in the isothermal layer). With zero pressure difference V ∝ T/p, so the envelope
  // that is 1.5 m across at sea level (288.15 K, 101 325 Pa) reaches this diameter there:
  const burstDiameterM = launchDiameterM * ((216.65 / 5529.2) * (101325 / 288.15)) ** (1 / 3);
  const inputs = {
    envelope: { kind: 'extensible', launchDiameterM, burstDiameterM },
    envelopeMassKg: 0.35,
    payloadMassKg: 0.5,
    gas: { gasId: 'helium' },
    launch: { altitudeM: 0 },
    parachute: { areaM2: 0.6 },
  };

  it('bursts at 20 km where the 1976 table puts the matching pressure and temperature', () => {
    const result = evaluate('flight-profile', inputs);
    // The table's five-digit pressure fixes the altitude to about ±7 m.
    expect(Math.abs(output(result, 'burstAltitude') - 20000)).toBeLessThan(10);
  });

  it('keeps the free lift constant on the way up, as Archimedes and the ideal-gas law require', () => {
    // A zero-pressure envelope displaces n·M_air of air at every height (ρ·V = n·M·R/R*), so free
    // lift does not change during the ascent (textbook result).
    const series = evaluate('flight-profile', inputs).series?.ascent;
    const freeLiftColumn = series?.columns.findIndex((column) => column.key === 'freeLift') ?? -1;
    const lifts = series?.rows.map((row) => row[freeLiftColumn] ?? Number.NaN) ?? [];
    expect(lifts.length).toBeGreaterThan(100);
    const first = lifts[0] ?? Number.NaN;
    for (const lift of lifts) expect(Math.abs(lift / first - 1)).toBeLessThan(1e-9);
  });

  it('converges in the time step: 1 s and 0.1 s steps agree on the time to burst within 1e-4', () => {
    const coarse = output(evaluate('flight-profile', inputs), 'ascentTime');
    const fine = output(evaluate('flight-profile', { ...inputs, timeStepS: 0.1 }), 'ascentTime');
    expect(Math.abs(coarse / fine - 1)).toBeLessThan(1e-4);
  });

  it('descends under the canopy at √(2·m·g/(ρ·C_d·A)) at landing and adds up the flight time', () => {
    const result = evaluate('flight-profile', inputs);
    // Sea level of the 1976 standard: ρ = 1.2250 kg/m³, g = 9.806 65 m/s².
    expect(output(result, 'landingDescentRate')).toBeCloseTo(
      Math.sqrt((2 * 0.85 * 9.80665) / (1.225 * 1.0 * 0.6)),
      3,
    );
    expect(output(result, 'flightTime')).toBeCloseTo(
      output(result, 'ascentTime') + output(result, 'descentTime'),
      6,
    );
    expect(result.series?.descent?.rows.at(-1)?.[1]).toBeCloseTo(0, 6);
  });

  it.each([
    // U.S. Navy Aerographer's Mate training manual (NAVEDTRA 14270): about 40 ft³ of helium for
    // about 700 g free lift on a 100 g balloon, and about 70 ft³ for 900 g on a 300 g balloon,
    // give the 900–1000 ft/min of U.S. radiosonde practice. The default drag coefficient must
    // reproduce that range at launch.
    { heliumFt3: 40, balloonKg: 0.1, freeLiftKg: 0.7 },
    { heliumFt3: 70, balloonKg: 0.3, freeLiftKg: 0.9 },
  ])(
    'rises at 900–1000 ft/min with $heliumFt3 ft³ of helium and $freeLiftKg kg free lift',
    ({ heliumFt3, balloonKg, freeLiftKg }) => {
      const volumeM3 = heliumFt3 * FT ** 3;
      const launchDiameterM = Math.cbrt((6 * volumeM3) / Math.PI);
      const envelope = { kind: 'extensible', launchDiameterM, burstDiameterM: launchDiameterM * 4 };
      const base = {
        envelope,
        envelopeMassKg: balloonKg,
        gas: { gasId: 'helium' },
        launch: { altitudeM: 0 },
      };
      const gross =
        output(evaluate('flight-profile', { ...base, payloadMassKg: 0 }), 'freeLift') + balloonKg;
      const result = evaluate('flight-profile', {
        ...base,
        payloadMassKg: gross - balloonKg - freeLiftKg,
      });
      expect(output(result, 'freeLift')).toBeCloseTo(freeLiftKg, 9);
      const ftPerMin = (output(result, 'launchAscentRate') / FT) * 60;
      expect(ftPerMin).toBeGreaterThan(900);
      expect(ftPerMin).toBeLessThan(1000);
    },
  );

  it('warns without a parachute and when there is no free lift', () => {
    const noChute = evaluate('flight-profile', { ...inputs, parachute: undefined });
    expect(noChute.warnings.map((warning) => warning.code)).toEqual(
      expect.arrayContaining(['no-parachute', 'free-balloon-rules']),
    );
    const heavy = evaluate('flight-profile', { ...inputs, payloadMassKg: 5 });
    expect(heavy.warnings.map((warning) => warning.code)).toContain('no-ascent');
    expect(heavy.outputs.burstAltitude).toBeUndefined();
  });

  it('refuses a burst diameter smaller than the launch diameter', () => {
    expect(() =>
      evaluate('flight-profile', {
        ...inputs,
        envelope: { kind: 'extensible', launchDiameterM: 2, burstDiameterM: 1.5 },
      }),
    ).toThrow(/burstDiameterM/);
  });
});

describe('flight-profile: fixed-volume envelope', () => {
  it('floats where the 1976 air density equals its mass over its volume (11 km′ boundary)', () => {
    // U.S. Standard Atmosphere 1976, Table I: ρ = 0.363 92 kg/m³ at geopotential 11 km′.
    const diameterM = 1.2;
    const volumeM3 = (Math.PI * diameterM ** 3) / 6;
    const shape = { shape: 'sphere', diameterM };
    const probe = evaluate('flight-profile', {
      envelope: { kind: 'fixed', shape },
      envelopeMassKg: 0,
      payloadMassKg: 0,
      gas: { gasId: 'helium' },
      launch: { altitudeM: 0 },
    });
    // With nothing carried, free lift is the displaced air less the gas.
    const gasMassKg = volumeM3 * standardAtmosphere(0).densityKgM3 - output(probe, 'freeLift');
    const carriedKg = 0.36392 * volumeM3 - gasMassKg;
    const result = evaluate('flight-profile', {
      envelope: { kind: 'fixed', shape },
      envelopeMassKg: carriedKg * 0.4,
      payloadMassKg: carriedKg * 0.6,
      gas: { gasId: 'helium' },
      launch: { altitudeM: 0 },
    });
    expect(Math.abs(output(result, 'floatAltitude') - geometricAltitudeM(11000))).toBeLessThan(3);
    expect(output(result, 'floatSuperpressure')).toBeGreaterThan(0);
    expect(output(result, 'ascentTime')).toBeGreaterThan(0);
  });
});
