import { IDEMPOTENCY_KEY_MAX_LENGTH } from '@peakwise/shared';

/**
 * The key an Idempotency-Key header carries, or null when the value is malformed.
 *
 * The draft (draft-ietf-httpapi-idempotency-key-header, section 2.1 "Syntax", verified in the
 * working group's editor's copy) makes the value an RFC 8941 Item whose value is a String:
 * `"8e03978e-40d5-43e8-bc93-6894a57f9324"`. sf-string per RFC 8941 section 3.3.3 (from memory):
 * printable ASCII between double quotes, `"` and `\` escaped with `\`. Item parameters
 * (`"k";a=1`) are refused: the draft defines none.
 *
 * Clients written before the draft send the key bare (`8e03978e-…`); that is accepted as the
 * same key when it is visible ASCII without `"` or `\`, so both spellings of one key meet.
 * Two header fields arrive joined as `a, b` and fail both forms (the draft allows one field).
 */
export function parseIdempotencyKey(value: string): string | null {
  const key = value.startsWith('"') ? parseSfString(value) : BARE.test(value) ? value : null;
  if (key === null || key.length === 0 || key.length > IDEMPOTENCY_KEY_MAX_LENGTH) return null;
  return key;
}

const BARE = /^[\x21\x23-\x5b\x5d-\x7e]+$/;

function parseSfString(value: string): string | null {
  let key = '';
  for (let i = 1; i < value.length; i += 1) {
    const c = value[i]!;
    if (c === '"') return i === value.length - 1 ? key : null;
    if (c === '\\') {
      const next = value[i + 1];
      if (next !== '"' && next !== '\\') return null;
      key += next;
      i += 1;
      continue;
    }
    const code = c.charCodeAt(0);
    if (code < 0x20 || code > 0x7e) return null;
    key += c;
  }
  return null; // no closing quote
}
