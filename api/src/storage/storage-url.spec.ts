import { describe, expect, it } from 'vitest';
import { validateEnvironment } from '../config/env.validation';
import { parseStorageUrl, storageUrlProblem } from './storage-url';

describe('STORAGE_URL', () => {
  it('reads the bucket and a prefix ending in one slash', () => {
    expect(parseStorageUrl('s3://loft-files')).toEqual({ bucket: 'loft-files', prefix: '' });
    expect(parseStorageUrl('s3://loft-files/')).toEqual({ bucket: 'loft-files', prefix: '' });
    expect(parseStorageUrl('s3://loft.files/team/uploads/')).toEqual({
      bucket: 'loft.files',
      prefix: 'team/uploads/',
    });
    expect(parseStorageUrl('s3://loft-files//a//b')).toEqual({
      bucket: 'loft-files',
      prefix: 'a/b/',
    });
  });

  // Bucket naming rules: AWS S3 User Guide, "General purpose bucket naming rules" (3–63
  // characters; lowercase letters, digits, dots and hyphens; begin and end with a letter or digit).
  it.each([
    ['a plain path', '/var/loft'],
    ['another scheme', 'https://loft-files.s3.amazonaws.com'],
    ['no bucket', 's3://'],
    ['a two-letter bucket', 's3://ab'],
    ['capital letters', 's3://Loft-Files'],
    ['a bucket ending in a hyphen', 's3://loft-'],
    ['a 64-character bucket', `s3://${'a'.repeat(64)}`],
    ['a ".." segment', 's3://loft-files/../other'],
    ['a space in the prefix', 's3://loft-files/my uploads'],
  ])('refuses %s', (_label, value) => {
    expect(storageUrlProblem(value)).not.toBeNull();
    expect(() => parseStorageUrl(value)).toThrow(/^STORAGE_URL /);
  });

  it('accepts a 63-character bucket', () => {
    expect(storageUrlProblem(`s3://${'a'.repeat(63)}`)).toBeNull();
  });

  it('stops the start with a message naming the variable and the value', () => {
    expect(() => validateEnvironment({ STORAGE_URL: 's3:/loft-files' })).toThrow(
      /STORAGE_URL="s3:\/loft-files": STORAGE_URL must look like s3:\/\/bucket/,
    );
    expect(() =>
      validateEnvironment({ STORAGE_URL: 's3://loft-files', STORAGE_ENDPOINT: '127.0.0.1:4569' }),
    ).toThrow(/STORAGE_ENDPOINT="127.0.0.1:4569": STORAGE_ENDPOINT must be an http/);
    const env = validateEnvironment({
      STORAGE_URL: 's3://loft-files/uploads',
      STORAGE_ENDPOINT: 'http://127.0.0.1:4569',
    });
    expect(env.STORAGE_URL).toBe('s3://loft-files/uploads');
    expect(validateEnvironment({}).STORAGE_URL).toBeUndefined();
  });
});
