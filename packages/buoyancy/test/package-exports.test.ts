import { describe, expect, it } from 'vitest';

// Imports the package by its name, through the exports map and the built dist, as the API does at
// run time. `npm test` builds before it tests; run `npm run build -w @loftwright/buoyancy` first
// when running this file alone.
describe('@loftwright/buoyancy as consumers see it', () => {
  it('exposes the engine version and the dry-air density function from dist', async () => {
    const engine = await import('@loftwright/buoyancy');
    expect(engine.ENGINE_VERSION).toMatch(/^\d+\.\d+\.\d+$/);
    // U.S. Standard Atmosphere 1976, Table I: sea-level density 1.2250 kg/m3.
    expect(engine.dryAirDensityKgM3(288.15, 101325)).toBeCloseTo(1.225, 4);
  });

  it('throws the exported InputError class, so consumers can recognise it', async () => {
    const engine = await import('@loftwright/buoyancy');
    expect(() => engine.dryAirDensityKgM3(Number.NaN, 101325)).toThrow(engine.InputError);
  });
});
