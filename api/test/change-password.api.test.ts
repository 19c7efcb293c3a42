import { dictionary } from '@zxcvbn-ts/language-common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  expectError,
  expectFieldErrors,
  getAccount,
  passphrase,
  sessionSids,
  sidOf,
  signIn,
  signInCookie,
  signUp,
  type InjectResponse,
  type SignedUp,
} from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await resetDatabase(t.db);
});
afterAll(() => t.close());

const NEW_PASSWORD = 'the rye starter doubled overnight';

function changePassword(cookie: string | undefined, payload: unknown): Promise<InjectResponse> {
  return t.app.inject({
    method: 'POST',
    url: '/api/account/password',
    payload: JSON.stringify(payload),
    headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
  });
}

async function storedHash(id: string): Promise<string> {
  const row = await t.db.selectFrom('account').select('passwordHash').where('id', '=', id).executeTakeFirstOrThrow();
  return row.passwordHash;
}

describe('POST /api/account/password', () => {
  it('needs a session', async () => {
    expectError(await changePassword(undefined, { currentPassword: 'x', newPassword: NEW_PASSWORD }), 401);
  });

  it('refuses a wrong current password with 400 naming currentPassword, and changes nothing', async () => {
    const theo = await signUp(t.app);
    const before = await storedHash(theo.account.id);
    const res = await changePassword(theo.cookie, { currentPassword: 'not my password', newPassword: NEW_PASSWORD });
    expectFieldErrors(res, ['currentPassword']);
    expect(await storedHash(theo.account.id)).toBe(before);
    expect((await signIn(t.app, theo.email, theo.password)).statusCode).toBe(200);
  });

  it('refuses a common new password with 400 naming newPassword', async () => {
    const theo = await signUp(t.app);
    const common = 'password123';
    expect(dictionary['passwords-common']).toContain(common);
    const res = await changePassword(theo.cookie, { currentPassword: theo.password, newPassword: common });
    expectFieldErrors(res, ['newPassword']);
    expect((await signIn(t.app, theo.email, common)).statusCode).toBe(401);
  });

  it('refuses a new password that is too short, too long, or the e-mail, naming newPassword', async () => {
    const theo = await signUp(t.app);
    for (const newPassword of [passphrase(7), passphrase(129), theo.email]) {
      const res = await changePassword(theo.cookie, { currentPassword: theo.password, newPassword });
      expectFieldErrors(res, ['newPassword']);
    }
  });

  it('answers missing fields with 400 naming them', async () => {
    const theo = await signUp(t.app);
    expectFieldErrors(await changePassword(theo.cookie, {}), ['currentPassword', 'newPassword']);
    expectFieldErrors(
      await changePassword(theo.cookie, { currentPassword: theo.password, extra: 1, newPassword: NEW_PASSWORD }),
      ['extra'],
    );
  });

  it('answers 204; afterwards the new password signs in and the old one does not', async () => {
    const theo = await signUp(t.app);
    const res = await changePassword(theo.cookie, { currentPassword: theo.password, newPassword: NEW_PASSWORD });
    expect(res.statusCode, res.body).toBe(204);
    expect(res.body).toBe('');
    expect(await storedHash(theo.account.id)).toMatch(/^scrypt\$/);

    expectError(await signIn(t.app, theo.email, theo.password), 401);
    expect((await signIn(t.app, theo.email, NEW_PASSWORD)).statusCode).toBe(200);
  });

  it('ends every other session of the account but keeps the current one', async () => {
    const theo = await signUp(t.app);
    const phone = await signInCookie(t.app, theo.email, theo.password);
    const tablet = await signInCookie(t.app, theo.email, theo.password);
    const res = await changePassword(theo.cookie, { currentPassword: theo.password, newPassword: NEW_PASSWORD });
    expect(res.statusCode).toBe(204);

    expect((await getAccount(t.app, theo.cookie)).statusCode).toBe(200);
    expectError(await getAccount(t.app, phone), 401);
    expectError(await getAccount(t.app, tablet), 401);
    const sids = await sessionSids(t.db);
    expect(sids).toContain(sidOf(theo.cookie));
    expect(sids).not.toContain(sidOf(phone));
    expect(sids).not.toContain(sidOf(tablet));
  });

  it('leaves other accounts’ sessions alone', async () => {
    const theo = await signUp(t.app);
    const amara: SignedUp = await signUp(t.app, { displayName: 'Amara Quist' });
    const res = await changePassword(theo.cookie, { currentPassword: theo.password, newPassword: NEW_PASSWORD });
    expect(res.statusCode).toBe(204);
    expect((await getAccount(t.app, amara.cookie)).statusCode).toBe(200);
  });
});
