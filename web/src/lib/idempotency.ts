import { IDEMPOTENCY_KEY_HEADER, idempotencyKeyHeaderValue } from '@peakwise/shared';
import { useCallback, useRef } from 'react';
import { isApiError } from './api-client';

/**
 * One Idempotency-Key per submit: the same key is sent again only when the previous attempt never
 * got an answer (a phone losing its signal) or the server said that attempt is still running (409),
 * so a retry cannot log the feeding twice. Once the server has answered otherwise — yes or no —
 * the next submit is a new request with a new key. The value is
 * written as the IETF draft's quoted string ("…"); the API also takes it bare.
 *
 * The logbook's feedings, rise checks, temperature readings, comments, step check-offs and dough
 * readings are refused (400) without a key, so every submit of those sends `headers()`.
 */
export function useIdempotencyKey() {
  const key = useRef<string>(crypto.randomUUID());
  const headers = useCallback(() => ({ [IDEMPOTENCY_KEY_HEADER]: idempotencyKeyHeaderValue(key.current) }), []);
  const settle = useCallback((error?: unknown) => {
    if (!retriesSameWrite(error)) key.current = crypto.randomUUID();
  }, []);
  return { headers, settle };
}

/**
 * Whether the next submit after this outcome is a retry of the same write, to be sent with the
 * same key: no answer at all, or 409 (the first attempt with this key is still running).
 */
export function retriesSameWrite(error?: unknown): boolean {
  return isApiError(error) && (error.status === 0 || error.status === 409);
}
