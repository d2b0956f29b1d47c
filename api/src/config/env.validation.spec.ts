import { describe, expect, it } from 'vitest';
import { validateEnvironment } from './env.validation';

describe('validateEnvironment', () => {
  it('defaults to bcrypt cost 12, port 3000, ./data and loopback', () => {
    const env = validateEnvironment({});
    expect(env).toMatchObject({
      BCRYPT_COST: 12,
      PORT: 3000,
      DATA_DIR: './data',
      HOST: '127.0.0.1',
    });
    // Unset: the demo is made only because HOST is loopback (demo-seed.service.ts).
    expect(env.SEED_DEMO).toBeUndefined();
  });

  it('refuses a bcrypt cost below 12 outside tests', () => {
    expect(() => validateEnvironment({ BCRYPT_COST: '10' })).toThrow(/at least 12/);
    expect(validateEnvironment({ BCRYPT_COST: '4', NODE_ENV: 'test' }).BCRYPT_COST).toBe(4);
  });

  it('lists every bad value at once', () => {
    expect(() =>
      validateEnvironment({ PORT: '99999', JWT_SECRET: 'short', SMTP_URL: 'http://mail' }),
    ).toThrow(/PORT[\s\S]*JWT_SECRET[\s\S]*SMTP_URL/);
  });
});
