import fc from 'fast-check';
import { REQUEST_BODY_MAX_BYTES } from '@peakwise/shared';

// Request bodies for the write-route fuzz (fuzz-routes.api.test.ts), built so that each one is
// invalid by construction: whatever the route, the API must refuse it with a 4xx and write
// nothing. JSON is written as raw text, so what JSON.stringify would drop or change survives:
// `__proto__` keys, 1e309 (parsed as Infinity), -0, lone surrogates as \ud800 escapes.

/** One request the fuzz sends; `why` says what makes it invalid (shown on a failure). */
export interface FuzzRequest {
  why: string;
  /** Replacement for each path parameter in turn; null keeps the valid id. */
  ids: (string | null)[];
  /** The Content-Type header, or undefined for none. */
  contentType: string | undefined;
  payload: string | Buffer | undefined;
  /** Top-level keys of a JSON object body, to judge the fields an error names. */
  keys: string[];
}

/** A route as the fuzz sees it: its path parameters and, for JSON routes, one valid body. */
export interface RouteShape {
  params: string[];
  template: Record<string, unknown> | null;
  upload: boolean;
}

// ---- raw JSON text -----------------------------------------------------------------------

/** A JSON value as raw text (so that anything JSON can carry is possible, nothing it cannot). */
type Raw = string;
const str = (s: string): Raw => JSON.stringify(s);
const obj = (members: [string, Raw][]): Raw => `{${members.map(([k, v]) => `${rawKey(k)}:${v}`).join(',')}}`;
const arr = (items: Raw[]): Raw => `[${items.join(',')}]`;
/** Keys may carry escapes written on purpose (lone surrogates); others are stringified. */
const rawKey = (k: string): Raw => (k.startsWith('"') ? k : JSON.stringify(k));

const DEEP = 10_000;
const deepArray = (depth: number): Raw => '['.repeat(depth) + ']'.repeat(depth);
const deepObject = (depth: number): Raw => '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);

/** Strings a careless parser, validator, database or template trips on. */
const ODD_TEXT: Raw[] = [
  '"\\ud800"', // lone high surrogate
  '"\\udfff tail"', // lone low surrogate
  '"a\\u0000b"', // NUL
  '"\\u0000"',
  `"${'\u202e'}evil${'\u202c'}"`, // RTL override
  '"\\u200f\\u200e"', // RTL / LTR marks
  str('🍞🫙🔥'),
  str('👩🏽‍🍳'),
  str('e\u0301\u0301\u0301\u0301\u0301\u0301'), // combining marks
  str('Z̸̢̛̤͓̓͂a̵̡̛͓̺͗l̶̨̪͍̒g̷̺͍͑o̵̦͒'),
  str('\ufeffBOM'),
  str(''),
  str(' '),
  str('\t\n\r'),
  str('null'),
  str('undefined'),
  str('NaN'),
  str('Infinity'),
  str('-Infinity'),
  str('1e309'),
  str('0x10'),
  str('2026-02-30T25:61:00Z'),
  str('<script>alert(1)</script>'),
  str("'; DROP TABLE culture; --"),
  str('${7*7}{{7*7}}'),
  str('../../etc/passwd'),
  str('%00%ff'),
  str('=cmd|" /C calc"!A0'),
];

/** Numbers at the edges: 1e309 and -1e309 parse as ±Infinity; -0 and 1e-400 (0) stay numbers. */
const ODD_NUMBERS: Raw[] = [
  '1e309',
  '-1e309',
  '-0',
  '0',
  '1e-400',
  '5e-324',
  '1.7976931348623157e308',
  '-1.7976931348623157e308',
  '9007199254740993',
  '-9007199254740993',
  '123456789012345678901234567890',
  '0.1',
  '-1',
  '2147483648',
  '1e21',
];

const DANGER_KEYS = [
  '__proto__',
  'constructor',
  'prototype',
  'toString',
  'valueOf',
  'hasOwnProperty',
  '__defineGetter__',
];

/** Keys no DTO declares (dangerous ones included), so whitelisting must refuse the body. */
const unknownKey: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...DANGER_KEYS),
  fc.constantFrom('"\\ud800"', '"\\u0000"', '""', '" "', '"🍞"', '"\\u202e"'),
  fc.string({ minLength: 1, maxLength: 12 }).map((s) => `zz${s}`),
  fc.constantFrom('id', 'accountId', 'ownerId', 'createdAt', 'role', 'isAdmin', 'deletedAt', 'polluted'),
);

/** Any JSON value, weighted to the odd: deep nesting, long strings, odd text and numbers. */
function anyValue(depth: number): fc.Arbitrary<Raw> {
  const leaves: fc.Arbitrary<Raw>[] = [
    fc.constantFrom(...ODD_TEXT),
    fc.constantFrom(...ODD_NUMBERS),
    fc.constantFrom('true', 'false', 'null'),
    fc.string({ maxLength: 20 }).map(str),
    fc.double().map((d) => (Number.isFinite(d) ? JSON.stringify(d) : '1e309')),
    fc.integer().map(String),
  ];
  const big: fc.Arbitrary<Raw>[] = [
    fc.constantFrom(deepArray(DEEP), deepObject(DEEP), deepArray(100), deepObject(100)),
    fc.integer({ min: 1_000, max: 200_000 }).map((n) => str('x'.repeat(n))),
    fc.integer({ min: 100, max: 20_000 }).map((n) => str('🍞'.repeat(n))),
    fc.constant(str('\u0301'.repeat(50_000))),
    // A polluting payload, should any layer merge it into a prototype.
    fc.constant(
      obj([
        ['__proto__', obj([['polluted', 'true']])],
        ['constructor', obj([['prototype', obj([['polluted', 'true']])]])],
      ]),
    ),
  ];
  if (depth <= 0) return fc.oneof(...leaves);
  return fc.oneof(
    { weight: 6, arbitrary: fc.oneof(...leaves) },
    { weight: 1, arbitrary: fc.oneof(...big) },
    { weight: 1, arbitrary: fc.array(anyValue(depth - 1), { maxLength: 4 }).map(arr) },
    {
      weight: 1,
      arbitrary: fc
        .array(fc.tuple(fc.oneof(unknownKey, fc.string({ maxLength: 8 })), anyValue(depth - 1)), { maxLength: 4 })
        .map(obj),
    },
  );
}

const value = anyValue(2);

/** A value whose JSON type differs from `like`'s, and that is not null (null may clear a field). */
function otherType(like: unknown): fc.Arbitrary<Raw> {
  const kind = Array.isArray(like) ? 'array' : like === null ? 'null' : typeof like;
  const byKind: Record<string, fc.Arbitrary<Raw>> = {
    string: fc.oneof(fc.constantFrom(...ODD_TEXT), fc.string({ maxLength: 30 }).map(str)),
    number: fc.oneof(fc.constantFrom('1e309', '-1e309', '-0', '1e308'), fc.integer().map(String)),
    boolean: fc.constantFrom('true', 'false'),
    array: fc.array(value, { maxLength: 3 }).map(arr),
    object: fc.oneof(fc.constant('{}'), fc.array(fc.tuple(unknownKey, value), { maxLength: 3 }).map(obj)),
  };
  const others = Object.entries(byKind)
    .filter(([k]) => k !== kind)
    // A number written as a string ("24") is still the wrong type; a string field may however
    // accept text that looks like anything, so strings never replace strings.
    .map(([, a]) => a);
  return fc.oneof(...others);
}

const members = (template: Record<string, unknown>): [string, Raw][] =>
  Object.entries(template).map(([k, v]) => [k, JSON.stringify(v)]);

// ---- bodies by kind ------------------------------------------------------------------------

interface Body {
  why: string;
  contentType: string | undefined;
  payload: string | Buffer | undefined;
  keys: string[];
}

const json = (why: string, payload: Raw, keys: string[] = []): Body => ({
  why,
  contentType: 'application/json',
  payload,
  keys,
});

/** JSON that is not an object: arrays (of the valid body too), strings, numbers, booleans, null. */
function notAnObject(template: Record<string, unknown> | null): fc.Arbitrary<Body> {
  const valid = template ? JSON.stringify(template) : '{}';
  return fc
    .oneof(
      fc.constantFrom(`[${valid}]`, `[${valid},${valid}]`, '[]', 'null', 'true', '0', '-0', '1e309', '""', '"{}"'),
      fc.array(value, { maxLength: 3 }).map(arr),
      fc.constantFrom(...ODD_TEXT, ...ODD_NUMBERS),
      fc.constantFrom(deepArray(DEEP), `${'['.repeat(DEEP)}${valid}${']'.repeat(DEEP)}`),
    )
    .map((payload) => json('not a JSON object', payload));
}

/** The valid body plus keys no DTO declares (with any values), in any order. */
function unknownFields(template: Record<string, unknown>): fc.Arbitrary<Body> {
  return fc
    .tuple(fc.array(fc.tuple(unknownKey, value), { minLength: 1, maxLength: 3 }), fc.nat(), oddenFields(template))
    .map(([extra, at, base]) => {
      const all = [...base];
      for (const member of extra) all.splice(at % (all.length + 1), 0, member);
      // A key that duplicates a declared field would not be unknown: JSON.parse keeps the last.
      const known = new Set(Object.keys(template));
      const unknown = extra.filter(([k]) => !known.has(k));
      const safe = unknown.length > 0 ? all : [...all, ['zzUnknown', 'true'] as [string, Raw]];
      return json(
        `unknown field ${unknown.map(([k]) => k).join(', ') || 'zzUnknown'}`,
        obj(safe),
        safe.map(([k]) => k),
      );
    });
}

/** The valid body's members with some values swapped for odd ones (same or other type). */
function oddenFields(template: Record<string, unknown>): fc.Arbitrary<[string, Raw][]> {
  const base = members(template);
  if (base.length === 0) return fc.constant(base);
  return fc.array(fc.tuple(fc.nat(base.length - 1), value), { maxLength: 2 }).map((swaps) => {
    const out = base.map((m) => [...m] as [string, Raw]);
    for (const [i, v] of swaps) out[i]![1] = v;
    return out;
  });
}

/** The valid body with one or more declared fields of another JSON type (never null). */
function wrongTypes(template: Record<string, unknown>): fc.Arbitrary<Body> | null {
  const entries = Object.entries(template);
  if (entries.length === 0) return null;
  return fc
    .subarray(entries, { minLength: 1 })
    .chain((chosen) => fc.tuple(fc.constant(chosen), fc.tuple(...chosen.map(([, v]) => otherType(v)))))
    .map(([chosen, values]) => {
      const wrong = new Map(chosen.map(([k], i) => [k, values[i]!]));
      const body = members(template).map(([k, v]): [string, Raw] => [k, wrong.get(k) ?? v]);
      return json(`wrong type for ${[...wrong.keys()].join(', ')}`, obj(body), Object.keys(template));
    });
}

/** Numeric fields given NaN / ±Infinity (raw 1e309, or the strings JSON has to use). */
function notFinite(template: Record<string, unknown>): fc.Arbitrary<Body> | null {
  const numeric = Object.entries(template).filter(([, v]) => typeof v === 'number');
  if (numeric.length === 0) return null;
  return fc
    .tuple(
      fc.constantFrom(...numeric.map(([k]) => k)),
      fc.constantFrom('1e309', '-1e309', '"NaN"', '"Infinity"', '"-Infinity"'),
    )
    .map(([key, raw]) => {
      const body = members(template).map(([k, v]): [string, Raw] => [k, k === key ? raw : v]);
      return json(`${key} = ${raw}`, obj(body), Object.keys(template));
    });
}

/** Text that is not JSON: truncated, trailing commas, NaN tokens, comments, single quotes, BOM. */
function malformed(template: Record<string, unknown> | null): fc.Arbitrary<Body> {
  const valid = JSON.stringify(template ?? { a: 1 });
  return (
    fc
      .oneof(
        fc.nat({ max: Math.max(0, valid.length - 1) }).map((n) => valid.slice(0, n) || '{'),
        fc.constantFrom(
          `${valid.slice(0, -1)},}`,
          `${valid.slice(0, -1)},"x":NaN}`,
          `${valid.slice(0, -1)},"x":Infinity}`,
          `${valid.slice(0, -1)},"x":-Infinity}`,
          `${valid.slice(0, -1)},"x":undefined}`,
          `${valid} // comment`,
          `/* c */${valid}`,
          valid.replaceAll('"', "'"),
          `${valid}${valid}`,
          `${valid}]`,
          '{"a":"\\x41"}',
          '{"a":"\\u12"}',
          '{"a":01}',
          '{"a":.5}',
          '{"a":+1}',
          '{"a":1e}',
          '{a:1}',
          '\u0000',
          ' ',
          '{"__proto__":{"polluted":true}}',
          '{"constructor":{"prototype":{"polluted":true}}}',
          `{"a":${'['.repeat(DEEP)}`,
          `${'{"a":'.repeat(DEEP)}`,
        ),
        fc.string({ minLength: 1, maxLength: 40 }),
      )
      // Some edits leave JSON after all ({} with quotes swapped); those with __proto__ or
      // constructor.prototype are JSON that Fastify's parser refuses on purpose.
      .filter((s) => !isJson(s) || /__proto__|"constructor"/.test(s))
      .map((payload) => json('malformed JSON', payload))
  );
}

function isJson(text: string): boolean {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
}

/** A body of a type other than application/json, or none named at all. */
function wrongContentType(template: Record<string, unknown> | null): fc.Arbitrary<Body> {
  const valid = JSON.stringify(template ?? {});
  const boundary = '----fuzzboundary';
  const multipartOf = (text: string) =>
    `--${boundary}\r\nContent-Disposition: form-data; name="body"\r\n\r\n${text}\r\n--${boundary}--\r\n`;
  const form = new URLSearchParams(
    Object.entries(template ?? { a: '1' }).map(([k, v]): [string, string] => [
      k,
      typeof v === 'string' ? v : JSON.stringify(v),
    ]),
  ).toString();
  const cases: [string | undefined, string][] = [
    ['text/plain', valid],
    ['text/plain; charset=utf-8', valid],
    ['application/x-www-form-urlencoded', form],
    [`multipart/form-data; boundary=${boundary}`, multipartOf(valid)],
    ['multipart/form-data', multipartOf(valid)],
    [undefined, valid],
    ['application/xml', '<a>1</a>'],
    ['application/octet-stream', valid],
    ['text/json', valid],
    ['application/json-patch+json', '[]'],
    ['application/jsonx', valid],
    ['', valid],
    ['*/*', valid],
  ];
  return fc.constantFrom(...cases).map(([contentType, payload]) => ({
    why: `content type ${contentType ?? '(none)'}`,
    contentType,
    payload,
    keys: [],
  }));
}

/** A JSON body over the limit: the valid body with one more member of padding. */
function oversized(template: Record<string, unknown> | null): fc.Arbitrary<Body> {
  return fc.integer({ min: 1, max: 64 * 1024 }).map((extra) => {
    const valid = JSON.stringify(template ?? {});
    const pad = 'x'.repeat(REQUEST_BODY_MAX_BYTES + extra - valid.length);
    return json('over the body limit', `${valid.slice(0, -1)}${valid.length > 2 ? ',' : ''}"zzPad":"${pad}"}`);
  });
}

/** Multipart bodies that are not one good image in "photos": other bytes, fields, boundaries. */
function badUploads(): fc.Arbitrary<Body> {
  const boundary = 'fuzzPhotoBoundary';
  const part = (name: string, filename: string | null, type: string, data: string) =>
    `--${boundary}\r\nContent-Disposition: form-data; name="${name}"${filename === null ? '' : `; filename="${filename}"`}\r\n` +
    `Content-Type: ${type}\r\n\r\n${data}\r\n`;
  const end = `--${boundary}--\r\n`;
  const bytes = fc.uint8Array({ maxLength: 2048 }).map((a) => Buffer.from(a).toString('latin1'));
  return fc
    .oneof(
      // Not an image, under the right field: random bytes, text, an SVG, a truncated JPEG header.
      fc
        .tuple(bytes, fc.constantFrom('image/jpeg', 'image/png', 'text/plain'))
        .map(([data, type]) => part('photos', 'jar.jpg', type, data) + end),
      fc.constantFrom(
        part('photos', 'jar.svg', 'image/svg+xml', '<svg xmlns="http://www.w3.org/2000/svg"/>') + end,
        part('photos', 'jar.jpg', 'image/jpeg', '\xff\xd8\xff\xe0\x00\x10JFIF\x00') + end,
        part('photos', 'jar.png', 'image/png', '\x89PNG\r\n\x1a\n') + end,
        part('photos', 'jar.gif', 'image/gif', 'GIF89a\x01\x00\x01\x00') + end,
        part('photos', null, 'text/plain', 'not a file') + end,
        part('photo', 'jar.jpg', 'image/jpeg', 'x') + end,
        part('__proto__', 'jar.jpg', 'image/jpeg', 'x') + end,
        end,
        '',
        `--${boundary}\r\nContent-Disposition: form-data; name="photos"; filename="a.jpg"\r\n\r\nunterminated`,
        'not multipart at all',
      ),
    )
    .map((payload) => ({
      why: 'multipart without one decodable image in "photos"',
      contentType: `multipart/form-data; boundary=${boundary}`,
      payload: Buffer.from(payload, 'latin1'),
      keys: [],
    }));
}

// ---- path ids -------------------------------------------------------------------------------

/**
 * Path ids that are no id: not UUIDs, overlong, odd Unicode, encoded. Never a dot segment ("."
 * or ".."), which URL parsing resolves into another route's path rather than a bad id.
 */
export const badId: fc.Arbitrary<string> = fc
  .oneof(
    fc.constantFrom(
      'not-a-uuid',
      '0',
      '-1',
      'null',
      'undefined',
      '00000000-0000-0000-0000-00000000000',
      '00000000-0000-0000-0000-0000000000000',
      'zzzzzzzz-zzzz-zzzz-zzzz-zzzzzzzzzzzz',
      '{00000000-0000-0000-0000-000000000000}',
      '__proto__',
      'constructor',
      '%00',
      '%ZZ',
      '%E0%A4%A',
      '%ED%A0%80', // an encoded lone surrogate
      '%F0%9F%8D%9E', // 🍞
      '%E2%80%AE',
      "'%20OR%201=1--",
      'a%2Fb',
    ),
    fc.integer({ min: 37, max: 4000 }).map((n) => 'a'.repeat(n)),
    fc.uuid().map((u) => `${u}${'0'.repeat(3)}`),
    fc.uuid().map((u) => u.replaceAll('-', '')),
    fc.string({ minLength: 1, maxLength: 40 }).map((s) => encodeURIComponent(s)),
  )
  .filter((s) => !/^(\.|%2e)+$/i.test(s));

// ---- requests for a route --------------------------------------------------------------------

/**
 * Requests for one route, each invalid by construction. JSON routes get bad bodies (on the valid
 * path) and bad ids (with any body); upload routes get bad uploads and bad ids; routes without a
 * body only bad ids, as any body would be ignored and the valid id would let the write through.
 */
export function requestsFor(route: RouteShape): fc.Arbitrary<FuzzRequest> {
  const anyBody = fc.oneof(
    malformed(route.template),
    wrongContentType(route.template),
    notAnObject(route.template),
    fc.constant<Body>({ why: 'no body', contentType: undefined, payload: undefined, keys: [] }),
    route.template
      ? fc.constant(json('the valid body', JSON.stringify(route.template), Object.keys(route.template)))
      : fc.constant(json('an empty object', '{}')),
  );
  const withBadIds = route.params.length
    ? fc
        .tuple(
          fc.array(fc.option(badId, { nil: null, freq: 3 }), {
            minLength: route.params.length,
            maxLength: route.params.length,
          }),
          badId,
          fc.nat(),
          anyBody,
        )
        .map(([ids, forced, at, body]): FuzzRequest => {
          // At least one id is bad.
          const bad: (string | null)[] = [...ids];
          if (!bad.some((id) => id !== null)) bad[at % bad.length] = forced;
          return { ...body, why: `bad path id(s) ${JSON.stringify(bad)}, ${body.why}`, ids: bad };
        })
    : null;
  const onValidPath = (a: fc.Arbitrary<Body>): fc.Arbitrary<FuzzRequest> =>
    a.map((b) => ({ ...b, ids: route.params.map(() => null) }));

  const bodies: { weight: number; arbitrary: fc.Arbitrary<Body> }[] = [];
  if (route.upload) {
    bodies.push({ weight: 6, arbitrary: badUploads() });
    bodies.push({
      weight: 2,
      arbitrary: fc.oneof(
        notAnObject(null),
        wrongContentType(null).filter((b) => !b.contentType?.startsWith('multipart/')),
      ),
    });
    bodies.push({ weight: 1, arbitrary: malformed(null) });
  } else if (route.template) {
    const t = route.template;
    bodies.push({ weight: 4, arbitrary: unknownFields(t) });
    bodies.push({ weight: 2, arbitrary: notAnObject(t) });
    bodies.push({ weight: 2, arbitrary: malformed(t) });
    bodies.push({ weight: 2, arbitrary: wrongContentType(t) });
    bodies.push({ weight: 1, arbitrary: oversized(t) });
    const wrong = wrongTypes(t);
    if (wrong) bodies.push({ weight: 3, arbitrary: wrong });
    const nonFinite = notFinite(t);
    if (nonFinite) bodies.push({ weight: 2, arbitrary: nonFinite });
  }
  const choices: { weight: number; arbitrary: fc.Arbitrary<FuzzRequest> }[] = bodies.map(({ weight, arbitrary }) => ({
    weight,
    arbitrary: onValidPath(arbitrary),
  }));
  if (withBadIds) choices.push({ weight: choices.length ? 3 : 1, arbitrary: withBadIds });
  if (choices.length === 0) throw new Error('a route with neither a body nor path ids has nothing to fuzz');
  return fc.oneof(...choices);
}
