import { registerDecorator, type ValidationArguments } from 'class-validator';
import { CLASS_MAX_DAYS } from '@peakwise/shared';

// Date rules of a class, used by the DTOs (one field at a time) and by the service (a PATCH that
// moves one end is checked against the other end as stored).

const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
/** Classes are planned, not archived: a sane window that every date column holds. */
const EARLIEST = '2000-01-01';
const LATEST = '2099-12-31';

export const NOT_A_DATE = 'Enter a date as YYYY-MM-DD, e.g. 2026-03-01.';

/** Why `value` is not a class date, or null if it is one (a real calendar day, 2000–2099). */
export function classDateProblem(value: unknown): string | null {
  const match = typeof value === 'string' ? DATE.exec(value) : null;
  if (!match) return NOT_A_DATE;
  const [y, m, d] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const real = m >= 1 && m <= 12 && d >= 1 && d <= new Date(Date.UTC(y, m, 0)).getUTCDate();
  if (!real) return NOT_A_DATE;
  if (match[0] < EARLIEST || match[0] > LATEST) return `Enter a date from ${EARLIEST} to ${LATEST}.`;
  return null;
}

/** Days a class runs, counting its first and last day (a one-day class runs 1 day). */
export function classDays(startsOn: string, endsOn: string): number {
  return Math.round((Date.parse(`${endsOn}T00:00:00Z`) - Date.parse(`${startsOn}T00:00:00Z`)) / 86_400_000) + 1;
}

/** Why this date range is not a class's, or null; both ends must already be valid dates. */
export function classRangeProblem(startsOn: string, endsOn: string): string | null {
  if (endsOn < startsOn) return 'The class cannot end before it starts.';
  if (classDays(startsOn, endsOn) > CLASS_MAX_DAYS) return `A class runs at most ${CLASS_MAX_DAYS} days.`;
  return null;
}

export function IsClassDate() {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isClassDate',
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown) => classDateProblem(value) === null,
        defaultMessage: (args: ValidationArguments) => classDateProblem(args.value) ?? '',
      },
    });
}

/**
 * On endsOn: the range with the request's own startsOn. Reports only when both ends are valid
 * dates, so a bad startsOn is named once, at startsOn.
 */
export function IsClassEnd() {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isClassEnd',
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown, args: ValidationArguments) => rangeOf(value, args) === null,
        defaultMessage: (args: ValidationArguments) => rangeOf(args.value, args) ?? '',
      },
    });
}

function rangeOf(endsOn: unknown, args: ValidationArguments): string | null {
  const startsOn = (args.object as { startsOn?: unknown }).startsOn;
  if (classDateProblem(startsOn) !== null || classDateProblem(endsOn) !== null) return null;
  return classRangeProblem(startsOn as string, endsOn as string);
}
