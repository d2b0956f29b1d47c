import { type ArgumentMetadata, ValidationPipe, type ValidationError } from '@nestjs/common';
import { type FieldIssue, fieldIssuesException } from '../errors/field-issues';
import { malformedStrings, unexpectedNulls } from './request-shape';

function flatten(errors: readonly ValidationError[], prefix = ''): FieldIssue[] {
  return errors.flatMap((error) => {
    const field = prefix ? `${prefix}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((reason) => ({ field, reason }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

/**
 * The global validation pipe: strips nothing silently (unknown fields are an error), converts
 * query strings to their types, and answers 400 naming every field at fault. Before the DTO's
 * rules it refuses text that is not well-formed Unicode; after them, `null` where the DTO does not
 * declare it (`@Nullable()`).
 */
class ApiValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    const malformed = malformedStrings(value);
    if (malformed.length > 0) throw fieldIssuesException(malformed);
    const result: unknown = await super.transform(value, metadata);
    const nulls = metadata.type === 'custom' ? [] : unexpectedNulls(result);
    if (nulls.length > 0) throw fieldIssuesException(nulls);
    return result;
  }
}

export function createValidationPipe(): ValidationPipe {
  return new ApiValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => fieldIssuesException(flatten(errors)),
  });
}
