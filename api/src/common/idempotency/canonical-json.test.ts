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

describe('canonicalJson of deep bodies', () => {
  // Found by the write-route fuzz (test/fuzz-routes.api.test.ts): a JSON body nested 10,000 deep
  // overflowed the recursive version, and every idempotent write answered 500.
  it('writes a body nested 10,000 deep without overflowing the stack', () => {
    const depth = 10_000;
    const text = '['.repeat(depth) + ']'.repeat(depth);
    expect(canonicalJson(JSON.parse(text))).toBe(text);
    const objects = '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);
    expect(canonicalJson(JSON.parse(objects))).toBe(objects);
  });

  it('matches JSON.stringify on arrays with holes and undefined members', () => {
    expect(canonicalJson({ a: [1, undefined, { c: undefined, b: [] }], z: undefined })).toBe('{"a":[1,null,{"b":[]}]}');
  });
});
