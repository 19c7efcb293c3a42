import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';

export interface ServerFormErrors<F extends string> {
  /** Server complaints about fields this form shows: displayed under the matching input. */
  fieldErrors: { field: F; message: string }[];
  /** Everything else, for an alert above the submit button; null when the fields say it all. */
  formMessage: string | null;
}

const UNKNOWN_FAILURE = 'Something went wrong. Please try again.';

/**
 * Sorts a failed request's ErrorResponse into per-field messages and one form-level message.
 * The server is the authority on validity; this only decides where its words are shown.
 */
export function mapServerErrors<F extends string>(error: unknown, fields: readonly F[]): ServerFormErrors<F> {
  if (!isApiError(error)) return { fieldErrors: [], formMessage: UNKNOWN_FAILURE };

  const known = new Set<string>(fields);
  const fieldErrors: { field: F; message: string }[] = [];
  const unplaced: string[] = [];
  for (const detail of error.body.details ?? []) {
    if (known.has(detail.field)) {
      // Only the first message per field is shown; the input has room for one line.
      if (!fieldErrors.some((e) => e.field === detail.field)) {
        fieldErrors.push({ field: detail.field as F, message: detail.message });
      }
    } else {
      unplaced.push(detail.message);
    }
  }

  if (unplaced.length > 0) return { fieldErrors, formMessage: unplaced.join(' ') };
  return { fieldErrors, formMessage: fieldErrors.length > 0 ? null : error.body.message };
}

/** The react-hook-form key for the form-level server message. */
export const SERVER_ERROR_KEY = 'root.server';

/** Shows a failed submit's errors in a react-hook-form form and focuses the first bad field. */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): void {
  const { fieldErrors, formMessage } = mapServerErrors(error, fields);
  fieldErrors.forEach(({ field, message }, index) => {
    setError(field, { type: 'server', message }, { shouldFocus: index === 0 });
  });
  if (formMessage !== null) setError(SERVER_ERROR_KEY, { type: 'server', message: formMessage });
}

/** applyServerErrors for a form whose fields are named unlike the API's: `fieldOf` maps API field → form field. */
export function applyMappedServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldOf: Readonly<Record<string, Path<T>>>,
): void {
  const { fieldErrors, formMessage } = mapServerErrors(error, Object.keys(fieldOf));
  fieldErrors.forEach(({ field, message }, index) => {
    const name = fieldOf[field];
    if (name) setError(name, { type: 'server', message }, { shouldFocus: index === 0 });
  });
  if (formMessage !== null) setError(SERVER_ERROR_KEY, { type: 'server', message: formMessage });
}
