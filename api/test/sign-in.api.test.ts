import type { Account } from '@peakwise/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  expectError,
  expectFieldErrors,
  getAccount,
  sessionSids,
  signIn,
  signUp,
  uniqueEmail,
  type SignedUp,
} from './helpers.js';
import { createTestApp, liveSessionCookies, resetDatabase, sessionCookie, type TestApp } from './test-app.js';

let t: TestApp;
let theo: SignedUp;
beforeAll(async () => {
  t = await createTestApp();
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
});
afterAll(() => t.close());

const BAD_CREDENTIALS = 'E-mail or password is incorrect.';

function postSignIn(payload: string): ReturnType<typeof signIn> {
  return t.app.inject({
    method: 'POST',
    url: '/api/auth/sign-in',
    payload,
    headers: { 'content-type': 'application/json' },
  });
}

describe('POST /api/auth/sign-in', () => {
  it('answers 200 with the Account and a session cookie that opens GET /api/account', async () => {
    const res = await signIn(t.app, theo.email, theo.password);
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json<Account>()).toEqual(theo.account);
    expect(res.body).not.toMatch(/passwordHash|scrypt/);
    const cookie = sessionCookie(res.headers['set-cookie']);
    expect(cookie).not.toBe(theo.cookie);
    const me = await getAccount(t.app, cookie);
    expect(me.statusCode).toBe(200);
    expect(me.json<Account>().id).toBe(theo.account.id);
  });

  it('gives a wrong password and an unknown e-mail the same 401 and the very same body', async () => {
    const wrongPassword = await signIn(t.app, theo.email, 'not the right passphrase');
    const unknownEmail = await signIn(t.app, uniqueEmail('nobody'), 'not the right passphrase');
    const body = expectError(wrongPassword, 401);
    expectError(unknownEmail, 401);
    expect(body).toEqual({ statusCode: 401, error: 'Unauthorized', message: BAD_CREDENTIALS });
    expect(unknownEmail.body).toBe(wrongPassword.body);
    expect(unknownEmail.headers['content-type']).toBe(wrongPassword.headers['content-type']);
  });

  it('starts no session when the credentials are wrong', async () => {
    const before = await sessionSids(t.db);
    const res = await signIn(t.app, theo.email, 'not the right passphrase');
    expect(res.statusCode).toBe(401);
    expect(liveSessionCookies(res.headers['set-cookie'])).toEqual([]);
    expect((await sessionSids(t.db)).sort()).toEqual(before.sort());
  });

  it('answers a missing password with 400 naming password, not 401', async () => {
    expectFieldErrors(await postSignIn(JSON.stringify({ email: theo.email })), ['password']);
    expectFieldErrors(await postSignIn(JSON.stringify({ email: theo.email, password: '' })), ['password']);
  });

  it('answers a missing e-mail with 400 naming email', async () => {
    expectFieldErrors(await postSignIn(JSON.stringify({ password: theo.password })), ['email']);
  });

  it('answers a request without a body with 400 naming email and password', async () => {
    const res = await t.app.inject({ method: 'POST', url: '/api/auth/sign-in' });
    expectFieldErrors(res, ['email', 'password']);
  });

  it('refuses an unknown field with 400 naming it', async () => {
    const res = await postSignIn(JSON.stringify({ email: theo.email, password: theo.password, remember: true }));
    expectFieldErrors(res, ['remember']);
  });

  it('names the fields even when the JSON body is not an object (an array or a string)', async () => {
    // Every detail must carry a `field` (FieldError in shared/src/contracts/errors.ts).
    for (const payload of ['[]', '"theo@example.com"']) {
      expectFieldErrors(await postSignIn(payload), ['email', 'password']);
    }
  });

  it('matches the e-mail case-blind and ignores surrounding spaces', async () => {
    const spellings = [theo.email.toUpperCase(), `  ${theo.email.replace(/^./, (c) => c.toUpperCase())}  `];
    for (const email of spellings) {
      const res = await signIn(t.app, email, theo.password);
      expect(res.statusCode, `${email}: ${res.body}`).toBe(200);
      expect(res.json<Account>().id).toBe(theo.account.id);
    }
  });

  it('does not match the password case-blind', async () => {
    const res = await signIn(t.app, theo.email, theo.password.toUpperCase());
    expect(expectError(res, 401).message).toBe(BAD_CREDENTIALS);
  });
});
