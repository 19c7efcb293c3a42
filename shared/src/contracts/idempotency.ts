/**
 * Send a fresh key (e.g. a UUID made when the form opens) with a write; a retry of the same
 * request with the same key answers with the first response instead of writing again. Keys are
 * per account and expire after IDEMPOTENCY_KEY_TTL_HOURS.
 */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';
/** Set to `true` on a response that was replayed from an earlier request with the same key. */
export const IDEMPOTENT_REPLAYED_HEADER = 'Idempotent-Replayed';
export const IDEMPOTENCY_KEY_MAX_LENGTH = 255;
export const IDEMPOTENCY_KEY_TTL_HOURS = 24;
