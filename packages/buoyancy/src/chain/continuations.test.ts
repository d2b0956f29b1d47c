import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { evaluate, normaliseInputs } from '../kinds/registry.js';
import { continuations, continueInputs } from './continuations.js';
import { takeContinuedFields } from './take-continued-fields.js';

/** A latex-like sphere sized by its catalogue mass, in the standard atmosphere at a launch site. */
const stretchingSizing = {
  shape: { shape: 'sphere' },
  envelopeMass: { kind: 'fixed', massKg: 0.6 },
  payloadMassKg: 0.9,
  target: { kind: 'freeLift', freeLiftKg: 0.3 },
  gas: { gasId: 'helium' },
  ambient: { mode: 'standard', altitudeM: 120 },
};

const continueSizing = (inputs: unknown) =>
  continueInputs(
    'envelope-sizing',
    'flight-profile',
    inputs,
    evaluate('envelope-sizing', inputs).outputs,
  );

describe('continuations', () => {
  it('lists sizing → flight → rules check, and nothing after the rules check', () => {
    expect(continuations('envelope-sizing')).toEqual([
      { toKind: 'flight-profile', title: 'Flight profile' },
    ]);
    expect(continuations('flight-profile')).toEqual([
      { toKind: 'balloon-rules', title: 'Balloon rules check' },
    ]);
    expect(continuations('balloon-rules')).toEqual([]);
  });

  it('refuses a pair that does not continue, naming both kinds', () => {
    const sizing = evaluate('envelope-sizing', stretchingSizing);
    const attempt = () =>
      continueInputs('envelope-sizing', 'balloon-rules', stretchingSizing, sizing.outputs);
    expect(attempt).toThrow(InputError);
    expect(attempt).toThrow(/Envelope sizing does not continue into a Balloon rules check/);
  });
});

describe('sizing → flight profile', () => {
  it('launches a sphere given by its mass at the sized diameter, with the burst diameter and the parachute still to fill', () => {
    const sizing = evaluate('envelope-sizing', stretchingSizing);
    const continued = continueSizing(stretchingSizing);
    const envelope = continued.inputs.envelope as { kind: string; launchDiameterM: number };
    expect(envelope.kind).toBe('extensible');
    expect(envelope.launchDiameterM).toBe(sizing.outputs.size?.value);
    expect(continued.inputs.envelopeMassKg).toBe(sizing.outputs.envelopeMass?.value);
    expect(continued.inputs.payloadMassKg).toBe(0.9);
    expect(continued.needs).toEqual(['envelope.burstDiameterM', 'parachute.areaM2']);
    expect(continued.filled).toContain('envelope.launchDiameterM');
    const flight = evaluate('flight-profile', continued.inputs);
    // Archimedes' principle, as both kinds apply it to the same dry standard air and pure helium
    // (U.S. Standard Atmosphere 1976): the flight's free lift at launch is the free lift the
    // sizing was asked for, to 1e-9 relative.
    expect(Math.abs((flight.outputs.freeLift?.value ?? 0) / 0.3 - 1)).toBeLessThan(1e-9);
    // The gas a plan fills: the launch sphere, V = π·d³/6 (CRC Standard Mathematical Tables).
    expect(flight.outputs.launchVolume?.value).toBeCloseTo(
      (Math.PI * envelope.launchDiameterM ** 3) / 6,
      12,
    );
    // …which is the sizing's envelope volume, the same sphere.
    expect(flight.outputs.launchVolume?.value).toBeCloseTo(sizing.outputs.volume?.value ?? 0, 12);
  });

  it('flies a film envelope as the fixed-volume shape it was sized to, carrying the ascent-rate drag', () => {
    const inputs = {
      ...stretchingSizing,
      shape: { shape: 'spheroid', polarToEquatorialRatio: 0.8 },
      envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.02 },
      target: { kind: 'ascentRate', ascentRateMS: 3, dragCoefficient: 0.4 },
      gas: { gasId: 'hydrogen', purity: 0.98 },
    };
    const sizing = evaluate('envelope-sizing', inputs);
    const continued = continueSizing(inputs);
    const sizeM = sizing.outputs.size?.value ?? Number.NaN;
    expect(continued.inputs.envelope).toEqual({
      kind: 'fixed',
      shape: { shape: 'spheroid', equatorialDiameterM: sizeM, polarDiameterM: sizeM * 0.8 },
    });
    expect(continued.needs).toEqual([]);
    expect(continued.inputs.dragCoefficient).toBe(0.4);
    expect(continued.inputs.gas).toEqual({ gasId: 'hydrogen', purity: 0.98 });
    const flight = evaluate('flight-profile', continued.inputs);
    // The sizing solved for a 3 m/s climb with the same drag law (½·ρ·w²·C_d·A against the free
    // lift, Hoerner, Fluid-Dynamic Drag, 1965, ch. 1), so the flight starts at 3 m/s. The sizing
    // takes g₀, the flight g at the 120 m site (U.S. Standard Atmosphere 1976, eq. 17): w ∝ 1/√g
    // differs by about 1.9e-5 relative there, so the check allows 1e-4.
    expect(Math.abs((flight.outputs.launchAscentRate?.value ?? 0) / 3 - 1)).toBeLessThan(1e-4);
  });

  it('asks for the launch altitude when the sizing used measured air', () => {
    const inputs = {
      ...stretchingSizing,
      ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
    };
    expect(continueSizing(inputs).needs).toContain('launch.altitudeM');
  });

  it('refuses heated air, naming the gas field', () => {
    const inputs = { ...stretchingSizing, gas: { gasId: 'hot-air', superheatK: 80 } };
    expect(() => continueSizing(inputs)).toThrow(/gas\.gasId|heated-air/);
  });
});

describe('flight profile → rules check', () => {
  it('makes the flight payload one package of a free balloon, with the jurisdiction to pick', () => {
    const flightInputs = normaliseInputs('flight-profile', {
      envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
      envelopeMassKg: 0.6,
      payloadMassKg: 2.4,
      gas: { gasId: 'helium' },
      launch: { altitudeM: 120 },
    });
    const flight = evaluate('flight-profile', flightInputs);
    const continued = continueInputs(
      'flight-profile',
      'balloon-rules',
      flightInputs,
      flight.outputs,
    );
    expect((continued.inputs.packages as { massKg: number }[])[0]?.massKg).toBe(2.4);
    expect(continued.inputs.operation).toBe('free');
    // 2.4 kg is over the 4 lb (1.814 kg) of 14 CFR 101.1(a)(4)(i), whose weight-to-area ratio
    // needs the smallest surface area: it holds the example's until the person gives it.
    expect(continued.needs).toEqual(['profileId', 'packages.0.smallestSurfaceAreaM2']);
    const rules = evaluate('balloon-rules', continued.inputs);
    expect(rules.steps.map((step) => step.id)).toContain(
      'rule-101.1(a)(4)(i)-single-package-mass-and-ratio',
    );
  });
});

describe('taking a newer source version', () => {
  it('puts the re-mapped fields into the draft and keeps what the person typed elsewhere', () => {
    const first = continueSizing(stretchingSizing);
    const draft = {
      ...first.inputs,
      envelope: { ...(first.inputs.envelope as object), burstDiameterM: 7.5 },
    };
    const newer = continueSizing({ ...stretchingSizing, payloadMassKg: 1.4 });
    const taken = takeContinuedFields(draft, newer);
    expect(taken.changed).toEqual(['envelope.launchDiameterM', 'payloadMassKg']);
    const inputs = taken.inputs as { payloadMassKg: number; envelope: unknown };
    expect(inputs.payloadMassKg).toBe(1.4);
    expect(inputs.envelope).toEqual({
      kind: 'extensible',
      launchDiameterM: (newer.inputs.envelope as { launchDiameterM: number }).launchDiameterM,
      burstDiameterM: 7.5,
    });
  });

  it('takes a changed envelope choice whole', () => {
    const first = continueSizing(stretchingSizing);
    const film = { ...stretchingSizing, envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05 } };
    const taken = takeContinuedFields(first.inputs, continueSizing(film));
    expect((taken.inputs as { envelope: { kind: string } }).envelope.kind).toBe('fixed');
    expect(taken.changed).toContain('envelope');
  });
});
