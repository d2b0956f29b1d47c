import { IsIn, registerDecorator, ValidateIf, type ValidationOptions } from 'class-validator';
import { NUMBER_FORMATS, UNIT_SYSTEMS } from '../../users/preferences';

export const UNIT_SYSTEM_MESSAGE = `unitSystem must be one of: ${UNIT_SYSTEMS.join(', ')}`;
export const NUMBER_FORMAT_MESSAGE = `numberFormat must be one of: ${NUMBER_FORMATS.join(', ')}`;
export const CURRENCY_MESSAGE = 'currency must be a three-letter ISO 4217 code such as EUR';

/**
 * Validates the field only when it is sent. Unlike `@IsOptional()`, a `null` is checked (and
 * refused) rather than let through to a NOT NULL column.
 */
export const IsSent = (): PropertyDecorator =>
  ValidateIf((_object: object, value: unknown) => value !== undefined);

/** `si` or `us`. */
export const IsUnitSystem = (): PropertyDecorator =>
  IsIn([...UNIT_SYSTEMS], { message: UNIT_SYSTEM_MESSAGE });

/** One of the three number formats (decimal mark, then digit grouping). */
export const IsNumberFormat = (): PropertyDecorator =>
  IsIn([...NUMBER_FORMATS], { message: NUMBER_FORMAT_MESSAGE });

/** Three upper-case letters: `EUR`, `USD`, `GBP`; stored as sent, so `eur` is refused. */
export function IsCurrencyCode(options?: ValidationOptions): PropertyDecorator {
  return (target, propertyName) => {
    registerDecorator({
      name: 'isCurrencyCode',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: CURRENCY_MESSAGE, ...options },
      validator: {
        validate: (value: unknown) => typeof value === 'string' && /^[A-Z]{3}$/.test(value),
      },
    });
  };
}
