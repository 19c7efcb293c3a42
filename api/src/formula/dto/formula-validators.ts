import { registerDecorator, ValidateIf, type ValidationArguments } from 'class-validator';

function register(name: string, validate: (value: unknown, object: Record<string, unknown>) => string | null) {
  return (target: object, propertyName: string) =>
    registerDecorator({
      name,
      target: target.constructor,
      propertyName,
      validator: {
        validate: (value: unknown, args: ValidationArguments) =>
          validate(value, args.object as Record<string, unknown>) === null,
        defaultMessage: (args: ValidationArguments) =>
          validate(args.value, args.object as Record<string, unknown>) ?? '',
      },
    });
}

/** A starter's hydration means nothing on a flour or milk line; the table refuses it too. */
export const OnlyForStarter = () =>
  register('onlyForStarter', (_value, line) =>
    line.kind === 'starter' ? null : 'Only a starter line takes a hydration.',
  );

/**
 * A scaling field belongs to one way of scaling: it is required with that `by` and refused with
 * another, so a stored default never carries a stale number.
 */
export const ForScaleBy =
  (by: string, required = true) =>
  (target: object, propertyName: string) => {
    ValidateIf((o: Record<string, unknown>, value: unknown) => (required && o.by === by) || value !== undefined)(
      target,
      propertyName,
    );
    register('forScaleBy', (_value, o) => (o.by === by ? null : `Send ${propertyName} only when scaling by ${by}.`))(
      target,
      propertyName,
    );
  };

export const IsWholeNumber = (message: string) =>
  register('isWholeNumber', (value) => (Number.isInteger(value) ? null : message));
