import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getAccount, parseSetCookie, sidOf, signIn, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { createTestApp, liveSessionCookies, resetDatabase, type TestApp } from './test-app.js';

const FOURTEEN_DAYS_MS = 14 * 24 * 60 * 60 * 1000;
const TLS_HEADER = 'x-test-tls';

let t: TestApp;
let theo: SignedUp;
beforeAll(async () => {
  t = await createTestApp(
    {},
    {
      // light-my-request's fake socket is never a TLS socket. This hook runs before every plugin
      // and marks the socket encrypted, which is exactly what Fastify's request.protocol reads
      // (`socket.encrypted ? 'https' : 'http'`), so @fastify/session's `secure: 'auto'` sees an
      // https request as it would behind a real TLS listener. Requests without the header are
      // untouched.
      beforeConfigure: (fastify) => {
        fastify.addHook('onRequest', (request, _reply, done) => {
          if (request.headers[TLS_HEADER] === '1') Object.assign(request.raw.socket, { encrypted: true });
          done();
        });
      },
    },
  );
  await resetDatabase(t.db);
  theo = await signUp(t.app);
});
afterAll(() => t.close());

function theCookie(res: InjectResponse) {
  const live = liveSessionCookies(res.headers['set-cookie']);
  expect(live, JSON.stringify(res.headers['set-cookie'])).toHaveLength(1);
  return parseSetCookie(live[0]!);
}

/** Milliseconds from now until the cookie expires, from Max-Age if present, else Expires. */
function lifetimeMs(attributes: Map<string, string>): number {
  const maxAge = attributes.get('max-age');
  if (maxAge !== undefined) return Number(maxAge) * 1000;
  const expires = attributes.get('expires');
  expect(expires, 'the cookie has neither Max-Age nor Expires: it would die with the browser').toBeDefined();
  return Date.parse(expires!) - Date.now();
}

function expectAboutFourteenDays(ms: number): void {
  // Expires has one-second resolution; allow a minute either way.
  expect(Math.abs(ms - FOURTEEN_DAYS_MS)).toBeLessThan(60_000);
}

async function sessionExpiry(sid: string): Promise<Date> {
  const row = await t.db.selectFrom('session').select('expire').where('sid', '=', sid).executeTakeFirstOrThrow();
  return row.expire;
}

describe('session cookie flags', () => {
  it('is HttpOnly, SameSite=Lax, Path=/ and lasts about 14 days (sign-in over http)', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    expect(res.statusCode).toBe(200);
    const cookie = theCookie(res);
    expect(cookie.name).toBe('peakwise.sid');
    expect(cookie.value.length).toBeGreaterThan(20);
    expect(cookie.attributes.has('httponly')).toBe(true);
    expect(cookie.attributes.get('samesite')?.toLowerCase()).toBe('lax');
    expect(cookie.attributes.get('path')).toBe('/');
    expectAboutFourteenDays(lifetimeMs(cookie.attributes));
    expect(cookie.attributes.has('domain')).toBe(false);
  });

  it('has no Secure flag over plain http, so local development keeps working', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    expect(theCookie(res).attributes.has('secure')).toBe(false);
  });

  it('has the same flags on the cookie that sign-up sets', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-up',
      payload: { email: `flags.${Date.now()}@example.com`, displayName: 'Flag Tester', password: theo.password },
    });
    expect(res.statusCode).toBe(201);
    const { attributes } = theCookie(res);
    expect(attributes.has('httponly')).toBe(true);
    expect(attributes.get('samesite')?.toLowerCase()).toBe('lax');
    expect(attributes.get('path')).toBe('/');
    expect(attributes.has('secure')).toBe(false);
    expectAboutFourteenDays(lifetimeMs(attributes));
  });

  it('is Secure when the request arrives over https', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      payload: { email: theo.email, password: theo.password },
      headers: { [TLS_HEADER]: '1' },
    });
    expect(res.statusCode, res.body).toBe(200);
    const { attributes } = theCookie(res);
    expect(attributes.has('secure')).toBe(true);
    expect(attributes.has('httponly')).toBe(true);
    expect(attributes.get('samesite')?.toLowerCase()).toBe('lax');
    expectAboutFourteenDays(lifetimeMs(attributes));
  });

  it('does not trust a client-supplied X-Forwarded-Proto (no trustProxy is configured)', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      payload: { email: theo.email, password: theo.password },
      headers: { 'x-forwarded-proto': 'https' },
    });
    expect(res.statusCode).toBe(200);
    expect(theCookie(res).attributes.has('secure')).toBe(false);
  });

  it('stores the session with an expiry about 14 days ahead', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    const cookie = theCookie(res);
    const expire = await sessionExpiry(sidOf(`${cookie.name}=${cookie.value}`));
    expectAboutFourteenDays(expire.getTime() - Date.now());
  });

  it('rolls: a request with a session that has one day left pushes it back to 14 days', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    const { name, value } = theCookie(res);
    const cookie = `${name}=${value}`;
    const sid = sidOf(cookie);
    await sql`
      UPDATE session
      SET expire = now() + interval '1 day',
          sess = jsonb_set(sess::jsonb, '{cookie,expires}', to_jsonb(now() + interval '1 day'))::json
      WHERE sid = ${sid}`.execute(t.db);
    expect((await sessionExpiry(sid)).getTime() - Date.now()).toBeLessThan(FOURTEEN_DAYS_MS / 2);

    const me = await getAccount(t.app, cookie);
    expect(me.statusCode).toBe(200);
    expectAboutFourteenDays(lifetimeMs(theCookie(me).attributes));
    expectAboutFourteenDays((await sessionExpiry(sid)).getTime() - Date.now());
  });

  it('does not accept a session whose expiry has passed', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    const { name, value } = theCookie(res);
    const cookie = `${name}=${value}`;
    await sql`
      UPDATE session
      SET expire = now() - interval '1 minute',
          sess = jsonb_set(sess::jsonb, '{cookie,expires}', to_jsonb(now() - interval '1 minute'))::json
      WHERE sid = ${sidOf(cookie)}`.execute(t.db);
    expect((await getAccount(t.app, cookie)).statusCode).toBe(401);
  });

  it('does not accept a cookie whose signature was tampered with', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    const { name, value } = theCookie(res);
    const decoded = decodeURIComponent(value);
    const forged = `${decoded.slice(0, decoded.lastIndexOf('.'))}.${'A'.repeat(43)}`;
    expect((await getAccount(t.app, `${name}=${encodeURIComponent(forged)}`)).statusCode).toBe(401);
    expect((await getAccount(t.app, `${name}=${value}`)).statusCode).toBe(200);
  });
});
