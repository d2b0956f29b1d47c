import { describe, expect, it } from 'vitest';
import { validateEnvironment } from '../config/env.validation';
import { databaseKindOf, databaseUrlProblem } from './database-kind';

describe('DATABASE_URL', () => {
  it('selects PostgreSQL for postgres:// and postgresql:// addresses, SQLite when unset', () => {
    expect(databaseKindOf(undefined)).toBe('sqlite');
    expect(databaseKindOf('')).toBe('sqlite');
    expect(databaseKindOf('postgres://u@db.example.org/lw')).toBe('postgres');
    expect(databaseKindOf('postgresql://u@db.example.org:5433/lw')).toBe('postgres');
  });

  it('accepts an address naming a host and a database', () => {
    expect(databaseUrlProblem('postgres://u:p@db.example.org:5432/loftwright')).toBeNull();
  });

  it.each([
    ['mysql://u@db.example.org/lw', /postgres:\/\//],
    ['postgres://u@db.example.org', /database/],
    ['postgres://u@db.example.org/', /database/],
    ['postgres://u:p@[broken/lw', /not a valid address/],
  ])('refuses %s', (url, reason) => {
    expect(databaseUrlProblem(url)).toMatch(reason);
  });

  it('stops start-up with a message naming the variable', () => {
    expect(() => validateEnvironment({ DATABASE_URL: 'sqlite://data.db' })).toThrow(
      /DATABASE_URL must be a postgres:\/\/ address/,
    );
    expect(validateEnvironment({ DATABASE_URL: 'postgres://u@h/db' }).DATABASE_URL).toBe(
      'postgres://u@h/db',
    );
  });
});
