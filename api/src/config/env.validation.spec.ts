import { describe, expect, it } from 'vitest';
import { validateEnvironment } from './env.validation';

describe('validateEnvironment', () => {
  it('defaults to scrypt cost 16, port 3000, ./data and loopback', () => {
    const env = validateEnvironment({});
    expect(env).toMatchObject({
      SCRYPT_COST: 16,
      PORT: 3000,
      DATA_DIR: './data',
      HOST: '127.0.0.1',
    });
    // Unset: the demo is made only because HOST is loopback (demo-seed.service.ts).
    expect(env.SEED_DEMO).toBeUndefined();
  });

  it('refuses an scrypt cost below 15 outside tests', () => {
    expect(() => validateEnvironment({ SCRYPT_COST: '14' })).toThrow(/at least 15/);
    expect(validateEnvironment({ SCRYPT_COST: '10', NODE_ENV: 'test' }).SCRYPT_COST).toBe(10);
  });

  it('lists every bad value at once', () => {
    expect(() =>
      validateEnvironment({ PORT: '99999', JWT_SECRET: 'short', SMTP_URL: 'http://mail' }),
    ).toThrow(/PORT[\s\S]*JWT_SECRET[\s\S]*SMTP_URL/);
  });
});
