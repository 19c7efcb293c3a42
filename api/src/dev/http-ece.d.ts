// http_ece (Encrypted Content-Encoding, RFC 8188) ships no types; only what the fake push service uses.
declare module 'http_ece' {
  import type { ECDH } from 'node:crypto';
  export function decrypt(
    buffer: Buffer,
    params: { version: 'aes128gcm'; privateKey: ECDH; authSecret: string },
  ): Buffer;
}
