/**
 * The Idempotency-Key header (IETF draft-ietf-httpapi-idempotency-key-header). Send a fresh key
 * (e.g. a UUID made when the form opens) with a write and the same key again on a retry: the
 * retry answers with the first response instead of writing again.
 *
 * - The value is an RFC 8941 sf-string, `"8e03978e-…"`; a bare key (no quotes, visible ASCII, no
 *   `"` or `\`) is accepted too and names the same key. 1 to IDEMPOTENCY_KEY_MAX_LENGTH characters.
 * - Keys are per account and are kept IDEMPOTENCY_KEY_TTL_DAYS after the first request; then they
 *   are swept and the key may be used again.
 * - The logbook writes an offline outbox replays REQUIRE a key (400 without one, naming the
 *   header); the other writes accept one. The same key with another body or on another route is a
 *   422; while the first request with a key is still running, a retry is a 409.
 * - A replayed answer carries `Idempotent-Replayed: true`.
 */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';
/** Set to `true` on a response that was replayed from an earlier request with the same key. */
export const IDEMPOTENT_REPLAYED_HEADER = 'Idempotent-Replayed';
export const IDEMPOTENCY_KEY_MAX_LENGTH = 255;
/** At least a week: an offline outbox may replay a write days after it was first sent. */
export const IDEMPOTENCY_KEY_TTL_DAYS = 7;
export const IDEMPOTENCY_KEY_TTL_HOURS = IDEMPOTENCY_KEY_TTL_DAYS * 24;

/** The header's value for `key` as the draft writes it: an sf-string (quoted, `"` and `\` escaped). */
export function idempotencyKeyHeaderValue(key: string): string {
  return `"${key.replace(/[\\"]/g, (c) => `\\${c}`)}"`;
}
