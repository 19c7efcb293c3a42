import { describe, expect, it } from 'vitest';
import { base64UrlToBytes } from './browser-push';

describe('base64UrlToBytes', () => {
  it('decodes base64url without padding (RFC 4648 §5)', () => {
    // "Peakwise" is UGVha3dpc2U in base64; the URL alphabet swaps + and / for - and _.
    expect(new TextDecoder().decode(base64UrlToBytes('UGVha3dpc2U'))).toBe('Peakwise');
    expect([...base64UrlToBytes('-_8')]).toEqual([0xfb, 0xff]);
  });

  it('gives 65 bytes for an uncompressed P-256 public key', () => {
    const key = 'B' + 'A'.repeat(86); // 87 characters → 65 bytes
    expect(base64UrlToBytes(key)).toHaveLength(65);
  });
});
