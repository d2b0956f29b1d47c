import { ValidationPipe, type ValidationError } from '@nestjs/common';
import { type FieldIssue, fieldIssuesException } from '../errors/field-issues';

function flatten(errors: readonly ValidationError[], prefix = ''): FieldIssue[] {
  return errors.flatMap((error) => {
    const field = prefix ? `${prefix}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((reason) => ({ field, reason }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

/**
 * The global validation pipe: strips nothing silently (unknown fields are an error), converts
 * query strings to their types, and answers 400 naming every field at fault.
 */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => fieldIssuesException(flatten(errors)),
  });
}
