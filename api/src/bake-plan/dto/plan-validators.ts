import { registerDecorator, type ValidationArguments } from 'class-validator';
import { isIsoTime } from './plan-fields.js';

// Validators that look at a neighbouring field: the final proof's kind, the plan's mode.

function register(name: string, problem: (value: unknown, object: Record<string, unknown>) => string | null) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name,
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown, args: ValidationArguments) =>
          problem(value, args.object as Record<string, unknown>) === null,
        defaultMessage: (args: ValidationArguments) =>
          problem(args.value, args.object as Record<string, unknown>) ?? '',
      },
    });
}

/** A room-proof field sent with a retard (or the other way round) is refused, not ignored. */
export const NotForProofKind = (kind: 'room' | 'retard') =>
  register('notForProofKind', (value, object) =>
    value !== undefined && object.kind === kind
      ? `This does not apply to a ${kind === 'room' ? 'room proof' : 'retard'}.`
      : null,
  );

/** Required for "ready-at", left out for "start-now". */
export const ReadyAtForMode = () =>
  register('readyAtForMode', (value, object) => {
    if (object.mode === 'start-now') return value === undefined ? null : 'Leave readyAt out when starting now.';
    if (object.mode !== 'ready-at') return null;
    if (value === undefined) return 'Choose when the bread should be ready.';
    return isIsoTime(value)
      ? null
      : 'Enter a date and time in ISO 8601 with a time zone, e.g. 2026-12-05T09:00:00+01:00.';
  });
