import type { Account } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CROSS_SITE_REFUSED } from '../src/common/csrf.js';
import { expectError, getAccount, sessionSids, sidOf, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Cross-site request forgery: a page on another site makes the browser send a write with our
// cookie. The check reads Sec-Fetch-Site (W3C Fetch Metadata) and Origin (RFC 6454, Fetch
// standard: sent on every cross-origin request and on non-GET same-origin ones).

let t: TestApp;
let theo: SignedUp;
beforeAll(async () => {
  // PUBLIC_URL is where browsers reach the app; testConfig's is http://127.0.0.1:3000.
  t = await createTestApp();
});
afterAll(() => t.close());
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
});

function rename(displayName: string, headers: Record<string, string>) {
  return t.app.inject({
    method: 'PATCH',
    url: '/api/account',
    headers: { cookie: theo.cookie, ...headers },
    payload: { displayName },
  });
}

async function nameNow(): Promise<string> {
  return (await getAccount(t.app, theo.cookie)).json<Account>().displayName;
}

function expectRefused(res: Awaited<ReturnType<typeof rename>>): void {
  const body = expectError(res, 403);
  expect(body).toEqual({ statusCode: 403, error: 'Forbidden', message: CROSS_SITE_REFUSED });
}

describe('writes with a session cookie', () => {
  it('refuses Sec-Fetch-Site: cross-site and same-site with 403, and writes nothing', async () => {
    for (const site of ['cross-site', 'same-site']) {
      expectRefused(await rename(`Forged ${site}`, { 'sec-fetch-site': site, origin: 'https://evil.example' }));
    }
    // Even when the Origin claims to be ours: a browser that sends Sec-Fetch-Site is believed.
    expectRefused(await rename('Forged', { 'sec-fetch-site': 'cross-site', origin: 'http://127.0.0.1:3000' }));
    expect(await nameNow()).toBe('Theo Park');
  });

  it('allows Sec-Fetch-Site: same-origin and none (typed by the user)', async () => {
    expect(
      (await rename('Theo Same', { 'sec-fetch-site': 'same-origin', origin: 'http://127.0.0.1:3000' })).statusCode,
    ).toBe(200);
    expect(await nameNow()).toBe('Theo Same');
    expect((await rename('Theo None', { 'sec-fetch-site': 'none' })).statusCode).toBe(200);
    expect(await nameNow()).toBe('Theo None');
  });

  it('without Sec-Fetch-Site, refuses a foreign Origin and Origin: null', async () => {
    expectRefused(await rename('Forged', { origin: 'https://evil.example' }));
    expectRefused(await rename('Forged', { origin: 'null' }));
    // Same host, other port or scheme: another origin.
    expectRefused(await rename('Forged', { origin: 'http://127.0.0.1:3001' }));
    expectRefused(await rename('Forged', { origin: 'https://127.0.0.1:3000' }));
    expect(await nameNow()).toBe('Theo Park');
  });

  it('without Sec-Fetch-Site, allows our public origin and the origin of the Host asked for', async () => {
    expect((await rename('Theo Public', { origin: 'http://127.0.0.1:3000' })).statusCode).toBe(200);
    const res = await rename('Theo Host', { host: 'bakery.test:8080', origin: 'http://bakery.test:8080' });
    expect(res.statusCode, res.body).toBe(200);
    expect(await nameNow()).toBe('Theo Host');
  });

  it('allows a write with neither header (not a browser on another site: no ambient cookie to abuse)', async () => {
    expect((await rename('Theo Script', {})).statusCode).toBe(200);
    expect(await nameNow()).toBe('Theo Script');
  });

  it('covers POST and DELETE too: a forged sign-out leaves the session alive', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-out',
      headers: { cookie: theo.cookie, 'sec-fetch-site': 'cross-site', origin: 'https://evil.example' },
    });
    expectRefused(res);
    expect(await sessionSids(t.db)).toContain(sidOf(theo.cookie));
    const del = await t.app.inject({
      method: 'DELETE',
      url: '/api/cultures/00000000-0000-4000-8000-000000000000',
      headers: { cookie: theo.cookie, origin: 'https://evil.example' },
    });
    expectRefused(del);
  });

  it('leaves reads alone: a cross-site GET (a link followed) still answers', async () => {
    const res = await t.app.inject({
      method: 'GET',
      url: '/api/account',
      headers: { cookie: theo.cookie, 'sec-fetch-site': 'cross-site', origin: 'https://evil.example' },
    });
    expect(res.statusCode).toBe(200);
  });
});

describe('writes without a session', () => {
  it('refuses a cross-site sign-in (login CSRF) and starts no session', async () => {
    const before = (await sessionSids(t.db)).length;
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      headers: { 'sec-fetch-site': 'cross-site', origin: 'https://evil.example' },
      payload: { email: theo.email, password: theo.password },
    });
    expectRefused(res);
    expect(res.headers['set-cookie']).toBeUndefined();
    expect((await sessionSids(t.db)).length).toBe(before);
  });

  it('allows a same-origin sign-in', async () => {
    const res = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      headers: { 'sec-fetch-site': 'same-origin', origin: 'http://127.0.0.1:3000' },
      payload: { email: theo.email, password: theo.password },
    });
    expect(res.statusCode, res.body).toBe(200);
  });
});

describe('origins listed in CORS_ORIGINS', () => {
  it('may write cross-site; others still may not', async () => {
    const trusting = await createTestApp({
      corsOrigins: ['https://app.bakery.test'],
      sessionSecret: t.config.sessionSecret,
    });
    try {
      const send = (origin: string) =>
        trusting.app.inject({
          method: 'PATCH',
          url: '/api/account',
          headers: { cookie: theo.cookie, 'sec-fetch-site': 'same-site', origin },
          payload: { displayName: 'Theo Listed' },
        });
      expect((await send('https://app.bakery.test')).statusCode).toBe(200);
      expectRefused(await send('https://other.bakery.test'));
    } finally {
      await trusting.close();
    }
  });
});
