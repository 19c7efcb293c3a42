import { IDEMPOTENCY_KEY_HEADER } from '@peakwise/shared';
import { useCallback, useRef } from 'react';
import { isApiError } from './api-client';

/**
 * One Idempotency-Key per submit: the same key is sent again only when the previous attempt never
 * got an answer (a phone losing its signal), so a retry cannot log the feeding twice. Once the
 * server has answered — yes or no — the next submit is a new request with a new key.
 */
export function useIdempotencyKey() {
  const key = useRef<string>(crypto.randomUUID());
  const headers = useCallback(() => ({ [IDEMPOTENCY_KEY_HEADER]: key.current }), []);
  const settle = useCallback((error?: unknown) => {
    const unanswered = isApiError(error) && error.status === 0;
    if (!unanswered) key.current = crypto.randomUUID();
  }, []);
  return { headers, settle };
}
