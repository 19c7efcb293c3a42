import { afterAll, beforeAll, expect, it } from 'vitest';
import { PASSWORD, expectError, signUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ authAttemptsPerMinute: 3 });
  await resetDatabase(t.db);
});
afterAll(() => t.close());

function signIn(password: string, remoteAddress: string) {
  return t.app.inject({
    method: 'POST',
    url: '/api/auth/sign-in',
    remoteAddress,
    payload: { email: 'nobody@example.com', password },
  });
}

it('stops password guessing from one address after the allowance, in the error shape', async () => {
  for (let i = 0; i < 3; i++) expect((await signIn(`guess ${i}`, '198.51.100.7')).statusCode).toBe(401);
  const blocked = await signIn('guess 4', '198.51.100.7');
  expectError(blocked, 429);
  expect(blocked.json<{ message: string }>().message).toMatch(/Too many attempts/);
  // Seconds until the window ends (RFC 9110 §10.2.3); the window is one minute.
  expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  expect(Number(blocked.headers['retry-after'])).toBeLessThanOrEqual(60);
  // The brake is per address: someone else can still sign in.
  expect((await signIn('guess', '198.51.100.8')).statusCode).toBe(401);
});

it('counts sign-ups as well, and leaves signed-in routes alone', async () => {
  const { cookie } = await signUp(t.app, { password: PASSWORD });
  // signUp() came from inject's default address; two more sign-up attempts use it up.
  for (let i = 0; i < 2; i++) {
    await t.app.inject({ method: 'POST', url: '/api/auth/sign-up', payload: {} });
  }
  expectError(await t.app.inject({ method: 'POST', url: '/api/auth/sign-up', payload: {} }), 429);
  const me = await t.app.inject({ method: 'GET', url: '/api/account', headers: { cookie } });
  expect(me.statusCode).toBe(200);
});
