import { randomUUID } from 'node:crypto';
import type { BakePlanView, Culture, Formula } from '@peakwise/shared';
import { describe, expect, it } from 'vitest';
import { pushSubscription } from './access-matrix.classroom.js';
import { COUNTRY_LOAF, planBody } from './bake-plan.fixtures.js';
import { created, expectError, send, withSignedInBaker, type InjectResponse, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// One focused test per bug the write-route fuzz (fuzz-routes.api.test.ts) found, each the
// smallest request that showed it. What the API did before the fix is said beside each.

let t: TestApp;
let baker: SignedUp;
withSignedInBaker({}, (app, signedUp) => {
  t = app;
  baker = signedUp;
});

/** A raw JSON body, so what JSON.stringify would drop or change is sent as written. */
function raw(method: 'POST' | 'PATCH' | 'DELETE', url: string, payload: string | undefined): Promise<InjectResponse> {
  return t.app.inject({
    method,
    url,
    headers: { cookie: baker.cookie, 'content-type': 'application/json', 'idempotency-key': randomUUID() },
    ...(payload === undefined ? {} : { payload }),
  });
}

const culture = () => created<Culture>(send(t.app, 'POST', '/api/cultures', baker.cookie, { name: 'Bramble' }));
const countCultures = async () => (await t.db.selectFrom('culture').select('id').execute()).length;

describe('bodies nested thousands deep', () => {
  // Before: 500 from a stack overflow, in the idempotency hash (idempotent writes) or in
  // class-transformer (every JSON route).
  it('are refused with a 400 naming where, on an idempotent write and on a plain one', async () => {
    const depth = 10_000;
    const deepArray = '['.repeat(depth) + ']'.repeat(depth);
    const res = await raw('POST', '/api/cultures', `{"name":${deepArray}}`);
    const body = expectError(res, 400);
    expect(body.details?.[0]?.field).toMatch(/^name(\.0)+$/);
    const own = await culture();
    const patch = await raw('PATCH', `/api/cultures/${own.id}`, '{"a":'.repeat(depth) + '1' + '}'.repeat(depth));
    expect(expectError(patch, 400).details?.[0]?.field).toMatch(/^a(\.a)+$/);
    expect(await countCultures()).toBe(1);
  });
});

describe('NUL in text', () => {
  // Before: 500 ("invalid byte sequence for encoding UTF8: 0x00" from PostgreSQL).
  it('is refused in a path parameter that is not a uuid (a plan step id)', async () => {
    const formula = await created<Formula>(send(t.app, 'POST', '/api/formulas', baker.cookie, COUNTRY_LOAF));
    const plan = await created<BakePlanView>(send(t.app, 'POST', '/api/plans', baker.cookie, planBody(formula.id)));
    const res = await t.app.inject({
      method: 'DELETE',
      url: `/api/plans/${plan.id}/steps/%00/done`,
      headers: { cookie: baker.cookie },
    });
    expect(expectError(res, 400).details).toEqual([
      { field: 'stepId', message: 'Remove the NUL character (\\u0000).' },
    ]);
  });

  it('is refused in a body field', async () => {
    const res = await raw('POST', '/api/cultures', '{"name":"Bram\\u0000ble"}');
    expect(expectError(res, 400).details?.map((d) => d.field)).toEqual(['name']);
    expect(await countCultures()).toBe(0);
  });
});

describe('half a UTF-16 pair in text', () => {
  // Before: 500 (validator's isEmail calls encodeURI, which throws URIError on a lone surrogate).
  it('is refused in an e-mail address, naming it', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/password-reset',
      headers: { 'content-type': 'application/json' },
      payload: '{"email":"\\ud800@example.com"}',
    });
    expect(expectError(res, 400).details?.map((d) => d.field)).toEqual(['email']);
  });
});

describe('keys named like Object.prototype members', () => {
  // Before: class-validator's whitelist let __defineGetter__ and "prototype" through as if
  // declared: the PATCH (and every other write) answered 2xx and wrote.
  for (const key of [
    '__defineGetter__',
    'toString',
    'valueOf',
    'hasOwnProperty',
    'isPrototypeOf',
    'constructor',
    'prototype',
  ]) {
    it(`"${key}" is refused with a 400 naming it, and nothing is written`, async () => {
      const own = await culture();
      const res = await raw('PATCH', `/api/cultures/${own.id}`, `{"notes":"Top shelf","${key}":[]}`);
      expect(expectError(res, 400).details).toEqual([{ field: key, message: 'Not a field of this request.' }]);
      const row = await t.db.selectFrom('culture').select(['notes', 'updatedAt']).executeTakeFirstOrThrow();
      expect(row.notes).toBeNull();
      expect(row.updatedAt.toISOString()).toBe(own.updatedAt);
    });
  }

  // Before: the sign-in guard validates the body itself, before the global pipe, and let the
  // key through: a body its DTO refuses signed in (200).
  it('is refused on sign-in too, before the password is checked', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      headers: { 'content-type': 'application/json' },
      payload: JSON.stringify({ email: baker.email, password: baker.password }).replace('{', '{"__defineGetter__":1,'),
    });
    expect(expectError(res, 400).details?.map((d) => d.field)).toEqual(['__defineGetter__']);
    expect(res.headers['set-cookie']).toBeUndefined();
  });
});

describe('an array where one nested object is expected', () => {
  // Before: @ValidateNested() checks each item of an array, and [] has none: 500 at the insert
  // (null p256dh).
  it('is refused for push subscription keys', async () => {
    const res = await send(t.app, 'POST', '/api/push/subscriptions', baker.cookie, { ...pushSubscription(), keys: [] });
    expect(expectError(res, 400).details?.map((d) => d.field)).toEqual(['keys']);
    expect(await t.db.selectFrom('pushSubscription').select('id').execute()).toEqual([]);
  });

  it('is refused for alert quiet hours and channels', async () => {
    const url = '/api/account/alert-preferences';
    const quiet = await send(t.app, 'PATCH', url, baker.cookie, { quietHours: [] });
    expect(expectError(quiet, 400).details?.map((d) => d.field)).toEqual(['quietHours']);
    // Before: class-transformer made [] an empty choice (200) and [1] threw (500).
    for (const comment of [[], [1]]) {
      const channels = await send(t.app, 'PATCH', url, baker.cookie, { channels: { comment } });
      expect(expectError(channels, 400).details).toEqual([
        { field: 'channels.comment', message: 'Send an object, not a list.' },
      ]);
    }
  });
});

describe('a JSON route without a JSON object', () => {
  // Before: Nest took a missing or null body for {}, so an empty PATCH answered 200 (and set
  // updatedAt); a multipart body is parsed for every route and left the JSON body missing.
  it('is refused: null, multipart, and no body at all', async () => {
    const own = await culture();
    const url = `/api/cultures/${own.id}`;
    expect(expectError(await raw('PATCH', url, 'null'), 400).details?.[0]?.field).toBe('body');
    const multipart = await t.app.inject({
      method: 'PATCH',
      url,
      headers: { cookie: baker.cookie, 'content-type': 'multipart/form-data; boundary=x' },
      payload: '--x\r\nContent-Disposition: form-data; name="notes"\r\n\r\nTop shelf\r\n--x--\r\n',
    });
    expect(expectError(multipart, 400).details?.[0]?.field).toBe('body');
    const none = await t.app.inject({ method: 'PATCH', url, headers: { cookie: baker.cookie } });
    expect(expectError(none, 400).details?.[0]?.field).toBe('body');
    const row = await t.db.selectFrom('culture').select('updatedAt').executeTakeFirstOrThrow();
    expect(row.updatedAt.toISOString()).toBe(own.updatedAt);
  });
});

describe('paths Fastify’s router refuses', () => {
  // Before: Fastify answered these itself, with its own "code" key and wording naming the URL.
  it('answer in the one error shape: a malformed escape (400) and an overlong id (414)', async () => {
    const del = (url: string) => t.app.inject({ method: 'DELETE', url, headers: { cookie: baker.cookie } });
    const bad = await del('/api/cultures/%ZZ');
    expect(expectError(bad, 400).message).toBe('The address is not a valid URL.');
    const long = await del(`/api/cultures/${'a'.repeat(500)}`);
    expect(expectError(long, 414).message).toBe('A part of the address is too long.');
  });
});
