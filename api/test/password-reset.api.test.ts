import { dictionary } from '@zxcvbn-ts/language-common';
import type { DevMailListResponse, PasswordResetRequested } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { FakeSmtp, StoredMail } from '../src/dev/fake-smtp.js';
import {
  expectError,
  expectFieldErrors,
  getAccount,
  signIn,
  signInCookie,
  signUp,
  type InjectResponse,
} from './helpers.js';
import { mailConfig, startTestMailbox } from './mail-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
let mailbox: FakeSmtp;
beforeAll(async () => {
  mailbox = await startTestMailbox();
  t = await createTestApp(mailConfig(mailbox, 'http://bakery.test:8080'));
  await resetDatabase(t.db);
});
afterAll(async () => {
  await t.close();
  await mailbox.close();
});
beforeEach(() => mailbox.clear());

const NEW_PASSWORD = 'a stiff levain rests in the cold';

function requestReset(email: unknown): Promise<InjectResponse> {
  return t.app.inject({ method: 'POST', url: '/api/auth/password-reset', payload: { email } });
}

function confirm(payload: unknown): Promise<InjectResponse> {
  return t.app.inject({
    method: 'POST',
    url: '/api/auth/password-reset/confirm',
    payload: JSON.stringify(payload),
    headers: { 'content-type': 'application/json' },
  });
}

/** The mail goes out after the 202, so wait for it to arrive (a deadline, not a measured time). */
async function mailTo(address: string): Promise<StoredMail> {
  for (let i = 0; i < 100; i++) {
    const found = mailbox.messages().find((m) => m.to.includes(address));
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`no mail reached ${address}`);
}

function tokenIn(mail: StoredMail): string {
  const link = /http:\/\/bakery\.test:8080\/reset-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!link) throw new Error(`no reset link in ${mail.text}`);
  return decodeURIComponent(link[1]!);
}

async function resetToken(email: string): Promise<string> {
  expect((await requestReset(email)).statusCode).toBe(202);
  return tokenIn(await mailTo(email));
}

describe('POST /api/auth/password-reset', () => {
  it('answers 202 and mails exactly one message with a link to the public address', async () => {
    const theo = await signUp(t.app);
    const res = await requestReset(theo.email.toUpperCase());
    expect(res.statusCode, res.body).toBe(202);
    expect(res.json<PasswordResetRequested>()).toEqual({ accepted: true, expiresInMinutes: 60 });

    const mail = await mailTo(theo.email);
    expect(mailbox.messages()).toHaveLength(1);
    expect(mail.subject).toBe('Set a new Peakwise password');
    expect(tokenIn(mail)).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(mail.html).toContain(`http://bakery.test:8080/reset-password?token=${tokenIn(mail)}`);
    // Only the hash is kept: the token itself is nowhere in the database.
    const rows = await t.db
      .selectFrom('accountToken')
      .select(['tokenHash', 'purpose'])
      .where('accountId', '=', theo.account.id)
      .execute();
    expect(rows.map((r) => r.purpose)).toEqual(['password-reset']);
    expect(rows[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(rows[0]!.tokenHash).not.toContain(tokenIn(mail));
  });

  it('answers an unknown address exactly like a known one and mails nothing to it', async () => {
    const theo = await signUp(t.app);
    const unknown = await requestReset('nobody.here@example.com');
    const known = await requestReset(theo.email);
    expect(unknown.statusCode).toBe(202);
    expect(unknown.body).toBe(known.body);
    // Theo's mail was sent after the unknown request was handled; once it is in, nothing else is coming.
    await mailTo(theo.email);
    expect(mailbox.messages().map((m) => m.to)).toEqual([[theo.email]]);
  });

  it('refuses a missing or malformed e-mail with 400 naming email', async () => {
    expectFieldErrors(await requestReset(undefined), ['email']);
    expectFieldErrors(await requestReset('not an address'), ['email']);
  });

  it('lists the mail at /api/dev/mail, newest first, without a session', async () => {
    const theo = await signUp(t.app);
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    await resetToken(theo.email);
    await resetToken(amara.email);
    const res = await t.app.inject({ method: 'GET', url: '/api/dev/mail' });
    expect(res.statusCode, res.body).toBe(200);
    const { items } = res.json<DevMailListResponse>();
    expect(items.map((m) => m.to)).toEqual([[amara.email], [theo.email]]);
    expect(Object.keys(items[0]!).sort()).toEqual(['date', 'from', 'html', 'messageId', 'subject', 'text', 'to']);
  });
});

describe('POST /api/auth/password-reset/confirm', () => {
  it('sets the new password: it signs in, the old one fails, every other session ends', async () => {
    const theo = await signUp(t.app);
    const phone = await signInCookie(t.app, theo.email, theo.password);
    const token = await resetToken(theo.email);

    const res = await confirm({ token, password: NEW_PASSWORD });
    expect(res.statusCode, res.body).toBe(204);
    expectError(await signIn(t.app, theo.email, theo.password), 401);
    expect((await signIn(t.app, theo.email, NEW_PASSWORD)).statusCode).toBe(200);
    expectError(await getAccount(t.app, phone), 401);
    expectError(await getAccount(t.app, theo.cookie), 401);
  });

  it('refuses the same link a second time with 400 naming token', async () => {
    const theo = await signUp(t.app);
    const token = await resetToken(theo.email);
    expect((await confirm({ token, password: NEW_PASSWORD })).statusCode).toBe(204);
    expectFieldErrors(await confirm({ token, password: 'another loaf another day' }), ['token']);
    expect((await signIn(t.app, theo.email, NEW_PASSWORD)).statusCode).toBe(200);
  });

  it('refuses an expired link with 400 naming token and leaves the password alone', async () => {
    const theo = await signUp(t.app);
    const token = await resetToken(theo.email);
    await t.db
      .updateTable('accountToken')
      .set({ createdAt: new Date(Date.now() - 2 * 3600_000), expiresAt: new Date(Date.now() - 3600_000) })
      .where('accountId', '=', theo.account.id)
      .execute();
    expectFieldErrors(await confirm({ token, password: NEW_PASSWORD }), ['token']);
    expect((await signIn(t.app, theo.email, theo.password)).statusCode).toBe(200);
  });

  it('refuses an unknown or empty token with 400 naming token', async () => {
    expectFieldErrors(await confirm({ token: 'x'.repeat(43), password: NEW_PASSWORD }), ['token']);
    expectFieldErrors(await confirm({ token: '', password: NEW_PASSWORD }), ['token']);
  });

  it('refuses a weak password with 400 naming password, and the link still works afterwards', async () => {
    const theo = await signUp(t.app);
    const token = await resetToken(theo.email);
    expect(dictionary['passwords-common']).toContain('password123');
    for (const password of ['password123', 'short', theo.email]) {
      expectFieldErrors(await confirm({ token, password }), ['password']);
    }
    expect((await confirm({ token, password: NEW_PASSWORD })).statusCode).toBe(204);
  });

  it('spends older reset links of the account too', async () => {
    const theo = await signUp(t.app);
    const older = await resetToken(theo.email);
    mailbox.clear();
    const newer = await resetToken(theo.email);
    expect(newer).not.toBe(older);
    expect((await confirm({ token: newer, password: NEW_PASSWORD })).statusCode).toBe(204);
    expectFieldErrors(await confirm({ token: older, password: 'another loaf another day' }), ['token']);
  });
});

describe('development mail route', () => {
  it('does not exist when the config has no fake mail server (always so in production)', async () => {
    const production = await createTestApp({ mail: { ...mailConfig(mailbox).mail, devMailUrl: null } });
    try {
      expectError(await production.app.inject({ method: 'GET', url: '/api/dev/mail' }), 404);
    } finally {
      await production.close();
    }
  });
});

describe('brake', () => {
  it('answers 429 once an address has used up its attempts, like sign-in', async () => {
    const braked = await createTestApp({ ...mailConfig(mailbox), authAttemptsPerMinute: 2 });
    try {
      const ask = () =>
        // An address of its own: the counts live in the database, shared with the requests above.
        braked.app.inject({
          method: 'POST',
          url: '/api/auth/password-reset',
          remoteAddress: '192.0.2.99',
          payload: { email: 'x@example.com' },
        });
      expect((await ask()).statusCode).toBe(202);
      expect((await ask()).statusCode).toBe(202);
      expectError(await ask(), 429);
    } finally {
      await braked.close();
    }
  });
});
