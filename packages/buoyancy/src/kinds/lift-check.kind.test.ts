import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { evaluate } from './registry.js';

const base = {
  envelope: { shape: 'sphere', diameterM: 1 },
  envelopeMass: { kind: 'fixed', massKg: 0.1 },
  payloadMassKg: 0.2,
  gas: { gasId: 'hydrogen' },
  ambient: { mode: 'standard', altitudeM: 0, temperatureOffsetK: -15 },
};

describe('lift-check', () => {
  it('gives 1.2023 kg/m3 gross lift for hydrogen and 1.1137 for helium at 0 °C, 1 atm, dry', () => {
    // Reference check values §3.4 (ideal gas, dry air M0 = 28.9644 g/mol, 101.325 kPa, 0 °C):
    // gross lift 1.202 31 kg/m3 for H2 and 1.113 67 kg/m3 for He. The standard atmosphere at sea
    // level with ΔT = −15 K is exactly 273.15 K and 101 325 Pa.
    const volumeM3 = Math.PI / 6;
    for (const [gasId, expected] of [
      ['hydrogen', 1.20231],
      ['helium', 1.11367],
    ] as const) {
      const result = evaluate('lift-check', { ...base, gas: { gasId } });
      const perCubicMetre = (result.outputs.grossLift?.value ?? Number.NaN) / volumeM3;
      expect(Math.abs(perCubicMetre / expected - 1)).toBeLessThan(1e-4);
    }
  });

  it('computes the net lift of a 163 cm circumference hydrogen sphere within 3 % of 56.6 g', () => {
    // common practice, no published source: a practitioner's worked example — a sphere of about
    // 163 cm measured circumference (about 51.8 cm diameter, 73 litres) with a 24.6 g envelope,
    // filled with hydrogen indoors (20 °C, 101.325 kPa), computes to a net lift of about 56.6 g.
    const result = evaluate('lift-check', {
      envelope: { shape: 'sphere-circumference', circumferenceM: 1.63 },
      envelopeMass: { kind: 'fixed', massKg: 0.0246 },
      payloadMassKg: 0,
      gas: { gasId: 'hydrogen' },
      ambient: { mode: 'measured', temperatureK: 293.15, pressurePa: 101325 },
    });
    expect(result.outputs.volume?.value).toBeCloseTo(0.0731, 4);
    const netLiftG = (result.outputs.netLift?.value ?? Number.NaN) * 1000;
    expect(Math.abs(netLiftG / 56.6 - 1)).toBeLessThan(0.03);
  });

  it('returns every output with a step, its unit, and a derivation whose steps are all complete', () => {
    const result = evaluate('lift-check', base);
    const stepIds = new Set(result.steps.map((step) => step.id));
    expect(Object.keys(result.outputs)).toEqual(
      expect.arrayContaining([
        'grossLift',
        'netLift',
        'freeLift',
        'freeLiftForce',
        'liftPerLitre',
        'gasMass',
        'displacedAirMass',
      ]),
    );
    for (const output of Object.values(result.outputs)) {
      expect(stepIds.has(output.stepId)).toBe(true);
      expect(Number.isFinite(output.value)).toBe(true);
      expect(output.unit.length).toBeGreaterThan(0);
    }
    for (const step of result.steps) {
      expect(step.formula).toContain('=');
      expect(step.source.length).toBeGreaterThan(5);
    }
    // Forces are the masses times standard gravity, 9.806 65 m/s² (CGPM 1901).
    expect(result.outputs.freeLiftForce?.value).toBeCloseTo(
      (result.outputs.freeLift?.value ?? 0) * 9.80665,
      12,
    );
  });

  it('cautions about hydrogen and warns when the payload is too heavy', () => {
    const result = evaluate('lift-check', { ...base, payloadMassKg: 5 });
    const codes = result.warnings.map((warning) => warning.code);
    expect(codes).toContain('flammable-gas');
    expect(codes).toContain('free-lift-negative');
    expect(result.outputs.freeLift?.value).toBeLessThan(0);
  });

  it('says where the ideal-gas density is not good enough for the gas: ammonia, not hydrogen', () => {
    const codes = (gasId: string) =>
      evaluate('lift-check', { ...base, gas: { gasId } }).warnings.map((warning) => warning.code);
    expect(codes('ammonia')).toContain('ideal-gas-density-caveat');
    expect(codes('hydrogen')).not.toContain('ideal-gas-density-caveat');
    // The caveat's 1.1 % and 1.3 %: Z = 1 + B·p/(R·T) with the CRC Handbook's ammonia second
    // virial coefficients ("Virial coefficients of selected gases", H. V. Kehiaian): −271 cm³/mol
    // at 298.15 K and −302 cm³/mol at 290 K, at 101 325 Pa.
    const excess = (bCm3: number, temperatureK: number) =>
      -(bCm3 * 1e-6 * 101325) / (8.314462618 * temperatureK);
    expect(excess(-271, 298.15)).toBeCloseTo(0.011, 3);
    expect(excess(-302, 290)).toBeCloseTo(0.0127, 3);
  });

  it('warns that heated air at no superheat gives no lift', () => {
    const result = evaluate('lift-check', { ...base, gas: { gasId: 'hot-air' } });
    expect(result.warnings.map((warning) => warning.code)).toEqual(
      expect.arrayContaining(['heated-air-not-heated', 'gas-not-lighter-than-air']),
    );
  });

  it('names every invalid field at once', () => {
    let error: unknown;
    try {
      evaluate('lift-check', {
        ...base,
        payloadMassKg: -1,
        ambient: { mode: 'standard', altitudeM: 90000 },
      });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(InputError);
    const fields = (error as InputError).issues.map((issue) => issue.field);
    expect(fields).toEqual(expect.arrayContaining(['payloadMassKg', 'ambient.altitudeM']));
    const altitude = (error as InputError).issues.find(
      (issue) => issue.field === 'ambient.altitudeM',
    );
    expect(altitude?.range).toEqual({ min: -5000, max: 86000, unit: 'm' });
    expect(altitude?.value).toBe(90000);
  });

  it('refuses an unknown kind, an unknown field and a missing one', () => {
    expect(() => evaluate('levitation', base)).toThrow(/kind: must be one of/);
    expect(() => evaluate('lift-check', { ...base, colour: 'red' })).toThrow(/unknown field/);
    expect(() => evaluate('lift-check', { ...base, gas: undefined })).toThrow(/gas: is required/);
  });

  it('weighs a cushion by the film cut (two flat discs), and shows it beside the inflated surface', () => {
    // 0.9 m discs of 0.05 kg/m² film with 0.01 kg of fittings: m = 0.05·2·π·0.45² + 0.01
    // (disc area π·a², CRC Standard Mathematical Tables).
    const result = evaluate('lift-check', {
      ...base,
      envelope: { shape: 'cushion', flatDiameterM: 0.9 },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.01 },
    });
    const filmM2 = 2 * Math.PI * 0.45 ** 2;
    expect(result.outputs.filmArea?.value).toBeCloseTo(filmM2, 12);
    expect(result.outputs.envelopeMass?.value).toBeCloseTo(0.05 * filmM2 + 0.01, 12);
    expect(result.outputs.surfaceArea?.value).toBeLessThan(filmM2);
    // A sphere has no separate film output: its film is its surface.
    expect(evaluate('lift-check', base).outputs.filmArea).toBeUndefined();
  });

  it('takes the capsule’s axis as an input and cites the frontal area’s own source', () => {
    const capsule = (axis?: string) =>
      evaluate('lift-check', {
        ...base,
        envelope: { shape: 'capsule', diameterM: 2, lengthM: 6, ...(axis ? { axis } : {}) },
      });
    const endOn = capsule();
    const sideOn = capsule('horizontal');
    expect(endOn.outputs.frontalArea?.value).toBeCloseTo(Math.PI, 12);
    expect(sideOn.outputs.frontalArea?.value).toBeCloseTo(8 + Math.PI, 12);
    const frontal = endOn.steps.find((step) => step.id === 'frontal-area');
    const volume = endOn.steps.find((step) => step.id === 'volume');
    expect(frontal?.source).toMatch(/projected area/);
    expect(frontal?.source).not.toBe(volume?.source);
  });
});
