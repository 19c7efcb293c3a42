import type { Account } from '@peakwise/shared';
import { dictionary } from '@zxcvbn-ts/language-common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  PASSWORD,
  expectError,
  expectFieldErrors,
  getAccount,
  passphrase,
  signUp,
  uniqueEmail,
  type InjectResponse,
} from './helpers.js';
import { createTestApp, liveSessionCookies, resetDatabase, sessionCookie, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await resetDatabase(t.db);
});
afterAll(() => t.close());

const ACCOUNT_KEYS = ['createdAt', 'displayName', 'email', 'id', 'role', 'temperatureUnit', 'timeZone', 'unitSystem'];
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

function postSignUp(payload: unknown): Promise<InjectResponse> {
  return t.app.inject({
    method: 'POST',
    url: '/api/auth/sign-up',
    payload: JSON.stringify(payload),
    headers: { 'content-type': 'application/json' },
  });
}

function valid(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return { email: uniqueEmail(), displayName: 'Amara Quist', password: PASSWORD, ...overrides };
}

async function accountRows(email: string) {
  return t.db.selectFrom('account').selectAll().where('email', '=', email).execute();
}

describe('POST /api/auth/sign-up', () => {
  it('answers 201 with the Account shape and never the password hash', async () => {
    const email = uniqueEmail();
    const before = Date.now();
    const res = await postSignUp({ email, displayName: 'Amara Quist', password: PASSWORD });
    expect(res.statusCode, res.body).toBe(201);
    const account = res.json<Account>();
    expect(Object.keys(account).sort()).toEqual(ACCOUNT_KEYS);
    expect(account.id).toMatch(UUID);
    expect(account).toMatchObject({
      email,
      displayName: 'Amara Quist',
      role: 'baker',
      unitSystem: 'metric',
      temperatureUnit: 'C',
      timeZone: 'UTC',
    });
    const created = Date.parse(account.createdAt);
    expect(account.createdAt).toBe(new Date(created).toISOString());
    expect(Math.abs(created - before)).toBeLessThan(60_000);

    const [row] = await accountRows(email);
    expect(row?.passwordHash).toMatch(/^scrypt\$/);
    expect(res.body).not.toContain(row!.passwordHash);
    expect(res.body).not.toMatch(/password|scrypt/i);
  });

  it('sets a session cookie that opens GET /api/account', async () => {
    const res = await postSignUp(valid());
    expect(res.statusCode).toBe(201);
    const cookie = sessionCookie(res.headers['set-cookie']);
    const me = await getAccount(t.app, cookie);
    expect(me.statusCode, me.body).toBe(200);
    expect(me.json<Account>()).toEqual(res.json<Account>());
    expect(me.body).not.toMatch(/passwordHash|scrypt/);
  });

  it('stores and returns the e-mail lower-cased and trimmed, and the name trimmed', async () => {
    const email = uniqueEmail('Mixed.Case');
    const res = await postSignUp(valid({ email: `  ${email.toUpperCase()} `, displayName: '  Dev Rowan  ' }));
    expect(res.statusCode, res.body).toBe(201);
    expect(res.json<Account>()).toMatchObject({ email: email.toLowerCase(), displayName: 'Dev Rowan' });
    expect(await accountRows(email.toLowerCase())).toHaveLength(1);
  });

  it('refuses a second account for the same e-mail in any case with 409 naming email', async () => {
    const { email } = await signUp(t.app);
    for (const spelling of [email, email.toUpperCase(), ` ${email.replace(/^./, (c) => c.toUpperCase())}`]) {
      const res = await postSignUp(valid({ email: spelling, displayName: 'Someone Else' }));
      const body = expectError(res, 409);
      expect(body.details).toEqual([{ field: 'email', message: expect.any(String) as string }]);
      expect(liveSessionCookies(res.headers['set-cookie'])).toEqual([]);
    }
    const rows = await accountRows(email);
    expect(rows).toHaveLength(1);
    expect(rows[0]?.displayName).toBe('Theo Park');
  });

  it('refuses a 7-character password with 400 naming password', async () => {
    const email = uniqueEmail();
    expectFieldErrors(await postSignUp(valid({ email, password: passphrase(7) })), ['password']);
    expect(await accountRows(email)).toHaveLength(0);
  });

  it('accepts 8-, 64- and 128-character passphrases and refuses 129', async () => {
    for (const length of [8, 64, 128]) {
      const password = passphrase(length);
      expect([...password]).toHaveLength(length);
      const res = await postSignUp(valid({ password }));
      expect(res.statusCode, `length ${length}: ${res.body}`).toBe(201);
    }
    const email = uniqueEmail();
    expectFieldErrors(await postSignUp(valid({ email, password: passphrase(129) })), ['password']);
    expect(await accountRows(email)).toHaveLength(0);
  });

  it('refuses a password from the common-password list, in any case, with 400 naming password', async () => {
    const common = new Set(dictionary['passwords-common']);
    const candidates = ['password123', 'qwertyuiop', 'iloveyou1'].filter((p) => common.has(p));
    expect(candidates.length, 'none of the candidates is in passwords-common').toBeGreaterThan(0);
    for (const password of candidates) {
      expect(password.length).toBeGreaterThanOrEqual(8); // so the length rule is not what refuses it
      expectFieldErrors(await postSignUp(valid({ password })), ['password']);
      expectFieldErrors(await postSignUp(valid({ password: password.toUpperCase() })), ['password']);
    }
  });

  it('has no composition rules: a long lower-case passphrase without digits or symbols is accepted', async () => {
    const password = 'my starter smells like green apples';
    expect(password).toMatch(/^[a-z ]+$/);
    const res = await postSignUp(valid({ password }));
    expect(res.statusCode, res.body).toBe(201);
  });

  it('refuses the e-mail address or the name as the password', async () => {
    const email = uniqueEmail('breadhead');
    expectFieldErrors(await postSignUp(valid({ email, password: email })), ['password']);
    expectFieldErrors(await postSignUp(valid({ displayName: 'Marlow Ines', password: 'marlow ines' })), ['password']);
  });

  it('refuses an unknown field with 400 naming it, so nobody can sign up as admin', async () => {
    const email = uniqueEmail();
    expectFieldErrors(await postSignUp(valid({ email, role: 'admin' })), ['role']);
    expectFieldErrors(await postSignUp(valid({ nickname: 'pip' })), ['nickname']);
    expect(await accountRows(email)).toHaveLength(0);
  });

  it('answers a request without a body with 400 naming every required field', async () => {
    const res = await t.app.inject({ method: 'POST', url: '/api/auth/sign-up' });
    expectFieldErrors(res, ['displayName', 'email', 'password']);
  });

  it('answers an empty object with 400 naming every required field', async () => {
    expectFieldErrors(await postSignUp({}), ['displayName', 'email', 'password']);
  });

  it('refuses a malformed e-mail with 400 naming email', async () => {
    for (const email of ['not-an-email', 'theo@', '@example.com', 'theo example@example.com']) {
      expectFieldErrors(await postSignUp(valid({ email })), ['email']);
    }
  });

  it('refuses a blank or over-long display name with 400 naming displayName', async () => {
    expectFieldErrors(await postSignUp(valid({ displayName: '   ' })), ['displayName']);
    expectFieldErrors(await postSignUp(valid({ displayName: 'x'.repeat(81) })), ['displayName']);
  });

  it('starts the account in the time zone the device sent, or UTC when none was sent', async () => {
    const zoned = await postSignUp(valid({ timeZone: 'America/Chicago' }));
    expect(zoned.statusCode).toBe(201);
    expect(zoned.json<Account>().timeZone).toBe('America/Chicago');
    const plain = await postSignUp(valid());
    expect(plain.json<Account>().timeZone).toBe('UTC');
  });

  it('refuses an unknown or null time zone with 400 naming timeZone, writing nothing', async () => {
    for (const timeZone of ['Mars/Olympus_Mons', null, 42]) {
      const email = uniqueEmail();
      expectFieldErrors(await postSignUp(valid({ email, timeZone })), ['timeZone']);
      expect(await accountRows(email)).toHaveLength(0);
    }
  });
});
