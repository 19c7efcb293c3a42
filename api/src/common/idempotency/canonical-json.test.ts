import { describe, expect, it } from 'vitest';
import { canonicalJson, requestHash } from './canonical-json.js';

describe('canonicalJson', () => {
  it('sorts keys at every level and keeps array order', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: 1, y: 2 }], c: null } })).toBe(
      '{"a":{"c":null,"d":[3,{"y":2,"z":1}]},"b":1}',
    );
  });

  it('writes strings and numbers as JSON does', () => {
    expect(canonicalJson({ note: 'say "hi"\n', g: 33.3 })).toBe('{"g":33.3,"note":"say \\"hi\\"\\n"}');
  });
});

describe('requestHash', () => {
  it('matches for the same body in another key order and differs for another body', () => {
    expect(requestHash({ starterG: 20, flourG: 40 })).toBe(requestHash({ flourG: 40, starterG: 20 }));
    expect(requestHash({ starterG: 20 })).not.toBe(requestHash({ starterG: 21 }));
    expect(requestHash([1, 2])).not.toBe(requestHash([2, 1]));
  });

  it('treats a missing body as null', () => {
    expect(requestHash(undefined)).toBe(requestHash(null));
  });
});
