import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Sign-in brakes counted in PostgreSQL (auth_throttle), so every API process shares them:
// per address (ThrottlerGuard, authAttemptsPerMinute) and per account (failed sign-ins from
// addresses the account never signed in from). OWASP Authentication Cheat Sheet, "Protect
// against automated attacks": lock-outs must not let an attacker keep the owner out.

const LIMIT = 4;

let a: TestApp;
let b: TestApp;
let theo: SignedUp;
beforeAll(async () => {
  // Two instances on one database, like two API processes behind a balancer.
  a = await createTestApp({ authAttemptsPerMinute: 1000, signInFailuresPerAccount: LIMIT });
  b = await createTestApp({
    authAttemptsPerMinute: 1000,
    signInFailuresPerAccount: LIMIT,
    sessionSecret: a.config.sessionSecret,
  });
});
afterAll(async () => {
  await a.close();
  await b.close();
});
beforeEach(async () => {
  await resetDatabase(a.db);
  theo = await signUp(a.app, { displayName: 'Theo Park' });
});

function signIn(app: TestApp, email: string, password: string, remoteAddress: string) {
  return app.app.inject({ method: 'POST', url: '/api/auth/sign-in', remoteAddress, payload: { email, password } });
}

/** 203.0.113.0/24 is TEST-NET-3 (RFC 5737): documentation addresses, one per guess. */
const attacker = (i: number) => `203.0.113.${i + 1}`;

describe('per account, across addresses', () => {
  it('after LIMIT failures from many addresses, a new address gets 429 with Retry-After even with the right password', async () => {
    for (let i = 0; i < LIMIT; i++) {
      expectError(await signIn(i % 2 ? b : a, theo.email, `guess number ${i}`, attacker(i)), 401);
    }
    const locked = await signIn(a, theo.email, theo.password, '198.51.100.50');
    const body = expectError(locked, 429);
    expect(body.message).toMatch(/Too many failed sign-ins to this account/);
    const retryAfter = Number(locked.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    expect(locked.headers['set-cookie']).toBeUndefined();
  });

  it('lets the owner in from an address they signed in from before, during the attack', async () => {
    const home = '198.51.100.20';
    expect((await signIn(a, theo.email, theo.password, home)).statusCode).toBe(200);
    for (let i = 0; i < LIMIT + 3; i++) await signIn(b, theo.email, `guess number ${i}`, attacker(i));
    expectError(await signIn(a, theo.email, theo.password, '198.51.100.21'), 429);
    const owner = await signIn(b, theo.email, theo.password, home);
    expect(owner.statusCode, owner.body).toBe(200);
    // The known address is no free pass for guessing: a wrong password there is still a 401.
    expectError(await signIn(a, theo.email, 'not the password', home), 401);
  });

  it('knows an IPv6 owner by their /64, as their device changes the rest of the address', async () => {
    // 2001:db8::/32 is for documentation (RFC 3849).
    expect((await signIn(a, theo.email, theo.password, '2001:db8:1:2::10')).statusCode).toBe(200);
    for (let i = 0; i < LIMIT; i++) await signIn(b, theo.email, `guess number ${i}`, attacker(i));
    expect((await signIn(a, theo.email, theo.password, '2001:db8:1:2:abcd::99')).statusCode).toBe(200);
    expectError(await signIn(a, theo.email, theo.password, '2001:db8:1:3::10'), 429);
  });

  it('locks an unknown e-mail the same way, so the lock reveals nothing about who has an account', async () => {
    for (let i = 0; i < LIMIT; i++) expectError(await signIn(a, 'nobody@example.com', `guess ${i}`, attacker(i)), 401);
    expectError(await signIn(a, 'nobody@example.com', 'guess', attacker(40)), 429);
    // Other accounts are not affected.
    const amara = await signUp(a.app, { displayName: 'Amara Quist' });
    expect((await signIn(a, amara.email, amara.password, attacker(41))).statusCode).toBe(200);
  });

  it('counts failures from both instances together', async () => {
    for (let i = 0; i < LIMIT - 1; i++) expectError(await signIn(a, theo.email, `guess ${i}`, attacker(i)), 401);
    // One short of the limit: still a plain 401 on the other instance, then the limit is reached.
    expectError(await signIn(b, theo.email, 'guess b', attacker(20)), 401);
    expectError(await signIn(b, theo.email, theo.password, attacker(21)), 429);
    expectError(await signIn(a, theo.email, theo.password, attacker(22)), 429);
  });
});

describe('behind a proxy (TRUST_PROXY)', () => {
  it('counts the client address the trusted proxy forwards, not the proxy’s own', async () => {
    const proxied = await createTestApp({ authAttemptsPerMinute: 2, trustProxy: true });
    try {
      const via = (client: string) =>
        proxied.app.inject({
          method: 'POST',
          url: '/api/auth/sign-in',
          remoteAddress: '10.0.0.2',
          headers: { 'x-forwarded-for': client },
          payload: { email: 'x@example.com', password: 'a wrong guess' },
        });
      expectError(await via('192.0.2.10'), 401);
      expectError(await via('192.0.2.10'), 401);
      expectError(await via('192.0.2.10'), 429);
      // Another client behind the same proxy has its own allowance.
      expectError(await via('192.0.2.11'), 401);
    } finally {
      await proxied.close();
    }
  });
});

describe('per address, across instances', () => {
  it('shares one allowance between two app instances, answering 429 with Retry-After', async () => {
    const tight = await createTestApp({ authAttemptsPerMinute: 3 });
    const tight2 = await createTestApp({ authAttemptsPerMinute: 3 });
    try {
      const from = '192.0.2.77'; // TEST-NET-1 (RFC 5737)
      expectError(await signIn(tight, 'x@example.com', 'guess one', from), 401);
      expectError(await signIn(tight2, 'y@example.com', 'guess two', from), 401);
      expectError(await signIn(tight, 'z@example.com', 'guess three', from), 401);
      const blocked = await signIn(tight2, 'w@example.com', 'guess four', from);
      expect(expectError(blocked, 429).message).toMatch(/Too many attempts from here/);
      const retryAfter = Number(blocked.headers['retry-after']);
      expect(retryAfter).toBeGreaterThan(0);
      expect(retryAfter).toBeLessThanOrEqual(60);
      // Another address is not held back.
      expectError(await signIn(tight, 'x@example.com', 'guess', '192.0.2.78'), 401);
      // Nothing readable is stored: the keys are hashes.
      const keys = await tight.db.selectFrom('authThrottle').select('key').execute();
      expect(keys.length).toBeGreaterThan(0);
      for (const { key } of keys) {
        expect(key).toMatch(/^[0-9a-f]{64}$/);
      }
    } finally {
      await tight.close();
      await tight2.close();
    }
  });
});
