import { describe, expect, it } from 'vitest';
import {
  moistAirDensity,
  vapourMoleFractionFromRelativeHumidity,
} from '../atmosphere/moist-air-density.js';
import { InputError } from '../errors.js';
import { evaluate } from '../kinds/registry.js';

const envelope = {
  envelope: { shape: 'sphere', diameterM: 16 },
  envelopeMass: { kind: 'fixed', massKg: 0 },
  payloadMassKg: 0,
};
const measuredDry = (temperatureK: number) => ({
  mode: 'measured',
  temperatureK,
  pressurePa: 101325,
});
const heated = (ambient: unknown, superheatK: number) =>
  evaluate('lift-check', { ...envelope, ambient, gas: { gasId: 'hot-air', superheatK } });

describe('heated air is the surrounding air at the gas temperature', () => {
  // CIPM-2007 worked values at 101 325 Pa, dry air, x_CO2 = 0.0004 (Picard et al., Metrologia 45
  // (2008) 149; check-values §2.1): 0 °C 1.293 05, 15 °C 1.225 52, 20 °C 1.204 56 kg/m³.
  // Tolerance 1e-5 kg/m³, the table's last digit.
  it.each([
    [273.15, 15, 1.29305, 1.22552],
    [273.15, 20, 1.29305, 1.20456],
    [288.15, 5, 1.22552, 1.20456],
  ])(
    'air at %s K heated by %s K weighs what CIPM-2007 gives for the warmer air',
    (airK, superheatK, airDensity, heatedDensity) => {
      const result = heated(measuredDry(airK), superheatK);
      expect(Math.abs((result.outputs.airDensity?.value ?? 0) - airDensity)).toBeLessThan(1e-5);
      expect(Math.abs((result.outputs.gasDensity?.value ?? 0) - heatedDensity)).toBeLessThan(1e-5);
      // Gross lift per cubic metre is the difference of the two densities.
      const volumeM3 = result.outputs.volume?.value ?? Number.NaN;
      expect(
        Math.abs((result.outputs.grossLift?.value ?? 0) / volumeM3 - (airDensity - heatedDensity)),
      ).toBeLessThan(2e-5);
    },
  );

  it('keeps the air’s water content in humid air, at 30, 60 and 80 K of superheat', () => {
    const ambient = {
      mode: 'measured',
      temperatureK: 298.15,
      pressurePa: 101325,
      humidity: { kind: 'relative', relativeHumidity: 0.8 },
    };
    const vapour = vapourMoleFractionFromRelativeHumidity(0.8, 298.15, 101325);
    for (const superheatK of [30, 60, 80]) {
      // No limit of the gas's own humidity stops it: at 80 K the heated air is at 105 °C.
      const result = heated(ambient, superheatK);
      const expected = moistAirDensity({
        temperatureK: 298.15 + superheatK,
        pressurePa: 101325,
        vapourMoleFraction: vapour,
      }).densityKgM3;
      expect(result.outputs.gasDensity?.value).toBeCloseTo(expected, 12);
      expect(result.outputs.grossLift?.value).toBeGreaterThan(0);
    }
  });

  it('lifts nothing without superheat, exactly, in every air model', () => {
    const airs = [
      { mode: 'standard', altitudeM: 0 },
      { mode: 'standard', altitudeM: 1500, humidity: { kind: 'relative', relativeHumidity: 0.6 } },
      measuredDry(288.15),
      { ...measuredDry(301.15), humidity: { kind: 'relative', relativeHumidity: 0.9 } },
      { ...measuredDry(283.15), humidity: { kind: 'dewPoint', dewPointK: 278.15 } },
    ];
    for (const ambient of airs) {
      expect(heated(ambient, 0).outputs.grossLift?.value).toBe(0);
    }
  });

  it('sizes nothing when the heated air is no lighter than the air', () => {
    const result = evaluate('envelope-sizing', {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'fixed', massKg: 1 },
      payloadMassKg: 1,
      target: { kind: 'freeLift', freeLiftKg: 0.3 },
      gas: { gasId: 'hot-air', superheatK: 0 },
      ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
    });
    expect(result.warnings.map((warning) => warning.code)).toContain('no-size-possible');
    expect(result.outputs.size).toBeUndefined();
    // With superheat it sizes one.
    const warm = evaluate('envelope-sizing', {
      shape: { shape: 'sphere' },
      envelopeMass: { kind: 'fixed', massKg: 1 },
      payloadMassKg: 1,
      target: { kind: 'freeLift', freeLiftKg: 0.3 },
      gas: { gasId: 'hot-air', superheatK: 80 },
      ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
    });
    expect(warm.outputs.size?.value).toBeGreaterThan(1);
  });

  it('refuses a purity or a gas humidity for heated air, naming the field', () => {
    const ask = (gas: Record<string, unknown>) => () =>
      evaluate('lift-check', { ...envelope, ambient: measuredDry(288.15), gas });
    expect(ask({ gasId: 'hot-air', superheatK: 50, purity: 0.9 })).toThrow(InputError);
    expect(ask({ gasId: 'hot-air', superheatK: 50, purity: 0.9 })).toThrow(/gas\.purity/);
    expect(ask({ gasId: 'hot-air', superheatK: 50, relativeHumidity: 0.5 })).toThrow(
      /gas\.relativeHumidity/,
    );
  });
});
