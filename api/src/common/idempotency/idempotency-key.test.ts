import { IDEMPOTENCY_KEY_MAX_LENGTH, idempotencyKeyHeaderValue } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { parseIdempotencyKey } from './idempotency-key.js';

// sf-string rules from RFC 8941 section 3.3.3 (from memory); the draft's example value is
// `"8e03978e-40d5-43e8-bc93-6894a57f9324"` (draft-ietf-httpapi-idempotency-key-header, 2.1).
describe('parseIdempotencyKey', () => {
  it('reads the draft’s quoted form and the bare form as the same key', () => {
    const uuid = '8e03978e-40d5-43e8-bc93-6894a57f9324';
    expect(parseIdempotencyKey(`"${uuid}"`)).toBe(uuid);
    expect(parseIdempotencyKey(uuid)).toBe(uuid);
  });

  it('unescapes \\" and \\\\ inside quotes, and round-trips the shared writer', () => {
    expect(parseIdempotencyKey('"a\\"b\\\\c d"')).toBe('a"b\\c d');
    for (const key of ['plain', 'with space', 'q"uo\\te']) {
      expect(parseIdempotencyKey(idempotencyKeyHeaderValue(key))).toBe(key);
    }
  });

  it('refuses empty, too long, non-ASCII, unbalanced, parameterised and doubled values', () => {
    const refused = [
      '',
      '""',
      'k'.repeat(IDEMPOTENCY_KEY_MAX_LENGTH + 1),
      `"${'k'.repeat(IDEMPOTENCY_KEY_MAX_LENGTH + 1)}"`,
      'ü-key',
      '"ü-key"',
      'with space',
      '"open',
      '"a"b',
      '"a\\x"',
      '"a";p=1',
      'a, b',
      '"a", "b"',
      'a"b',
      'a\\b',
      '"tab\there"',
    ];
    for (const value of refused) expect(parseIdempotencyKey(value), value).toBeNull();
  });

  it('takes a key of exactly the longest length', () => {
    const key = 'k'.repeat(IDEMPOTENCY_KEY_MAX_LENGTH);
    expect(parseIdempotencyKey(key)).toBe(key);
    expect(parseIdempotencyKey(`"${key}"`)).toBe(key);
  });
});
