import type { Account } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  detailFields,
  expectError,
  expectFieldErrors,
  getAccount,
  signUp,
  type InjectResponse,
  type SignedUp,
} from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

let theo: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park' });
});

/** `cookie: null` sends no session. */
function patchAccount(payload: unknown, cookie: string | null = theo.cookie): Promise<InjectResponse> {
  return t.app.inject({
    method: 'PATCH',
    url: '/api/account',
    payload: JSON.stringify(payload),
    headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
  });
}

async function row() {
  return t.db.selectFrom('account').selectAll().where('id', '=', theo.account.id).executeTakeFirstOrThrow();
}

describe('GET /api/account', () => {
  it('returns the signed-in account', async () => {
    const res = await getAccount(t.app, theo.cookie);
    expect(res.statusCode).toBe(200);
    expect(res.json<Account>()).toEqual(theo.account);
  });
});

describe('PATCH /api/account', () => {
  it('needs a session', async () => {
    expectError(await patchAccount({ unitSystem: 'us' }, null), 401);
    expect((await row()).unitSystem).toBe('metric');
  });

  it('changes unit system, temperature unit, time zone and name, and they persist', async () => {
    const changes = { unitSystem: 'us', temperatureUnit: 'F', timeZone: 'America/Chicago', displayName: 'Theo P.' };
    const res = await patchAccount(changes);
    expect(res.statusCode, res.body).toBe(200);
    const expected: Account = {
      ...theo.account,
      unitSystem: 'us',
      temperatureUnit: 'F',
      timeZone: 'America/Chicago',
      displayName: 'Theo P.',
    };
    expect(res.json<Account>()).toEqual(expected);
    expect((await getAccount(t.app, theo.cookie)).json<Account>()).toEqual(expected);
    expect(await row()).toMatchObject(changes);
  });

  it('changes only the fields it is given', async () => {
    expect((await patchAccount({ temperatureUnit: 'F' })).statusCode).toBe(200);
    const res = await patchAccount({ timeZone: 'Europe/London' });
    expect(res.json<Account>()).toEqual({ ...theo.account, temperatureUnit: 'F', timeZone: 'Europe/London' });
  });

  it('accepts an empty object and changes nothing', async () => {
    const res = await patchAccount({});
    expect(res.statusCode).toBe(200);
    expect(res.json<Account>()).toEqual(theo.account);
  });

  it('trims the display name', async () => {
    const res = await patchAccount({ displayName: '  Theo  ' });
    expect(res.json<Account>().displayName).toBe('Theo');
  });

  it('refuses a time zone that does not exist with 400 naming timeZone', async () => {
    for (const timeZone of ['Mars/Olympus', 'europe/london', '', 'GMT+25']) {
      expectFieldErrors(await patchAccount({ timeZone }), ['timeZone']);
    }
    expect((await row()).timeZone).toBe('UTC');
  });

  it('refuses an invalid temperature unit or unit system with 400 naming it', async () => {
    expectFieldErrors(await patchAccount({ temperatureUnit: 'K' }), ['temperatureUnit']);
    expectFieldErrors(await patchAccount({ temperatureUnit: 'c' }), ['temperatureUnit']);
    expectFieldErrors(await patchAccount({ unitSystem: 'imperial' }), ['unitSystem']);
    const stored = await row();
    expect([stored.temperatureUnit, stored.unitSystem]).toEqual(['C', 'metric']);
  });

  it('refuses a blank or over-long display name with 400 naming displayName', async () => {
    expectFieldErrors(await patchAccount({ displayName: '   ' }), ['displayName']);
    expectFieldErrors(await patchAccount({ displayName: 'x'.repeat(81) }), ['displayName']);
    expect((await row()).displayName).toBe('Theo Park');
  });

  it('refuses unknown fields with 400 naming them, so nobody can change their own role or e-mail here', async () => {
    expectFieldErrors(await patchAccount({ role: 'admin' }), ['role']);
    expectFieldErrors(await patchAccount({ email: 'new@example.com', unitSystem: 'us' }), ['email']);
    const stored = await row();
    expect([stored.role, stored.email, stored.unitSystem]).toEqual(['baker', theo.email, 'metric']);
  });

  it('refuses null for a field with 400 naming it (the columns are NOT NULL)', async () => {
    const fields = ['displayName', 'timeZone', 'unitSystem', 'temperatureUnit'];
    const answers: Record<string, unknown> = {};
    for (const field of fields) {
      const res = await patchAccount({ [field]: null });
      answers[field] = res.statusCode === 400 ? detailFields(expectError(res, 400)) : res.statusCode;
    }
    expect(answers).toEqual(Object.fromEntries(fields.map((f) => [f, [f]])));
    expect(await row()).toMatchObject({ displayName: 'Theo Park', timeZone: 'UTC' });
  });
});
