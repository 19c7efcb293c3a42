import type { Account } from '@peakwise/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectError, getAccount, sessionSids, sidOf, signIn, signInCookie, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, sessionCookie, type TestApp } from './test-app.js';

let t: TestApp;
let theo: SignedUp;
beforeAll(async () => {
  t = await createTestApp();
  await resetDatabase(t.db);
  theo = await signUp(t.app);
});
afterAll(() => t.close());

function signOut(cookie?: string) {
  return t.app.inject({ method: 'POST', url: '/api/auth/sign-out', headers: cookie ? { cookie } : {} });
}

describe('session renewal on sign-in', () => {
  it('replaces a session id presented at sign-in with a new one and ends the old', async () => {
    const oldCookie = await signInCookie(t.app, theo.email, theo.password);
    const oldSid = sidOf(oldCookie);
    expect(await sessionSids(t.db)).toContain(oldSid);
    expect((await getAccount(t.app, oldCookie)).statusCode).toBe(200);

    const res = await signIn(t.app, theo.email, theo.password, oldCookie);
    expect(res.statusCode, res.body).toBe(200);
    const newCookie = sessionCookie(res.headers['set-cookie']);
    const newSid = sidOf(newCookie);
    expect(newSid).not.toBe(oldSid);

    const old = await getAccount(t.app, oldCookie);
    expectError(old, 401);
    expect((await getAccount(t.app, newCookie)).statusCode).toBe(200);

    const sids = await sessionSids(t.db);
    expect(sids).not.toContain(oldSid);
    expect(sids).toContain(newSid);
  });

  it('also renews the session when someone signs in as another account on the same browser', async () => {
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    const res = await signIn(t.app, theo.email, theo.password, amara.cookie);
    expect(res.statusCode).toBe(200);
    const theoCookie = sessionCookie(res.headers['set-cookie']);
    expect(sidOf(theoCookie)).not.toBe(sidOf(amara.cookie));
    expect((await getAccount(t.app, amara.cookie)).statusCode).toBe(401);
    expect((await getAccount(t.app, theoCookie)).json<Account>().id).toBe(theo.account.id);
    expect(await sessionSids(t.db)).not.toContain(sidOf(amara.cookie));
  });

  it('keeps no more than the new session row for that browser', async () => {
    const first = await signInCookie(t.app, theo.email, theo.password);
    const before = (await sessionSids(t.db)).length;
    const res = await signIn(t.app, theo.email, theo.password, first);
    expect(res.statusCode).toBe(200);
    expect((await sessionSids(t.db)).length).toBe(before);
  });
});

describe('POST /api/auth/sign-out', () => {
  it('answers 204, ends the session row, and the old cookie then gets 401', async () => {
    const cookie = await signInCookie(t.app, theo.email, theo.password);
    const sid = sidOf(cookie);
    expect(await sessionSids(t.db)).toContain(sid);

    const res = await signOut(cookie);
    expect(res.statusCode).toBe(204);
    expect(res.body).toBe('');
    expect(await sessionSids(t.db)).not.toContain(sid);

    const after = await getAccount(t.app, cookie);
    expect(expectError(after, 401).message).toBe('Please sign in.');
  });

  it('ends only this device: another session of the same account stays signed in', async () => {
    const laptop = await signInCookie(t.app, theo.email, theo.password);
    const phone = await signInCookie(t.app, theo.email, theo.password);
    expect((await signOut(laptop)).statusCode).toBe(204);
    expect((await getAccount(t.app, laptop)).statusCode).toBe(401);
    expect((await getAccount(t.app, phone)).statusCode).toBe(200);
  });

  it('answers 204 without a session, and for a session that has already ended', async () => {
    expect((await signOut()).statusCode).toBe(204);
    const cookie = await signInCookie(t.app, theo.email, theo.password);
    expect((await signOut(cookie)).statusCode).toBe(204);
    expect((await signOut(cookie)).statusCode).toBe(204);
  });
});
