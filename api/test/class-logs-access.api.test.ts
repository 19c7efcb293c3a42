import type { BakePlanView, Culture, RosterResponse } from '@peakwise/shared';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { caller, createFormula, cultureWithPeaks, mockClock, planBody } from './bake-plan.fixtures.js';
import { addMember, createClass, leaveClass, makeInstructor } from './classroom.fixtures.js';
import { created, expectError, send, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Who may read a student's logs through a class: its instructor, while the student is a current
// member. Classes and memberships are written straight into the tables (classroom.fixtures.ts).

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());
afterEach(() => vi.restoreAllMocks());

let ines: SignedUp; // teaches the class
let olive: SignedUp; // teaches another class
let theo: SignedUp; // student of Ines's class
let stranger: SignedUp; // in no class
let classId: string;
let ids: { culture: string; feeding: string; plan: string; strangerCulture: string };

beforeEach(async () => {
  await resetDatabase(t.db);
  mockClock(t);
  ines = await signUp(t.app, { displayName: 'Ines Marlow' });
  olive = await signUp(t.app, { displayName: 'Olive Brandt' });
  theo = await signUp(t.app, { displayName: 'Theo Park' });
  stranger = await signUp(t.app, { displayName: 'Sam Field' });
  for (const who of [ines, olive]) await makeInstructor(t.db, who.account.id);
  classId = await createClass(t.db, ines.account.id);
  await addMember(t.db, classId, theo.account.id);
  const other = await createClass(t.db, olive.account.id, { name: 'Rye Basics' });
  await addMember(t.db, other, stranger.account.id);
  const call = caller(t, () => theo);
  const { culture, feedings } = await cultureWithPeaks(call);
  const formula = await createFormula(call);
  const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id, { cultureId: culture.id })));
  const strangerCulture = await created<Culture>(
    send(t.app, 'POST', '/api/cultures', stranger.cookie, { name: 'Rye' }),
  );
  ids = { culture: culture.id, feeding: feedings[0]?.id ?? '', plan: plan.id, strangerCulture: strangerCulture.id };
});

/** Each drill-down route and the owner's own route it mirrors. */
const ROUTES = () => [
  [`students/${theo.account.id}/cultures`, '/api/cultures'],
  [`students/${theo.account.id}/plans`, '/api/plans'],
  [`cultures/${ids.culture}`, `/api/cultures/${ids.culture}`],
  [`cultures/${ids.culture}/summary`, `/api/cultures/${ids.culture}/summary`],
  [`cultures/${ids.culture}/feedings`, `/api/cultures/${ids.culture}/feedings`],
  [`feedings/${ids.feeding}`, `/api/feedings/${ids.feeding}`],
  [`feedings/${ids.feeding}/rise-checks`, `/api/feedings/${ids.feeding}/rise-checks`],
  [`plans/${ids.plan}`, `/api/plans/${ids.plan}`],
];

const get = (who: SignedUp, path: string) => send(t.app, 'GET', `/api/classes/${classId}/${path}`, who.cookie);

describe('drill-down into a student’s logs', () => {
  it('shows the instructor exactly what the owner sees on their own routes', async () => {
    for (const [path, own] of ROUTES()) {
      const mine = await send(t.app, 'GET', own ?? '', theo.cookie);
      const res = await get(ines, path ?? '');
      expect(res.statusCode, `${path}: ${res.body}`).toBe(200);
      expect(res.json(), path).toEqual(mine.json());
    }
  });

  it('answers 404 to another class’s instructor and to a baker in no class with Ines', async () => {
    for (const [path] of ROUTES()) {
      expectError(await get(olive, path ?? ''), 404);
      expectError(await get(stranger, path ?? ''), 404);
    }
  });

  it('answers 403 to the student, who knows the class but is not its instructor', async () => {
    for (const [path] of ROUTES()) expectError(await get(theo, path ?? ''), 403);
    for (const path of ['roster', 'roster.csv', 'progress']) expectError(await get(theo, path), 403);
  });

  it('answers 404 for logs of someone who is not a member of this class', async () => {
    expectError(await get(ines, `cultures/${ids.strangerCulture}`), 404);
    expectError(await get(ines, `cultures/${ids.strangerCulture}/summary`), 404);
    expectError(await get(ines, `students/${stranger.account.id}/cultures`), 404);
    // Ines's own id is not a student of her class either.
    expectError(await get(ines, `students/${ines.account.id}/plans`), 404);
  });

  it('stops sharing the moment the student leaves', async () => {
    await leaveClass(t.db, classId, theo.account.id);
    for (const [path] of ROUTES()) expectError(await get(ines, path ?? ''), 404);
    const roster = await get(ines, 'roster');
    expect(roster.json<RosterResponse>().items).toEqual([]);
    // Joining again shares again.
    await addMember(t.db, classId, theo.account.id);
    expect((await get(ines, `cultures/${ids.culture}`)).statusCode).toBe(200);
  });

  it('has no write routes', async () => {
    const res = await send(t.app, 'PATCH', `/api/classes/${classId}/cultures/${ids.culture}`, ines.cookie, {
      name: 'Renamed',
    });
    expect(res.statusCode).toBe(404);
    const own = await send(t.app, 'GET', `/api/cultures/${ids.culture}`, theo.cookie);
    expect(own.json<Culture>().name).toBe('Bramble');
  });

  it('answers 404 for a class that does not exist and 400 for an id that is not one', async () => {
    const res = await send(t.app, 'GET', `/api/classes/${ids.culture}/roster`, ines.cookie);
    expectError(res, 404);
    const bad = expectError(await send(t.app, 'GET', '/api/classes/nope/roster', ines.cookie), 400);
    expect(bad.details?.map((d) => d.field)).toEqual(['classId']);
  });
});

describe('roster of a small class', () => {
  it('gives a member without a culture one no-culture row', async () => {
    await addMember(t.db, classId, stranger.account.id);
    const res = await get(ines, 'roster?sort=student');
    const rows = res.json<RosterResponse>().items;
    expect(rows.map((r) => [r.studentName, r.cultureName])).toEqual([
      ['Sam Field', 'Rye'],
      ['Theo Park', 'Bramble'],
    ]);
    await send(t.app, 'PATCH', `/api/cultures/${ids.strangerCulture}`, stranger.cookie, { archived: true });
    const after = (await get(ines, 'roster?flag=no-culture')).json<RosterResponse>();
    expect(after.items).toHaveLength(1);
    expect(after.items[0]).toMatchObject({ studentName: 'Sam Field', cultureId: null, flags: ['no-culture'] });
  });

  it('flags a culture fed more than a day ago on the counter, with no rise checks since', async () => {
    await addMember(t.db, classId, stranger.account.id);
    const fedAt = new Date(Date.now() - 30 * 3_600_000).toISOString();
    await created(
      send(t.app, 'POST', `/api/cultures/${ids.strangerCulture}/feedings`, stranger.cookie, {
        fedAt,
        starterG: 20,
        flourG: 40,
        waterG: 40,
      }),
    );
    const rows = (await get(ines, 'roster?sort=flags')).json<RosterResponse>().items;
    expect(rows[0]).toMatchObject({ studentName: 'Sam Field', lastFedAt: fedAt, flags: ['overdue', 'no-rise-checks'] });
    expect(rows[0]?.hoursSinceFed).toBeGreaterThan(30);
    // Theo fed his two days and three days ago: overdue too, but his feedings have rise checks.
    expect(rows[1]).toMatchObject({ studentName: 'Theo Park', flags: ['overdue'] });
  });

  it('escapes a culture name that a spreadsheet would run as a formula in the CSV', async () => {
    await send(t.app, 'PATCH', `/api/cultures/${ids.culture}`, theo.cookie, { name: '=HYPERLINK("x")' });
    const res = await get(ines, 'roster.csv');
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="Weekend-Levain-roster.csv"');
    const [, row] = res.body.split('\r\n');
    expect(row?.startsWith('Theo Park,"\'=HYPERLINK(""x"")",')).toBe(true);
  });

  it('refuses an unknown sort or flag, naming the parameter', async () => {
    const res = expectError(await get(ines, 'roster?sort=speed&flag=mouldy'), 400);
    expect(res.details?.map((d) => d.field).sort()).toEqual(['flag', 'sort']);
  });
});
