import { Transform } from 'class-transformer';
import { ValidateIf, registerDecorator, type ValidationArguments } from 'class-validator';
import {
  EARLIEST_LOG_TIME,
  EARLIEST_STARTED_ON,
  FUTURE_TOLERANCE_MINUTES,
  GRAMS_MAX,
  HEIGHT_MAX_MM,
  HYDRATION_MAX_PCT,
  TEMPERATURE_MAX_C,
  TEMPERATURE_MIN_C,
} from '@peakwise/shared';

// Validators for the fields of the culture logbook. Each reports one plain message per field, so
// a phone form can show it beside the input as it is.

/** Like Omittable(), but `null` is accepted too: it clears a field that may be empty. */
export const Clearable = () => ValidateIf((_: object, value: unknown) => value !== undefined && value !== null);

/** Trims text; blank text becomes null, so "no notes" is stored one way only. */
export const TrimToNull = () =>
  Transform(({ value }: { value: unknown }) => {
    if (typeof value !== 'string') return value;
    const trimmed = value.trim();
    return trimmed === '' ? null : trimmed;
  });

function register(name: string, validate: (value: unknown, args: ValidationArguments) => string | null) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name,
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown, args: ValidationArguments) => validate(value, args) === null,
        defaultMessage: (args: ValidationArguments) => validate(args.value, args) ?? '',
      },
    });
}

/**
 * Text of `min`…`max` characters, counted as PostgreSQL's length() counts them (code points),
 * so nothing the API accepts can trip the column's CHECK.
 */
export function IsText(min: number, max: number, message: string) {
  return register('isText', (value) => {
    if (typeof value !== 'string') return message;
    const length = [...value].length;
    return length >= min && length <= max ? null : message;
  });
}

export interface MeasureRange {
  min: number;
  /** true: the value must be above min, not equal to it. */
  minExclusive?: boolean;
  max: number;
  message: string;
}

export const GRAMS: MeasureRange = {
  min: 0,
  minExclusive: true,
  max: GRAMS_MAX,
  message: `Enter a weight above 0 g and at most ${GRAMS_MAX} g.`,
};
export const TEMPERATURE: MeasureRange = {
  min: TEMPERATURE_MIN_C,
  max: TEMPERATURE_MAX_C,
  message: `Enter a temperature from ${TEMPERATURE_MIN_C} to ${TEMPERATURE_MAX_C} °C.`,
};
export const HEIGHT: MeasureRange = {
  min: 0,
  minExclusive: true,
  max: HEIGHT_MAX_MM,
  message: `Enter a height above 0 mm and at most ${HEIGHT_MAX_MM} mm.`,
};
export const HYDRATION: MeasureRange = {
  min: 0,
  minExclusive: true,
  max: HYDRATION_MAX_PCT,
  message: `Enter a hydration above 0 % and at most ${HYDRATION_MAX_PCT} %.`,
};

/** A finite number within a range (JSON numbers only: "25" is refused, not converted). */
export function IsMeasure(range: MeasureRange) {
  return register('isMeasure', (value) => {
    if (typeof value !== 'number' || !Number.isFinite(value)) return range.message;
    const aboveMin = range.minExclusive ? value > range.min : value >= range.min;
    return aboveMin && value <= range.max ? null : range.message;
  });
}

const DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,9})?)?(?:Z|[+-](\d{2}):(\d{2}))$/;
const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

const NOT_A_TIME = 'Enter a date and time in ISO 8601 with a time zone, e.g. 2025-03-01T07:30:00Z.';

function isRealDate(year: number, month: number, day: number): boolean {
  if (month < 1 || month > 12 || day < 1) return false;
  return day <= new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** Why `value` is not an acceptable log time (fedAt, takenAt), or null if it is. */
export function logTimeProblem(value: unknown, now = Date.now()): string | null {
  const match = typeof value === 'string' ? DATE_TIME.exec(value) : null;
  const [, y, mo, d, h, mi, s, oh, om] = (match ?? []).map(Number);
  const valid =
    match &&
    isRealDate(y!, mo!, d!) &&
    h! <= 23 &&
    mi! <= 59 &&
    (Number.isNaN(s) || s! <= 59) &&
    (Number.isNaN(oh) || (oh! <= 23 && om! <= 59));
  if (!valid) return NOT_A_TIME;
  const time = Date.parse(value as string);
  if (Number.isNaN(time)) return NOT_A_TIME;
  if (time < Date.parse(EARLIEST_LOG_TIME)) return 'Enter a time on or after 1 January 2000.';
  if (time > now + FUTURE_TOLERANCE_MINUTES * 60_000) {
    return `This is more than ${FUTURE_TOLERANCE_MINUTES} minutes in the future; check the date and the clock.`;
  }
  return null;
}

export const IsLogTime = () => register('isLogTime', (value) => logTimeProblem(value));

/** A calendar date YYYY-MM-DD from 1800 up to tomorrow (UTC), so every time zone's today fits. */
export const IsCalendarDate = () =>
  register('isCalendarDate', (value) => {
    const match = typeof value === 'string' ? DATE.exec(value) : null;
    const [, y, m, d] = (match ?? []).map(Number);
    if (!match || !isRealDate(y!, m!, d!)) return 'Enter a date as YYYY-MM-DD, e.g. 2025-03-01.';
    const date = match[0];
    if (date < EARLIEST_STARTED_ON) return `Enter a date on or after ${EARLIEST_STARTED_ON}.`;
    const tomorrow = new Date(Date.now() + 24 * 3600_000).toISOString().slice(0, 10);
    return date > tomorrow ? 'This date is in the future.' : null;
  });

/** Refuses this field when any of `others` is sent too (either-or inputs). */
export const NotWith = (others: string[], message: string) =>
  register('notWith', (_value, args) => {
    const object = args.object as Record<string, unknown>;
    return others.some((other) => object[other] !== undefined) ? message : null;
  });
