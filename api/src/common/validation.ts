import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import type { FieldError } from '@peakwise/shared';

/** Flattens class-validator's tree into one entry per offending field, named by its dotted path. */
export function toFieldErrors(errors: ValidationError[], parent = ''): FieldError[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {})
      .slice(0, 1)
      .map((message) => ({ field, message }));
    return [...own, ...toFieldErrors(error.children ?? [], field)];
  });
}

export function fieldError(field: string, message: string): BadRequestException {
  return new BadRequestException({ message: 'Some fields need another look.', details: [{ field, message }] });
}

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    // A missing body must fail validation like an empty one, not slip through as undefined.
    forbidUnknownValues: true,
    validationError: { target: false, value: false },
    exceptionFactory: (errors) =>
      new BadRequestException({ message: 'Some fields need another look.', details: toFieldErrors(errors) }),
  });
}
