import type { ConfigService } from '@nestjs/config';
import bcrypt from 'bcryptjs';
import { scryptSync } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import type { EnvironmentVariables } from '../config/env.validation';
import { PasswordHasher } from './password-hasher.service';

const hasherAt = (log2N: number) =>
  new PasswordHasher({
    get: () => log2N,
  } as unknown as ConfigService<EnvironmentVariables, true>);

describe('PasswordHasher', () => {
  it('stores scrypt (RFC 7914) hashes that Node’s own scryptSync reproduces', async () => {
    const hash = await hasherAt(10).hash('correct horse battery staple');
    const [prefix, log2N, r, p, salt, key] = hash.split('$');
    expect([prefix, log2N, r, p]).toEqual(['scrypt', '10', '8', '1']);
    const again = scryptSync(
      'correct horse battery staple',
      Buffer.from(salt ?? '', 'base64url'),
      32,
      {
        N: 1024,
        r: 8,
        p: 1,
      },
    );
    expect(again.toString('base64url')).toBe(key);
  });

  it('accepts the password and refuses others, and never an absent hash', async () => {
    const hasher = hasherAt(10);
    const hash = await hasher.hash('s3cret enough');
    expect(await hasher.check('s3cret enough', hash)).toEqual({
      matches: true,
      needsRehash: false,
    });
    expect((await hasher.check('s3cret enougH', hash)).matches).toBe(false);
    expect((await hasher.check('s3cret enough', undefined)).matches).toBe(false);
    expect((await hasher.check('s3cret enough', 'garbage')).matches).toBe(false);
  });

  it('still accepts an older bcrypt hash, and asks for it to be replaced', async () => {
    const legacy = bcrypt.hashSync('from the old days', 4);
    const hasher = hasherAt(10);
    expect(await hasher.check('from the old days', legacy)).toEqual({
      matches: true,
      needsRehash: true,
    });
    expect((await hasher.check('wrong', legacy)).matches).toBe(false);
  });

  it('asks for a rehash when the cost has been raised since', async () => {
    const old = await hasherAt(10).hash('same password');
    expect((await hasherAt(11).check('same password', old)).needsRehash).toBe(true);
  });
});
