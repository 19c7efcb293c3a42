import type { AccountListResponse, AdminAccount } from '@peakwise/shared';
import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { ACCOUNT_DISABLED } from '../src/auth/local.strategy.js';
import { ACCOUNT_DISABLED_SESSION } from '../src/common/session.guard.js';
import {
  expectError,
  expectFieldErrors,
  getAccount,
  makeAdmin,
  sessionSids,
  sidOf,
  signIn,
  signInCookie,
  signUp,
  type SignedUp,
} from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Sessions end at once, and a captured cookie replayed afterwards is refused (OWASP Session
// Management Cheat Sheet: invalidate on logout, on password change, and when an account is
// disabled), including a session row that a request under way writes back after the delete.

let t: TestApp;
let admin: SignedUp;
let theo: SignedUp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());
beforeEach(async () => {
  await resetDatabase(t.db);
  admin = await signUp(t.app, { displayName: 'Ines Marlow' });
  await makeAdmin(t.db, admin.account.id);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
});

interface SessionRow {
  sid: string;
  sess: unknown;
  expire: Date;
}

async function sessionRow(cookie: string): Promise<SessionRow> {
  return t.db
    .selectFrom('session')
    .select(['sid', 'sess', 'expire'])
    .where('sid', '=', sidOf(cookie))
    .executeTakeFirstOrThrow();
}

/** Writes a session row back as a request that loaded it before the change would when it answers. */
async function writeBack(row: SessionRow): Promise<void> {
  await sql`INSERT INTO session (sid, sess, expire) VALUES (${row.sid}, ${JSON.stringify(row.sess)}::json, ${row.expire})
    ON CONFLICT (sid) DO UPDATE SET sess = excluded.sess, expire = excluded.expire`.execute(t.db);
}

function rename(cookie: string, displayName: string) {
  return t.app.inject({ method: 'PATCH', url: '/api/account', headers: { cookie }, payload: { displayName } });
}

function setStatus(cookie: string, id: string, payload: unknown) {
  return t.app.inject({
    method: 'PATCH',
    url: `/api/admin/accounts/${id}/status`,
    headers: { cookie },
    payload: payload as never,
  });
}

describe('sign-out', () => {
  it('a cookie replayed after sign-out gets 401 on reads and writes', async () => {
    const cookie = await signInCookie(t.app, theo.email, theo.password);
    expect((await t.app.inject({ method: 'POST', url: '/api/auth/sign-out', headers: { cookie } })).statusCode).toBe(
      204,
    );
    expectError(await getAccount(t.app, cookie), 401);
    expectError(await rename(cookie, 'Replayed'), 401);
  });
});

describe('password change', () => {
  it('ends the other sessions at once and keeps the one that made the change', async () => {
    const laptop = await signInCookie(t.app, theo.email, theo.password);
    const phone = await signInCookie(t.app, theo.email, theo.password);
    const change = await t.app.inject({
      method: 'POST',
      url: '/api/account/password',
      headers: { cookie: laptop },
      payload: { currentPassword: theo.password, newPassword: 'a stiff levain rests in the cold' },
    });
    expect(change.statusCode, change.body).toBe(204);
    expect(await sessionSids(t.db)).not.toContain(sidOf(phone));
    expectError(await getAccount(t.app, phone), 401);
    expectError(await getAccount(t.app, theo.cookie), 401);
    expect((await getAccount(t.app, laptop)).statusCode).toBe(200);
    // …and it stays alive on later requests (it carries the new epoch).
    expect((await rename(laptop, 'Theo P.')).statusCode).toBe(200);
    expect((await getAccount(t.app, laptop)).statusCode).toBe(200);
  });

  it('a session row written back by a request under way is still refused', async () => {
    const laptop = await signInCookie(t.app, theo.email, theo.password);
    const phone = await signInCookie(t.app, theo.email, theo.password);
    const inFlight = await sessionRow(phone);
    const change = await t.app.inject({
      method: 'POST',
      url: '/api/account/password',
      headers: { cookie: laptop },
      payload: { currentPassword: theo.password, newPassword: 'a stiff levain rests in the cold' },
    });
    expect(change.statusCode).toBe(204);
    await writeBack(inFlight);
    const replay = await getAccount(t.app, phone);
    expect(expectError(replay, 401).message).toBe('Please sign in.');
    // The refused session is deleted, and the browser told to drop the cookie.
    expect(await sessionSids(t.db)).not.toContain(sidOf(phone));
    expect(String(replay.headers['set-cookie'])).toMatch(/^peakwise\.sid=;/);
  });
});

describe('an admin disabling an account', () => {
  it('ends its sessions at once; a replayed cookie gets 401 saying why; sign-in is refused', async () => {
    const phone = await signInCookie(t.app, theo.email, theo.password);
    const res = await setStatus(admin.cookie, theo.account.id, { disabled: true });
    expect(res.statusCode, res.body).toBe(200);
    const body = res.json<AdminAccount>();
    expect(body.id).toBe(theo.account.id);
    expect(Date.parse(body.disabledAt!)).toBeGreaterThan(Date.now() - 60_000);
    expect(res.body).not.toMatch(/passwordHash|sessionEpoch/);

    const sids = await sessionSids(t.db);
    expect(sids).not.toContain(sidOf(phone));
    expect(sids).not.toContain(sidOf(theo.cookie));
    expect(sids).toContain(sidOf(admin.cookie));
    for (const cookie of [phone, theo.cookie]) {
      // The rows are gone, so the cookie names no session at all.
      expect(expectError(await getAccount(t.app, cookie), 401).message).toBe('Please sign in.');
      expectError(await rename(cookie, 'Replayed'), 401);
    }

    const signInAgain = await signIn(t.app, theo.email, theo.password);
    expect(expectError(signInAgain, 403).message).toBe(ACCOUNT_DISABLED);
    expect(signInAgain.headers['set-cookie']).toBeUndefined();
    // Without the right password nothing tells that the account is disabled.
    expect(expectError(await signIn(t.app, theo.email, 'not the password'), 401).message).toBe(
      'E-mail or password is incorrect.',
    );
  });

  it('refuses a session row written back after the disable, and deletes it', async () => {
    const inFlight = await sessionRow(theo.cookie);
    expect((await setStatus(admin.cookie, theo.account.id, { disabled: true })).statusCode).toBe(200);
    await writeBack(inFlight);
    expect(expectError(await getAccount(t.app, theo.cookie), 401).message).toBe(ACCOUNT_DISABLED_SESSION);
    expect(await sessionSids(t.db)).not.toContain(sidOf(theo.cookie));
  });

  it('enabling lets the account sign in again, but the old sessions stay ended', async () => {
    expect((await setStatus(admin.cookie, theo.account.id, { disabled: true })).statusCode).toBe(200);
    const enabled = await setStatus(admin.cookie, theo.account.id, { disabled: false });
    expect(enabled.statusCode).toBe(200);
    expect(enabled.json<AdminAccount>().disabledAt).toBeNull();
    expectError(await getAccount(t.app, theo.cookie), 401);
    const fresh = await signInCookie(t.app, theo.email, theo.password);
    expect((await getAccount(t.app, fresh)).statusCode).toBe(200);
  });

  it('disabling twice keeps the first time; the list shows who is disabled', async () => {
    const first = (await setStatus(admin.cookie, theo.account.id, { disabled: true })).json<AdminAccount>();
    const second = (await setStatus(admin.cookie, theo.account.id, { disabled: true })).json<AdminAccount>();
    expect(second.disabledAt).toBe(first.disabledAt);
    const list = await t.app.inject({ method: 'GET', url: '/api/admin/accounts', headers: { cookie: admin.cookie } });
    const items = list.json<AccountListResponse>().items;
    expect(items.find((a) => a.id === theo.account.id)?.disabledAt).toBe(first.disabledAt);
    expect(items.find((a) => a.id === admin.account.id)?.disabledAt).toBeNull();
  });

  it('an admin cannot disable themselves (409) and stays signed in', async () => {
    const res = await setStatus(admin.cookie, admin.account.id, { disabled: true });
    expect(expectError(res, 409).details?.map((d) => d.field)).toEqual(['disabled']);
    expect((await getAccount(t.app, admin.cookie)).statusCode).toBe(200);
    const row = await t.db
      .selectFrom('account')
      .select('disabledAt')
      .where('id', '=', admin.account.id)
      .executeTakeFirstOrThrow();
    expect(row.disabledAt).toBeNull();
  });

  it('another admin can be disabled, and is then refused like anyone', async () => {
    const other = await signUp(t.app, { displayName: 'Dev Rowan' });
    await makeAdmin(t.db, other.account.id);
    expect((await setStatus(admin.cookie, other.account.id, { disabled: true })).statusCode).toBe(200);
    expectError(
      await t.app.inject({ method: 'GET', url: '/api/admin/accounts', headers: { cookie: other.cookie } }),
      401,
    );
  });

  it('is for admins only, validates its body and id, and answers 404 for no such account', async () => {
    expectError(await setStatus(theo.cookie, admin.account.id, { disabled: true }), 403);
    expectError(
      await t.app.inject({
        method: 'PATCH',
        url: `/api/admin/accounts/${theo.account.id}/status`,
        payload: { disabled: true },
      }),
      401,
    );
    expectFieldErrors(await setStatus(admin.cookie, theo.account.id, { disabled: 'yes' }), ['disabled']);
    expectFieldErrors(await setStatus(admin.cookie, theo.account.id, {}), ['disabled']);
    expectFieldErrors(await setStatus(admin.cookie, 'not-an-id', { disabled: true }), ['id']);
    expectError(await setStatus(admin.cookie, '00000000-0000-4000-8000-000000000000', { disabled: true }), 404);
    const row = await t.db
      .selectFrom('account')
      .select('disabledAt')
      .where('id', '=', admin.account.id)
      .executeTakeFirstOrThrow();
    expect(row.disabledAt).toBeNull();
  });
});
