import { BadRequestException, ValidationPipe, type ArgumentMetadata, type ValidationError } from '@nestjs/common';
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

/**
 * Half of a UTF-16 pair on its own (JSON can carry "\ud800"): no character at all, it cannot be
 * written as UTF-8, and validator's isEmail threw on it (encodeURI), a 500.
 */
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
const BROKEN_TEXT = 'This text has a broken character (half of a UTF-16 pair); type it again.';

/** Deeper than any request of ours, and far from where recursive framework code overflows. */
export const MAX_INPUT_DEPTH = 32;

/**
 * What no body, path or query value may hold, whatever its DTO says, found in one walk before
 * class-transformer and class-validator see it (both recurse, and a body nested 10,000 deep
 * overflowed the stack: a 500); text with NUL, which PostgreSQL cannot store (another 500), or
 * with a lone surrogate (a 500 in isEmail); and
 * keys named like Object.prototype's members (toString, __defineGetter__, constructor…) or
 * "prototype", which class-validator's whitelist let through as if declared, so a write with them
 * went through.
 * Found by the write-route fuzz (test/fuzz-routes.api.test.ts).
 */
export function screenInput(value: unknown, root: string | null): FieldError | null {
  const work: { value: unknown; field: string | null; depth: number }[] = [{ value, field: root, depth: 0 }];
  while (work.length > 0) {
    const { value: current, field, depth } = work.pop()!;
    if (typeof current === 'string') {
      if (current.includes('\u0000')) return { field: field ?? 'body', message: 'Remove the NUL character (\\u0000).' };
      if (LONE_SURROGATE.test(current)) return { field: field ?? 'body', message: BROKEN_TEXT };
      continue;
    }
    if (current === null || typeof current !== 'object') continue;
    if (depth >= MAX_INPUT_DEPTH) {
      return { field: field ?? 'body', message: `Nest values at most ${MAX_INPUT_DEPTH} levels deep.` };
    }
    for (const [key, child] of Object.entries(current)) {
      const path = field === null ? key : `${field}.${key}`;
      if (key in Object.prototype || key === 'prototype' || key.includes('\u0000') || LONE_SURROGATE.test(key)) {
        return { field: path, message: 'Not a field of this request.' };
      }
      work.push({ value: child, field: path, depth: depth + 1 });
    }
  }
  return null;
}

const NOT_DTOS: unknown[] = [String, Number, Boolean, Array, Object, Date, Function, Promise];

/**
 * An array sent for a property typed as one DTO class (`keys: PushKeysDto`): class-transformer
 * turns it into an instance of that class ([] → {}, which then passes; [1] → a TypeError, a 500),
 * so it is refused before the transform. Follows nested DTO classes by their declared types.
 */
export function arrayForObject(value: unknown, metatype: unknown, field: string | null, depth = 0): FieldError | null {
  if (typeof metatype !== 'function' || NOT_DTOS.includes(metatype) || depth > MAX_INPUT_DEPTH) return null;
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return null;
  for (const [key, child] of Object.entries(value)) {
    const type: unknown = Reflect.getMetadata('design:type', (metatype as { prototype: object }).prototype, key);
    if (typeof type !== 'function' || NOT_DTOS.includes(type)) continue;
    const path = field === null ? key : `${field}.${key}`;
    if (Array.isArray(child)) return { field: path, message: 'Send an object, not a list.' };
    const nested = arrayForObject(child, type, path, depth + 1);
    if (nested) return nested;
  }
  return null;
}

const refuse = (problem: FieldError) =>
  new BadRequestException({ message: 'Some fields need another look.', details: [problem] });

class ScreeningValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    const whole = metadata.data === undefined;
    if (metadata.type === 'body' && whole && (value === undefined || value === null) && isDto(metadata.metatype)) {
      // No JSON body at all: none sent, `null`, or another type's parser left it unread (multipart
      // is parsed for every route, since uploads exist). Checked as {} it names the required
      // fields, as before; where none is required, {} passed and an empty PATCH answered 200.
      await super.transform({}, metadata);
      throw refuse({ field: 'body', message: 'Send a JSON object, as application/json.' });
    }
    if (metadata.type === 'body' || metadata.type === 'param' || metadata.type === 'query') {
      const problem =
        screenInput(value, whole ? null : metadata.data) ??
        arrayForObject(value, metadata.metatype, whole ? null : metadata.data);
      if (problem) throw refuse(problem);
    }
    return super.transform(value, metadata);
  }
}

/** A DTO class (not String, Number, Object… nor a missing type). */
function isDto(metatype: ArgumentMetadata['metatype']): boolean {
  return typeof metatype === 'function' && ![String, Number, Boolean, Array, Object].includes(metatype as never);
}

export function createValidationPipe(): ValidationPipe {
  return new ScreeningValidationPipe({
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
