import { IDEMPOTENCY_KEY_HEADER, idempotencyKeyHeaderValue } from '@peakwise/shared';
import { useCallback, useRef } from 'react';
import { isApiError } from './api-client';

/**
 * One Idempotency-Key per submit: the same key is sent again only when the previous attempt never
 * got an answer (a phone losing its signal), so a retry cannot log the feeding twice. Once the
 * server has answered — yes or no — the next submit is a new request with a new key. The value is
 * written as the IETF draft's quoted string ("…"); the API also takes it bare.
 *
 * The logbook's feedings, rise checks, temperature readings, comments, step check-offs and dough
 * readings are refused (400) without a key, so every submit of those sends `headers()`.
 */
export function useIdempotencyKey() {
  const key = useRef<string>(crypto.randomUUID());
  const headers = useCallback(() => ({ [IDEMPOTENCY_KEY_HEADER]: idempotencyKeyHeaderValue(key.current) }), []);
  const settle = useCallback((error?: unknown) => {
    const unanswered = isApiError(error) && error.status === 0;
    if (!unanswered) key.current = crypto.randomUUID();
  }, []);
  return { headers, settle };
}
