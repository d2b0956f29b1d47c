import { HttpStatus } from '@nestjs/common';
import { QueryFailedError } from 'typeorm';
import { IMMUTABLE_MESSAGES } from './migrations-postgres/postgres-immutability';

/** The answer to a write the database itself refused, in the API's error shape. */
export interface DatabaseConflictBody {
  statusCode: number;
  error: string;
  message: string;
}

/** SQLite's and PostgreSQL's codes for a unique index refusing a second equal row. */
const UNIQUE_VIOLATION_CODES = new Set([
  'SQLITE_CONSTRAINT_UNIQUE',
  'SQLITE_CONSTRAINT_PRIMARYKEY',
  '23505',
]);

function driverErrorOf(error: QueryFailedError): { code?: unknown; message?: unknown } {
  return (error.driverError ?? {}) as { code?: unknown; message?: unknown };
}

/**
 * A write the database refused because another write got there first (two saves racing for the
 * same version number, on one API instance or several), or because it would change content the
 * database keeps unchangeable: 409, as the services answer the same conflicts they see coming.
 * Anything else is not a conflict (undefined) and stays a 500.
 */
export function databaseConflict(exception: unknown): DatabaseConflictBody | undefined {
  if (!(exception instanceof QueryFailedError)) return undefined;
  const driverError = driverErrorOf(exception);
  if (UNIQUE_VIOLATION_CODES.has(String(driverError.code))) {
    return {
      statusCode: HttpStatus.CONFLICT,
      error: 'Conflict',
      message: 'Someone else saved the same thing at the same moment. Reload and try again.',
    };
  }
  const text = String(driverError.message ?? exception.message);
  if (Object.values(IMMUTABLE_MESSAGES).some((message) => text.includes(message))) {
    return {
      statusCode: HttpStatus.CONFLICT,
      error: 'Conflict',
      message: 'Saved versions cannot be changed or removed; save a new version instead.',
    };
  }
  return undefined;
}
