import { getMetadataStorage, ValidateBy } from 'class-validator';
import type { FieldIssue } from '../errors/field-issues';

const NULLABLE = 'isNullable';

/**
 * Marks a DTO property whose `null` means something (clear the setting). Every other property
 * refuses `null` with a 400 naming it, even when it is optional: `@IsOptional()` lets `null`
 * through, and a service reading `dto.title ?? stored` would then store nothing or throw. A
 * class-validator decorator so mapped types (PartialType, PickType) carry it along.
 */
export function Nullable(): PropertyDecorator {
  return ValidateBy({ name: NULLABLE, validator: { validate: () => true } });
}

function nullableProperties(target: object): Set<string> {
  const metadata = getMetadataStorage().getTargetValidationMetadatas(
    target.constructor,
    '',
    true,
    false,
  );
  return new Set(
    metadata.filter((entry) => entry.name === NULLABLE).map((entry) => entry.propertyName),
  );
}

/** `null` in a DTO instance where the class does not allow it, nested DTOs included. */
export function unexpectedNulls(value: unknown, prefix = ''): FieldIssue[] {
  if (value === null || typeof value !== 'object') return [];
  if (Array.isArray(value)) {
    return value.flatMap((item, index) => unexpectedNulls(item, `${prefix}${index}.`));
  }
  // Only DTO instances carry rules; plain objects (engine inputs, answer maps) are the engine's
  // or the service's to check.
  if (Object.getPrototypeOf(value) === Object.prototype) return [];
  const allowed = nullableProperties(value);
  return Object.entries(value).flatMap(([key, item]) =>
    item === null
      ? allowed.has(key)
        ? []
        : [
            {
              field: `${prefix}${key}`,
              reason: 'must not be null; leave it out to keep it as it is',
            },
          ]
      : unexpectedNulls(item, `${prefix}${key}.`),
  );
}

/**
 * Strings that are not well-formed UTF-16 (a lone surrogate): no person typed them, they cannot be
 * stored or mailed faithfully, and some validators throw on them.
 */
export function malformedStrings(value: unknown, prefix = ''): FieldIssue[] {
  if (typeof value === 'string') {
    return isWellFormed(value)
      ? []
      : [{ field: prefix.replace(/\.$/, '') || 'body', reason: 'is not valid Unicode text' }];
  }
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([key, item]) => malformedStrings(item, `${prefix}${key}.`));
}

function isWellFormed(text: string): boolean {
  // A lone high surrogate, or a low surrogate without a high one before it.
  return !/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(text);
}
