import type { Account, AccountListResponse, Role } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { expectError, expectFieldErrors, getAccount, makeAdmin, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let admin: SignedUp;
let baker: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  admin = await signUp(t.app, { displayName: 'Ines Marlow' });
  await makeAdmin(t.db, admin.account.id);
  baker = await signUp(t.app, { displayName: 'Dev Rowan' });
});

function listAccounts(cookie: string, query = '') {
  return t.app.inject({ method: 'GET', url: `/api/admin/accounts${query}`, headers: { cookie } });
}

function setRole(cookie: string, id: string, role: unknown) {
  return t.app.inject({
    method: 'PATCH',
    url: `/api/admin/accounts/${id}/role`,
    payload: { role },
    headers: { cookie },
  });
}

async function countAdmins(): Promise<number> {
  const rows = await t.db.selectFrom('account').select('id').where('role', '=', 'admin').execute();
  return rows.length;
}

describe('the session guard', () => {
  it('answers GET /api/account without a session with 401 in the error shape', async () => {
    const body = expectError(await getAccount(t.app), 401);
    expect(body).toEqual({ statusCode: 401, error: 'Unauthorized', message: 'Please sign in.' });
  });

  it('answers 401 to a cookie the server never issued', async () => {
    expectError(await getAccount(t.app, 'peakwise.sid=made-up.value'), 401);
  });

  it('lets public routes through without a session', async () => {
    expect((await t.app.inject({ method: 'GET', url: '/api/health' })).statusCode).toBe(200);
    const signIn = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      payload: { email: baker.email, password: baker.password },
    });
    expect(signIn.statusCode).toBe(200);
    const wrong = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-in',
      payload: { email: baker.email, password: 'wrong wrong wrong' },
    });
    expect(expectError(wrong, 401).message).toBe('E-mail or password is incorrect.');
    const signUpRes = await t.app.inject({
      method: 'POST',
      url: '/api/auth/sign-up',
      payload: { email: 'public.route@example.com', displayName: 'Pip', password: baker.password },
    });
    expect(signUpRes.statusCode).toBe(201);
  });

  it('answers a baker on an admin route with 403 in the error shape', async () => {
    const body = expectError(await listAccounts(baker.cookie), 403);
    expect(body.error).toBe('Forbidden');
    expectError(await setRole(baker.cookie, baker.account.id, 'admin'), 403);
    expect((await getAccount(t.app, baker.cookie)).json<Account>().role).toBe('baker');
  });

  it('answers admin routes without a session with 401, not 403', async () => {
    expectError(await t.app.inject({ method: 'GET', url: '/api/admin/accounts' }), 401);
  });
});

describe('GET /api/admin/accounts', () => {
  it('gives an admin the list and the total, without password hashes', async () => {
    await signUp(t.app, { displayName: 'Amara Quist' });
    const res = await listAccounts(admin.cookie);
    expect(res.statusCode, res.body).toBe(200);
    const body = res.json<AccountListResponse>();
    expect(Object.keys(body).sort()).toEqual(['items', 'total']);
    expect(body.total).toBe(3);
    expect(body.items.map((a) => a.displayName).sort()).toEqual(['Amara Quist', 'Dev Rowan', 'Ines Marlow']);
    expect(body.items.find((a) => a.id === admin.account.id)?.role).toBe('admin');
    expect(res.body).not.toMatch(/passwordHash|scrypt/);
  });

  it('pages with limit and offset while total stays the whole count', async () => {
    await signUp(t.app, { displayName: 'Amara Quist' });
    const first = (await listAccounts(admin.cookie, '?limit=2')).json<AccountListResponse>();
    const rest = (await listAccounts(admin.cookie, '?limit=2&offset=2')).json<AccountListResponse>();
    expect(first.items).toHaveLength(2);
    expect(rest.items).toHaveLength(1);
    expect(first.total).toBe(3);
    expect(rest.total).toBe(3);
    const ids = [...first.items, ...rest.items].map((a) => a.id);
    expect(new Set(ids).size).toBe(3);
  });

  it('refuses a limit out of range with 400 naming limit', async () => {
    expectFieldErrors(await listAccounts(admin.cookie, '?limit=0'), ['limit']);
    expectFieldErrors(await listAccounts(admin.cookie, '?limit=201'), ['limit']);
  });

  it('says a non-number limit must be a whole number (not that it is too large)', async () => {
    const body = expectFieldErrors(await listAccounts(admin.cookie, '?limit=abc'), ['limit']);
    expect(body.details?.[0]?.message).toBe('limit must be a whole number.');
  });
});

describe('PATCH /api/admin/accounts/:id/role', () => {
  it('changes a role, and the changed user’s next request sees it', async () => {
    const res = await setRole(admin.cookie, baker.account.id, 'instructor');
    expect(res.statusCode, res.body).toBe(200);
    expect(res.json<Account>()).toEqual({ ...baker.account, role: 'instructor' });
    expect((await getAccount(t.app, baker.cookie)).json<Account>().role).toBe('instructor');

    // The guard reloads the account on every request: promotion opens admin routes at once…
    expect((await listAccounts(baker.cookie)).statusCode).toBe(403);
    expect((await setRole(admin.cookie, baker.account.id, 'admin')).statusCode).toBe(200);
    expect((await listAccounts(baker.cookie)).statusCode).toBe(200);
    // …and demotion closes them at once, with the same session cookie.
    expect((await setRole(admin.cookie, baker.account.id, 'baker')).statusCode).toBe(200);
    expectError(await listAccounts(baker.cookie), 403);
  });

  it('refuses an unknown role with 400 naming role', async () => {
    for (const role of ['chef', '', null, 7]) {
      expectFieldErrors(await setRole(admin.cookie, baker.account.id, role), ['role']);
    }
    const [row] = await t.db.selectFrom('account').select('role').where('id', '=', baker.account.id).execute();
    expect(row?.role).toBe('baker');
  });

  it('refuses an id that is not a uuid with 400 naming id', async () => {
    expectFieldErrors(await setRole(admin.cookie, 'not-a-uuid', 'instructor'), ['id']);
    expectFieldErrors(await setRole(admin.cookie, '1', 'instructor'), ['id']);
  });

  it('answers an unknown uuid with 404 in the error shape', async () => {
    expectError(await setRole(admin.cookie, '00000000-0000-4000-8000-000000000000', 'instructor'), 404);
  });

  it('refuses to demote the last admin with 409', async () => {
    const body = expectError(await setRole(admin.cookie, admin.account.id, 'baker'), 409);
    expect(body.details?.map((d) => d.field)).toEqual(['role']);
    expect(await countAdmins()).toBe(1);
    expect((await listAccounts(admin.cookie)).statusCode).toBe(200);
  });

  it('lets an admin step down once another admin exists', async () => {
    expect((await setRole(admin.cookie, baker.account.id, 'admin')).statusCode).toBe(200);
    const res = await setRole(admin.cookie, admin.account.id, 'baker');
    expect(res.statusCode, res.body).toBe(200);
    expect(await countAdmins()).toBe(1);
    expectError(await listAccounts(admin.cookie), 403);
  });

  it('keeps one admin even when the last two demote each other at the same moment', async () => {
    // A race: each request checks "more than one admin?" before either update lands. Several
    // rounds, so the test does not depend on one lucky interleaving.
    const outcomes: string[] = [];
    for (let round = 0; round < 12; round += 1) {
      await makeAdmin(t.db, admin.account.id);
      await makeAdmin(t.db, baker.account.id);
      const results = await Promise.all([
        setRole(admin.cookie, baker.account.id, 'baker' satisfies Role),
        setRole(baker.cookie, admin.account.id, 'baker' satisfies Role),
      ]);
      const statuses = results.map((r) => r.statusCode).sort();
      expect(statuses).toContain(200);
      outcomes.push(`${statuses.join('+')} -> ${await countAdmins()} admin(s)`);
    }
    expect(
      outcomes.filter((o) => o.endsWith('-> 0 admin(s)')),
      outcomes.join('; '),
    ).toEqual([]);
  });
});
