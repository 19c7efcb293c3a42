import {
  JOIN_CODE_ALPHABET,
  type ClassProgressResponse,
  type CultureSummary,
  type RosterResponse,
} from '@peakwise/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_CLASS, seedDemoClassroom } from '../src/cli/demo-classroom.js';
import { seedDemoLogbook } from '../src/cli/demo-logbook.js';
import { rosterCsvColumns } from '../src/class-logs/roster-csv.writer.js';
import { expectError, send, signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// The roster of the seeded demo class: the seed's own logbook and class, written once for the file
// (every test here only reads). Dev's Pip is the culture the seed makes struggle.

const STUDENTS = [
  ['theo@larkspur-kitchen.example', 'Theo Park'],
  ['amara@larkspur-kitchen.example', 'Amara Quist'],
  ['dev@larkspur-kitchen.example', 'Dev Rowan'],
] as const;

let t: TestApp;
let ines: SignedUp;
let olive: SignedUp;
let classId: string;
let accountIds: Map<string, string>;
let cultureIds: Map<string, string>;
let seededAt: Date;
beforeAll(async () => {
  t = await createTestApp();
  await resetDatabase(t.db);
  ines = await signUp(t.app, { email: DEMO_CLASS.instructor, displayName: 'Ines Marlow' });
  olive = await signUp(t.app, { displayName: 'Olive Brandt' });
  accountIds = new Map([[DEMO_CLASS.instructor, ines.account.id]]);
  for (const [email, displayName] of STUDENTS) {
    accountIds.set(email, (await signUp(t.app, { email, displayName })).account.id);
  }
  seededAt = new Date();
  cultureIds = (await seedDemoLogbook(t.db, accountIds, seededAt)).cultureIds;
  classId = (await seedDemoClassroom(t.db, accountIds, cultureIds, seededAt)) ?? '';
}, 120_000);
afterAll(() => t.close());

const get = (path: string, who: SignedUp = ines) => send(t.app, 'GET', `/api/classes/${classId}/${path}`, who.cookie);
const roster = async (query = '') => {
  const res = await get(`roster${query}`);
  expect(res.statusCode, res.body).toBe(200);
  return res.json<RosterResponse>();
};

describe('the demo class', () => {
  it('is Ines’s Weekend Levain, six weeks around today, with Theo, Amara and Dev as current members', async () => {
    const row = await t.db.selectFrom('bakingClass').selectAll().where('id', '=', classId).executeTakeFirstOrThrow();
    expect(row.name).toBe('Weekend Levain');
    expect(row.instructorId).toBe(ines.account.id);
    expect(new Date(row.startsOn).getTime()).toBeLessThan(seededAt.getTime());
    expect(new Date(row.endsOn).getTime()).toBeGreaterThan(seededAt.getTime());
    expect([...(row.joinCode ?? '')].every((c) => JOIN_CODE_ALPHABET.includes(c))).toBe(true);
    const members = await t.db.selectFrom('classMember').selectAll().where('classId', '=', classId).execute();
    expect(members.map((m) => m.accountId).sort()).toEqual(STUDENTS.map(([e]) => accountIds.get(e)).sort());
    expect(members.every((m) => m.leftAt === null)).toBe(true);
  });

  it('seeding again finds the class and changes nothing', async () => {
    const checks = async () => (await t.db.selectFrom('riseCheck').select('id').execute()).length;
    const before = await checks();
    expect(await seedDemoClassroom(t.db, accountIds, cultureIds, new Date())).toBe(classId);
    expect(await checks()).toBe(before);
    expect((await t.db.selectFrom('bakingClass').select('id').execute()).length).toBe(1);
  });
});

describe('GET /api/classes/:classId/roster', () => {
  it('puts the struggling culture first when sorted by sluggish (the default), the others healthy', async () => {
    const { items, total } = await roster();
    expect(total).toBe(3);
    expect(items[0]).toMatchObject({ studentName: 'Dev Rowan', cultureName: 'Pip', trend: 'slower' });
    expect(items[0]?.flags).toContain('sluggish');
    for (const row of items.slice(1)) expect(row.flags).toEqual([]);
    expect((await roster('?sort=sluggish&order=desc')).items.map((r) => r.cultureName)).toEqual(
      items.map((r) => r.cultureName),
    );
    expect((await roster('?sort=sluggish&order=asc')).items.at(-1)?.cultureName).toBe('Pip');
  });

  it('quotes the latest normalised time to peak (the chart’s last point) and the latest rise', async () => {
    const { series } = (await get('progress')).json<ClassProgressResponse>();
    for (const row of (await roster()).items) {
      const res = await get(`cultures/${row.cultureId}/summary`);
      const summary = res.json<CultureSummary>();
      const last = series.find((s) => s.cultureId === row.cultureId)?.points.at(-1);
      expect(row.hoursToPeakAtReference).toBeCloseTo(last!.hoursToPeakAtReference, 9);
      expect(row.lastFedAt).toBe(summary.lastFedAt);
    }
    // The seed flattens Pip's newest rises to under half their height gain; the others rise 2–2.8×.
    const pip = (await roster('?q=pip')).items[0];
    expect(pip?.riseMultiple).toBeLessThan(2);
    for (const row of (await roster('?q=a')).items.filter((r) => r.cultureName !== 'Pip')) {
      expect(row.riseMultiple).toBeGreaterThan(2);
    }
  });

  it('filters by flag and by part of a name, and pages', async () => {
    const sluggish = await roster('?flag=sluggish');
    expect(sluggish.items.map((r) => r.cultureName)).toEqual(['Pip']);
    expect(sluggish.total).toBe(1);
    expect((await roster('?flag=overdue')).total).toBe(0);
    expect((await roster('?q=COPPER')).items.map((r) => r.studentName)).toEqual(['Amara Quist']);
    expect((await roster('?q=theo')).items.map((r) => r.cultureName)).toEqual(['Bramble']);
    const page = await roster('?sort=student&limit=1&offset=1');
    expect(page).toMatchObject({ total: 3, limit: 1, offset: 1 });
    expect(page.items.map((r) => r.studentName)).toEqual(['Dev Rowan']);
  });

  it('is for the instructor only: another instructor gets 404 on the roster, the CSV and the chart', async () => {
    for (const path of ['roster', 'roster.csv', 'progress']) expectError(await get(path, olive), 404);
  });
});

describe('GET /api/classes/:classId/roster.csv', () => {
  it('has every row in the table’s order, with units in the headers', async () => {
    const res = await get('roster.csv');
    expect(res.statusCode).toBe(200);
    const lines = res.body.split('\r\n');
    expect(lines[0]).toBe(rosterCsvColumns('C').join(','));
    expect(lines[0]).toContain('1:1:1 and 24 °C (h)');
    expect(lines).toHaveLength(5); // header, three rows, the final line end
    expect(lines[1]?.startsWith('Dev Rowan,Pip,')).toBe(true);
    expect(lines[1]?.endsWith(',slower,sluggish')).toBe(true);
  });

  it('states the reference in °F for an instructor who reads Fahrenheit', async () => {
    await t.db.updateTable('account').set({ temperatureUnit: 'F' }).where('id', '=', ines.account.id).execute();
    try {
      const res = await get('roster.csv');
      expect(res.body.split('\r\n')[0]).toContain('1:1:1 and 75 °F (h)');
    } finally {
      await t.db.updateTable('account').set({ temperatureUnit: 'C' }).where('id', '=', ines.account.id).execute();
    }
  });
});

describe('GET /api/classes/:classId/progress', () => {
  it('gives each culture its completed feedings since the class began, oldest first', async () => {
    const res = await get('progress');
    expect(res.statusCode).toBe(200);
    const { series } = res.json<ClassProgressResponse>();
    expect(series.map((s) => s.cultureName)).toEqual(['Old Copper', 'Pip', 'Bramble']);
    const row = await t.db
      .selectFrom('bakingClass')
      .select('startsOn')
      .where('id', '=', classId)
      .executeTakeFirstOrThrow();
    for (const s of series) {
      const times = s.points.map((p) => Date.parse(p.fedAt));
      expect(times).toEqual([...times].sort((a, b) => a - b));
      expect(Math.min(...times)).toBeGreaterThanOrEqual(new Date(row.startsOn).getTime() - 86_400_000);
      for (const p of s.points) expect(p.hoursToPeakAtReference).toBeGreaterThan(0);
    }
    // Daily on the counter for three weeks; Pip weekly from the fridge.
    expect(series.find((s) => s.cultureName === 'Bramble')?.points.length).toBeGreaterThanOrEqual(18);
    const pip = series.find((s) => s.cultureName === 'Pip')?.points.map((p) => p.hoursToPeakAtReference) ?? [];
    expect(pip.length).toBeGreaterThanOrEqual(2);
    // The seed stretches each newer rise more, so the chart climbs across the class.
    expect(pip.at(-1)).toBeGreaterThan(1.25 * (pip[0] ?? Infinity));
  });
});
