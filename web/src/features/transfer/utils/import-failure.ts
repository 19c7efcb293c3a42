import type { ImportError } from '@peakwise/shared';
import { isApiError } from '@/lib/api-client';
import { errorsFromDetails } from './import-words';

export interface Failure {
  message: string;
  errors: ImportError[];
}

/** A refused request in the page's terms: row errors by line, anything else as one message. */
export function failureOf(error: unknown): Failure {
  if (!isApiError(error)) return { message: 'Something went wrong. Please try again.', errors: [] };
  const details = error.body.details ?? [];
  const errors = errorsFromDetails(details);
  const other = details.filter((d) => !/^line \d+: /.test(d.field)).map((d) => d.message);
  return { message: other.length ? other.join(' ') : errors.length ? '' : error.message, errors };
}
