import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';

interface Issue {
  field: string;
  reason: string;
}

function flatten(errors: readonly ValidationError[], prefix = ''): Issue[] {
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
    exceptionFactory: (errors) => {
      const issues = flatten(errors);
      const first = issues[0];
      return new BadRequestException({
        statusCode: 400,
        error: 'Bad Request',
        message: issues.map((issue) => `${issue.field}: ${issue.reason}`).join('; '),
        field: first?.field,
        issues,
      });
    },
  });
}
