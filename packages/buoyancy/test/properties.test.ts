import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate, InputError, type CalculationResult } from '../src/index.js';

const gasIds = ['hydrogen', 'helium', 'methane', 'ammonia', 'neon', 'hot-air'] as const;

const ambientArb = fc.oneof(
  fc.record({
    mode: fc.constant('standard' as const),
    altitudeM: fc.double({ min: -5000, max: 86000, noNaN: true }),
    temperatureOffsetK: fc.double({ min: -30, max: 30, noNaN: true }),
  }),
  fc.record({
    mode: fc.constant('measured' as const),
    temperatureK: fc.double({ min: 233.15, max: 323.15, noNaN: true }),
    pressurePa: fc.double({ min: 20000, max: 110000, noNaN: true }),
    humidity: fc.oneof(
      fc.constant({ kind: 'dry' as const }),
      fc.record({
        kind: fc.constant('relative' as const),
        relativeHumidity: fc.double({ min: 0, max: 1, noNaN: true }),
      }),
    ),
  }),
);

// Heated air has no purity of its own (it is the surrounding air), so none is given for it.
const gasArb = fc
  .record({
    gasId: fc.constantFrom(...gasIds),
    purity: fc.double({ min: 0.5, max: 1, noNaN: true }),
    superheatK: fc.double({ min: 0, max: 60, noNaN: true }),
  })
  .map(({ gasId, purity, superheatK }) =>
    gasId === 'hot-air' ? { gasId, superheatK } : { gasId, purity, superheatK },
  );

const envelopeArb = fc.oneof(
  fc.record({
    shape: fc.constant('sphere' as const),
    diameterM: fc.double({ min: 0.05, max: 50, noNaN: true }),
  }),
  fc.record({
    shape: fc.constant('cushion' as const),
    flatDiameterM: fc.double({ min: 0.1, max: 3, noNaN: true }),
  }),
  fc.record({
    shape: fc.constant('spheroid' as const),
    equatorialDiameterM: fc.double({ min: 0.1, max: 30, noNaN: true }),
    polarDiameterM: fc.double({ min: 0.1, max: 30, noNaN: true }),
  }),
);

function allFinite(result: CalculationResult): boolean {
  return (
    Object.values(result.outputs).every((output) => Number.isFinite(output.value)) &&
    result.steps.every(
      (step) =>
        Number.isFinite(step.result.value) &&
        step.values.every((value) => Number.isFinite(value.value)),
    )
  );
}

describe('engine properties (fast-check)', () => {
  it('never returns NaN or Infinity for valid lift-check inputs', () => {
    fc.assert(
      fc.property(
        envelopeArb,
        gasArb,
        ambientArb,
        fc.double({ min: 0, max: 10, noNaN: true }),
        (envelope, gas, ambient, payloadMassKg) => {
          const result = evaluate('lift-check', {
            envelope,
            envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05 },
            payloadMassKg,
            gas,
            ambient,
          });
          expect(allFinite(result)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('gives more gross lift for a bigger envelope and less for a denser (less pure) gas', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        fc.double({ min: 0.5, max: 0.99, noNaN: true }),
        ambientArb,
        (diameterM, growth, purity, ambient) => {
          const run = (d: number, p: number) =>
            evaluate('lift-check', {
              envelope: { shape: 'sphere', diameterM: d },
              envelopeMass: { kind: 'fixed', massKg: 0 },
              payloadMassKg: 0,
              gas: { gasId: 'helium', purity: p },
              ambient,
            }).outputs.grossLift?.value ?? Number.NaN;
          expect(run(diameterM * growth, 1)).toBeGreaterThan(run(diameterM, 1));
          expect(run(diameterM, purity)).toBeLessThan(run(diameterM, 1));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('sizing inverts the lift check to 1e-6 relative', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('hydrogen', 'helium'),
        fc.double({ min: 0, max: 0.2, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        (gasId, arealDensityKgM2, payloadMassKg, freeLiftKg) => {
          const ambient = { mode: 'standard' as const, altitudeM: 500 };
          const envelopeMass = { kind: 'areal' as const, arealDensityKgM2, fittingsKg: 0.01 };
          const sizing = evaluate('envelope-sizing', {
            shape: { shape: 'sphere' },
            envelopeMass,
            payloadMassKg,
            target: { kind: 'freeLift', freeLiftKg },
            gas: { gasId },
            ambient,
          });
          const diameterM = sizing.outputs.size?.value ?? Number.NaN;
          const check = evaluate('lift-check', {
            envelope: { shape: 'sphere', diameterM },
            envelopeMass,
            payloadMassKg,
            gas: { gasId },
            ambient,
          });
          expect(
            Math.abs((check.outputs.freeLift?.value ?? Number.NaN) / freeLiftKg - 1),
          ).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('raises an InputError naming a field path for out-of-range or non-finite inputs', () => {
    const bad = fc.oneof(
      fc.constant(Number.NaN),
      fc.constant(Number.POSITIVE_INFINITY),
      fc.double({ min: -1e9, max: -1e-3, noNaN: true }),
      fc.double({ min: 1e6, max: 1e12, noNaN: true }),
    );
    fc.assert(
      fc.property(
        bad,
        fc.constantFrom('diameterM', 'payloadMassKg', 'temperatureK'),
        (value, target) => {
          const inputs = {
            envelope: { shape: 'sphere', diameterM: target === 'diameterM' ? value : 1 },
            envelopeMass: { kind: 'fixed', massKg: 0.1 },
            payloadMassKg: target === 'payloadMassKg' ? value : 0.1,
            gas: { gasId: 'helium' },
            ambient: {
              mode: 'measured',
              temperatureK: target === 'temperatureK' ? value : 288.15,
              pressurePa: 101325,
            },
          };
          let error: unknown;
          try {
            evaluate('lift-check', inputs);
          } catch (caught) {
            error = caught;
          }
          expect(error).toBeInstanceOf(InputError);
          const expectedPath = {
            diameterM: 'envelope.diameterM',
            payloadMassKg: 'payloadMassKg',
            temperatureK: 'ambient.temperatureK',
          }[target];
          expect((error as InputError).field).toBe(expectedPath);
        },
      ),
      { numRuns: 200 },
    );
  });
});
