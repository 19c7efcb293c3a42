import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, Matches, Max, Min, ValidateNested } from 'class-validator';
import { Omittable } from '../../common/dto-helpers.js';
import { IsMeasure } from '../../common/log-fields.js';

// Field decorators of the bake plan's request shapes: each field documents itself and says in one
// plain sentence what it accepts. Ranges mirror the planner's own checks (fermentation/plan), so
// the planner rarely has to refuse what the DTO let through.

/** An optional number within a range, in `unit`. */
export function OptionalNumber(min: number, max: number, unit: string, description?: string, minExclusive = false) {
  const from = minExclusive ? `above ${min}` : `from ${min}`;
  return applyDecorators(
    ApiPropertyOptional({ type: Number, minimum: min, exclusiveMinimum: minExclusive, maximum: max, description }),
    Omittable(),
    IsMeasure({ min, max, minExclusive, message: `Enter a number ${from} to ${max} ${unit}.` }) as PropertyDecorator,
  );
}

export function RequiredNumber(min: number, max: number, unit: string, minExclusive = false) {
  const from = minExclusive ? `above ${min}` : `from ${min}`;
  return applyDecorators(
    ApiProperty({ type: Number, minimum: min, exclusiveMinimum: minExclusive, maximum: max }),
    IsMeasure({ min, max, minExclusive, message: `Enter a number ${from} to ${max} ${unit}.` }) as PropertyDecorator,
  );
}

/** An optional whole number within a range. */
export function OptionalWhole(min: number, max: number, description?: string) {
  const message = `Enter a whole number from ${min} to ${max}.`;
  return applyDecorators(
    ApiPropertyOptional({ type: Number, minimum: min, maximum: max, description }),
    Omittable(),
    Max(max, { message }),
    Min(min, { message }),
    IsInt({ message }),
  );
}

export function OptionalBoolean(description?: string) {
  return applyDecorators(
    ApiPropertyOptional({ type: Boolean, description }),
    Omittable(),
    IsBoolean({ message: 'Send true or false.' }),
  );
}

/** An optional nested object, validated field by field (errors named like `steps.folds.sets`). */
export function Nested(type: () => new () => object, description?: string) {
  // The class is declared above its use, so it can be named now (the OpenAPI schema needs its name).
  return applyDecorators(ApiPropertyOptional({ type: type(), description }), Omittable(), ValidateNested(), Type(type));
}

/** One of a list; document it with ApiProperty beside it (required or not). */
export const OneOf = (values: readonly string[]) => IsIn(values, { message: `Choose one of: ${values.join(', ')}.` });

const CLOCK = /^([01]\d|2[0-3]):[0-5]\d$/;

/** A local clock time "HH:MM", 24-hour. */
export function ClockTime(example: string) {
  return applyDecorators(
    ApiProperty({ example, pattern: CLOCK.source }),
    Matches(CLOCK, { message: 'Enter a time of day as HH:MM, 24-hour, e.g. 23:00.' }),
  );
}

const DATE_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/;

export const isIsoTime = (value: unknown): boolean =>
  typeof value === 'string' && DATE_TIME.test(value) && !Number.isNaN(Date.parse(value));
