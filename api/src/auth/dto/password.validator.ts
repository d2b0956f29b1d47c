import { registerDecorator, type ValidationOptions } from 'class-validator';

/** bcrypt reads only the first 72 bytes; a longer password would be cut silently, so refuse it. */
export function IsBcryptSafe(options?: ValidationOptions): PropertyDecorator {
  return (target, propertyName) => {
    registerDecorator({
      name: 'isBcryptSafe',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: 'password must be at most 72 bytes long', ...options },
      validator: {
        validate: (value: unknown) =>
          typeof value === 'string' && Buffer.byteLength(value, 'utf8') <= 72,
      },
    });
  };
}
