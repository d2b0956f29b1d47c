/** Valid inputs of the lift-check kind for tests: a 1 m helium sphere at sea-level air. */
export const liftCheckInputs = (overrides: Record<string, unknown> = {}) => ({
  envelope: { shape: 'sphere', diameterM: 1 },
  envelopeMass: { kind: 'fixed', massKg: 0.1 },
  payloadMassKg: 0.2,
  gas: { gasId: 'helium' },
  ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
  ...overrides,
});
