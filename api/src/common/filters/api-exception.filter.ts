import {
  type ArgumentsHost,
  Catch,
  type ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import { InputError } from '@loftwright/buoyancy';
import type { Response } from 'express';
import { MAX_JSON_BODY } from '../json-depth';
import { databaseConflict } from '../../database/database-errors';

/** Every error body the API sends: status, a message a person can read, and the field at fault. */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  field?: string;
  issues?: { field: string; reason: string; value?: unknown; range?: unknown }[];
  [key: string]: unknown;
}

const MALFORMED_JSON_MESSAGE = 'The request body is not valid JSON.';
const TOO_LARGE_MESSAGE = `The request body is larger than ${MAX_JSON_BODY.replace('kb', ' kB')}.`;

/**
 * A body the JSON parser could not read: Express's parser marks it `entity.parse.failed`, and
 * Nest may wrap it in a 400 whose message is the parser's own (a position in someone's text).
 */
function isMalformedJson(exception: unknown): boolean {
  const marked = (error: unknown) =>
    typeof error === 'object' &&
    error !== null &&
    (error as { type?: unknown }).type === 'entity.parse.failed';
  return (
    marked(exception) ||
    (exception instanceof HttpException && marked((exception as { cause?: unknown }).cause))
  );
}

/** The body-parser error of this type, thrown directly or wrapped by Nest in a 400. */
function bodyErrorOfType(exception: unknown, type: string): Error | undefined {
  const candidates = [exception, (exception as { cause?: unknown } | null)?.cause];
  return candidates.find(
    (candidate): candidate is Error =>
      candidate instanceof Error && (candidate as { type?: unknown }).type === type,
  );
}

/**
 * Shapes every error the same way. Engine input errors become 422 with their field and range;
 * anything unexpected becomes a 500 with no stack trace or internals (they go to the log).
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (body.statusCode >= 500) {
      this.logger.error(
        exception instanceof Error ? (exception.stack ?? exception.message) : String(exception),
      );
    }
    response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ApiErrorBody {
    if (exception instanceof InputError) {
      return {
        statusCode: HttpStatus.UNPROCESSABLE_ENTITY,
        error: 'Unprocessable Entity',
        message: exception.message,
        field: exception.field,
        issues: exception.issues.map((issue) => ({
          field: issue.field,
          reason: issue.reason,
          value: issue.value,
          ...(issue.range ? { range: issue.range } : {}),
        })),
      };
    }
    if (bodyErrorOfType(exception, 'entity.too.large')) {
      return {
        statusCode: HttpStatus.PAYLOAD_TOO_LARGE,
        error: 'Payload Too Large',
        message: TOO_LARGE_MESSAGE,
      };
    }
    const tooDeep = bodyErrorOfType(exception, 'entity.too.deep');
    if (tooDeep) {
      return { statusCode: HttpStatus.BAD_REQUEST, error: 'Bad Request', message: tooDeep.message };
    }
    if (isMalformedJson(exception)) {
      return {
        statusCode: HttpStatus.BAD_REQUEST,
        error: 'Bad Request',
        message: MALFORMED_JSON_MESSAGE,
      };
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const raw = exception.getResponse();
      if (typeof raw === 'object' && raw !== null) {
        const body = raw as Record<string, unknown>;
        const message = Array.isArray(body.message)
          ? body.message.join('; ')
          : String(body.message ?? exception.message);
        return {
          ...body,
          statusCode: status,
          error: String(body.error ?? HttpStatus[status] ?? 'Error'),
          message,
        };
      }
      return { statusCode: status, error: HttpStatus[status] ?? 'Error', message: String(raw) };
    }
    // A write the database refused as a conflict (a lost race, immutable content): 409, not 500.
    const conflict = databaseConflict(exception);
    if (conflict) return { ...conflict };
    // Errors raised by Express middleware (body parser: oversize or malformed bodies) carry a status.
    const status = (exception as { status?: unknown; statusCode?: unknown })?.status;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      const message =
        status === 413
          ? TOO_LARGE_MESSAGE
          : status === 400
            ? MALFORMED_JSON_MESSAGE
            : 'Bad request.';
      return { statusCode: status, error: HttpStatus[status] ?? 'Error', message };
    }
    return {
      statusCode: 500,
      error: 'Internal Server Error',
      message: 'Something went wrong on the server; it has been logged.',
    };
  }
}
