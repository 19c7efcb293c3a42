import { Transform } from 'class-transformer';
import { ValidateIf, registerDecorator, type ValidationOptions } from 'class-validator';

/**
 * The field may be left out, but if it is sent it must be valid. Unlike class-validator's
 * @IsOptional(), `null` is not "left out": it is validated (and refused) like any other value.
 */
export const Omittable = () => ValidateIf((_: object, value: unknown) => value !== undefined);

/** Trims surrounding white space from a string field before it is validated. */
export const Trim = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));

/** E-mail addresses compare case-blind: keep one spelling. */
export const NormaliseEmail = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value));

const zones = new Set(Intl.supportedValuesOf('timeZone'));
zones.add('UTC');

/** An IANA time zone name this runtime knows, e.g. `Europe/Berlin`. */
export function IsTimeZone(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isTimeZone',
      target: object.constructor,
      propertyName,
      options: { message: 'Choose a time zone from the list, e.g. Europe/London.', ...options },
      validator: { validate: (value: unknown) => typeof value === 'string' && zones.has(value) },
    });
}
