import type { BakingClass, ClassListResponse, ClassMemberListResponse } from '@peakwise/shared';
import { CLASS_MAX_DAYS, JOIN_CODE_ALPHABET } from '@peakwise/shared';
import { beforeEach, describe, expect, it } from 'vitest';
import { ClassAccessRepository } from '../src/classroom/class-access.repository.js';
import {
  created,
  expectError,
  expectFieldErrors,
  makeAdmin,
  send,
  signUp,
  withSignedInBaker,
  type SignedUp,
} from './helpers.js';
import type { TestApp } from './test-app.js';

let t: TestApp;
let ines: SignedUp;
withSignedInBaker({ displayName: 'Ines Marlow' }, (app, baker) => {
  t = app;
  ines = baker;
});
beforeEach(async () => {
  await t.db.updateTable('account').set({ role: 'instructor' }).where('id', '=', ines.account.id).execute();
});

const WEEKEND_LEVAIN = {
  name: 'Weekend Levain',
  description: 'Six Saturdays at the Larkspur Community Kitchen: keep a culture, bake a country loaf.',
  startsOn: '2026-03-07',
  endsOn: '2026-04-11',
};

function createClass(cookie: string, body: object = WEEKEND_LEVAIN) {
  return send(t.app, 'POST', '/api/classes', cookie, body);
}

async function classCount(): Promise<number> {
  const row = await t.db
    .selectFrom('bakingClass')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** A student who joined `cls` by its join code. */
async function joinedStudent(cls: BakingClass, displayName = 'Theo Park'): Promise<SignedUp> {
  const student = await signUp(t.app, { displayName });
  await created(send(t.app, 'POST', '/api/class-join', student.cookie, { code: cls.joinCode }), 200);
  return student;
}

describe('POST /api/classes', () => {
  it('creates a class for an instructor, with a join code from the alphabet', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    expect(cls).toMatchObject({
      ...WEEKEND_LEVAIN,
      instructor: { id: ines.account.id, displayName: 'Ines Marlow' },
      role: 'instructor',
      memberCount: 0,
    });
    expect(cls.joinCode).toMatch(new RegExp(`^[${JOIN_CODE_ALPHABET}]{8}$`));
    const again = await created<BakingClass>(send(t.app, 'GET', `/api/classes/${cls.id}`, ines.cookie), 200);
    expect(again).toEqual(cls);
  });

  it('lets an admin create a class, and refuses a baker with 403 and a clear message', async () => {
    const admin = await signUp(t.app, { displayName: 'Admin' });
    await makeAdmin(t.db, admin.account.id);
    await created(createClass(admin.cookie));

    const baker = await signUp(t.app, { displayName: 'Dev Rowan' });
    const body = expectError(await createClass(baker.cookie), 403);
    expect(body.message).toMatch(/instructor/);
    expect(await classCount()).toBe(1);
  });

  it('answers 401 when signed out', async () => {
    expectError(await send(t.app, 'POST', '/api/classes', null, WEEKEND_LEVAIN), 401);
  });

  it('refuses bad input field by field and writes nothing', async () => {
    expectFieldErrors(await createClass(ines.cookie, {}), ['name', 'startsOn', 'endsOn']);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, name: '   ' }), ['name']);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, description: 'x'.repeat(2001) }), [
      'description',
    ]);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, startsOn: '2026-02-30' }), ['startsOn']);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, startsOn: '7/3/2026' }), ['startsOn']);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, endsOn: '2026-03-06' }), ['endsOn']);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, description: null }), ['description']);
    expectFieldErrors(await createClass(ines.cookie, { ...WEEKEND_LEVAIN, joinCode: 'ABCDEFGH' }), ['joinCode']);
    expect(await classCount()).toBe(0);
  });

  it(`allows ${CLASS_MAX_DAYS} days counting both ends, not one more`, async () => {
    // 2026-01-01 + 365 days = 2027-01-01: 366 calendar days with both ends counted.
    await created(createClass(ines.cookie, { name: 'A year of rye', startsOn: '2026-01-01', endsOn: '2027-01-01' }));
    const long = await createClass(ines.cookie, { name: 'Too long', startsOn: '2026-01-01', endsOn: '2027-01-02' });
    expect(expectFieldErrors(long, ['endsOn']).details?.[0]?.message).toMatch(String(CLASS_MAX_DAYS));
    // A one-day workshop starts and ends on the same day.
    await created(createClass(ines.cookie, { name: 'Levain in a day', startsOn: '2026-05-02', endsOn: '2026-05-02' }));
  });
});

describe('GET /api/classes', () => {
  it('lists classes taught and classes joined, each with the viewer’s role, paged', async () => {
    const levain = await created<BakingClass>(createClass(ines.cookie));
    const rye = await created<BakingClass>(
      createClass(ines.cookie, { name: 'Rye Basics', startsOn: '2026-06-06', endsOn: '2026-06-27' }),
    );
    const theo = await joinedStudent(levain);

    const mine = await created<ClassListResponse>(send(t.app, 'GET', '/api/classes', ines.cookie), 200);
    expect(mine.total).toBe(2);
    // Newest start first.
    expect(mine.items.map((c) => [c.name, c.role, c.memberCount])).toEqual([
      ['Rye Basics', 'instructor', 0],
      ['Weekend Levain', 'instructor', 1],
    ]);

    const page = await created<ClassListResponse>(
      send(t.app, 'GET', '/api/classes?limit=1&offset=1', ines.cookie),
      200,
    );
    expect(page).toMatchObject({ total: 2, limit: 1, offset: 1 });
    expect(page.items.map((c) => c.id)).toEqual([levain.id]);

    const theirs = await created<ClassListResponse>(send(t.app, 'GET', '/api/classes', theo.cookie), 200);
    expect(theirs.items.map((c) => [c.id, c.role, c.joinCode])).toEqual([[levain.id, 'student', null]]);
    expect(theirs.items.map((c) => c.id)).not.toContain(rye.id);

    expectFieldErrors(await send(t.app, 'GET', '/api/classes?limit=0', ines.cookie), ['limit']);
  });
});

describe('GET/PATCH/DELETE /api/classes/:classId', () => {
  it('answers 404 to another instructor and to a baker outside the class, 400 to a bad id', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const other = await signUp(t.app, { displayName: 'Other Instructor' });
    await t.db.updateTable('account').set({ role: 'instructor' }).where('id', '=', other.account.id).execute();
    for (const [method, url, body] of [
      ['GET', `/api/classes/${cls.id}`, undefined],
      ['PATCH', `/api/classes/${cls.id}`, { name: 'Mine now' }],
      ['DELETE', `/api/classes/${cls.id}`, undefined],
      ['GET', `/api/classes/${cls.id}/members`, undefined],
      ['POST', `/api/classes/${cls.id}/leave`, undefined],
    ] as const) {
      expectError(await send(t.app, method, url, other.cookie, body), 404);
    }
    expectFieldErrors(await send(t.app, 'GET', '/api/classes/not-a-uuid', ines.cookie), ['classId']);
    const still = await created<BakingClass>(send(t.app, 'GET', `/api/classes/${cls.id}`, ines.cookie), 200);
    expect(still.name).toBe('Weekend Levain');
  });

  it('lets a student member read the class but not change it (403)', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const theo = await joinedStudent(cls);
    const seen = await created<BakingClass>(send(t.app, 'GET', `/api/classes/${cls.id}`, theo.cookie), 200);
    expect(seen).toMatchObject({ role: 'student', joinCode: null, memberCount: 1 });
    expectError(await send(t.app, 'PATCH', `/api/classes/${cls.id}`, theo.cookie, { name: 'Theo’s class' }), 403);
    expectError(await send(t.app, 'DELETE', `/api/classes/${cls.id}`, theo.cookie), 403);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}/members`, theo.cookie), 403);
  });

  it('edits fields, checks a moved end against the stored one, and keeps the rest', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const renamed = await created<BakingClass>(
      send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { name: ' Weekend Levain II ', description: '' }),
      200,
    );
    expect(renamed).toMatchObject({ name: 'Weekend Levain II', description: '', startsOn: '2026-03-07' });
    expect(renamed.joinCode).toBe(cls.joinCode);

    const early = await send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { endsOn: '2026-03-01' });
    expectFieldErrors(early, ['endsOn']);
    const late = await send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { startsOn: '2026-05-01' });
    expectFieldErrors(late, ['startsOn']);
    expectFieldErrors(await send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { name: null }), ['name']);
    const stored = await created<BakingClass>(send(t.app, 'GET', `/api/classes/${cls.id}`, ines.cookie), 200);
    expect(stored).toMatchObject({ startsOn: '2026-03-07', endsOn: '2026-04-11', name: 'Weekend Levain II' });
  });

  it('rotates the join code (the old one stops working) and turns it off', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const rotated = await created<BakingClass>(
      send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { joinCode: true }),
      200,
    );
    expect(rotated.joinCode).toMatch(/^[A-Z2-9]{8}$/);
    expect(rotated.joinCode).not.toBe(cls.joinCode);
    const dev = await signUp(t.app, { displayName: 'Dev Rowan' });
    expectError(await send(t.app, 'POST', '/api/class-join', dev.cookie, { code: cls.joinCode }), 404);
    expectError(await send(t.app, 'GET', `/api/class-join/${cls.joinCode}`, dev.cookie), 404);
    await created(send(t.app, 'POST', '/api/class-join', dev.cookie, { code: rotated.joinCode }), 200);

    const off = await created<BakingClass>(
      send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { joinCode: false }),
      200,
    );
    expect(off.joinCode).toBeNull();
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    expectError(await send(t.app, 'POST', '/api/class-join', amara.cookie, { code: rotated.joinCode }), 404);
    expectFieldErrors(await send(t.app, 'PATCH', `/api/classes/${cls.id}`, ines.cookie, { joinCode: 'yes' }), [
      'joinCode',
    ]);
  });

  it('deletes a class with its memberships, and sharing ends', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const theo = await joinedStudent(cls);
    const access = t.app.get(ClassAccessRepository);
    expect(await access.instructsInClass(ines.account.id, cls.id, theo.account.id)).toBe(true);
    expect((await send(t.app, 'DELETE', `/api/classes/${cls.id}`, ines.cookie)).statusCode).toBe(204);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}`, ines.cookie), 404);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}`, theo.cookie), 404);
    expect(await access.instructsAnywhere(ines.account.id, theo.account.id)).toBe(false);
  });
});

describe('members and leaving', () => {
  it('shows the instructor current members with name, e-mail and joining time', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const theo = await joinedStudent(cls, 'Theo Park');
    const amara = await joinedStudent(cls, 'Amara Quist');
    const list = await created<ClassMemberListResponse>(
      send(t.app, 'GET', `/api/classes/${cls.id}/members`, ines.cookie),
      200,
    );
    expect(list.total).toBe(2);
    expect(list.items.map((m) => [m.id, m.displayName, m.email])).toEqual([
      [amara.account.id, 'Amara Quist', amara.email],
      [theo.account.id, 'Theo Park', theo.email],
    ]);
    expect(Date.parse(list.items[0]!.joinedAt)).not.toBeNaN();
  });

  it('a student leaves (204): sharing ends at once; joining again clears the leaving', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const theo = await joinedStudent(cls);
    const access = t.app.get(ClassAccessRepository);
    expect(await access.instructsInClass(ines.account.id, cls.id, theo.account.id)).toBe(true);

    const left = await send(t.app, 'POST', `/api/classes/${cls.id}/leave`, theo.cookie);
    expect(left.statusCode, left.body).toBe(204);
    expect(await access.instructsInClass(ines.account.id, cls.id, theo.account.id)).toBe(false);
    expect(await access.instructorsOf(theo.account.id)).toEqual([]);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}`, theo.cookie), 404);
    const members = await created<ClassMemberListResponse>(
      send(t.app, 'GET', `/api/classes/${cls.id}/members`, ines.cookie),
      200,
    );
    expect(members.total).toBe(0);
    const row = await t.db.selectFrom('classMember').selectAll().executeTakeFirstOrThrow();
    expect(row.leftAt).not.toBeNull();

    await created(send(t.app, 'POST', '/api/class-join', theo.cookie, { code: cls.joinCode }), 200);
    expect(await access.instructsInClass(ines.account.id, cls.id, theo.account.id)).toBe(true);
    const back = await t.db.selectFrom('classMember').selectAll().executeTakeFirstOrThrow();
    expect(back.leftAt).toBeNull();
  });

  it('the instructor cannot leave their own class', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    expectError(await send(t.app, 'POST', `/api/classes/${cls.id}/leave`, ines.cookie), 403);
  });

  it('the instructor removes a student: sharing ends; a second removal is 404', async () => {
    const cls = await created<BakingClass>(createClass(ines.cookie));
    const theo = await joinedStudent(cls);
    const amara = await joinedStudent(cls, 'Amara Quist');
    const url = `/api/classes/${cls.id}/members/${theo.account.id}`;
    expectError(await send(t.app, 'DELETE', `/api/classes/${cls.id}/members/${amara.account.id}`, theo.cookie), 403);
    expect((await send(t.app, 'DELETE', url, ines.cookie)).statusCode).toBe(204);
    const access = t.app.get(ClassAccessRepository);
    expect(await access.instructsInClass(ines.account.id, cls.id, theo.account.id)).toBe(false);
    expect(await access.instructsInClass(ines.account.id, cls.id, amara.account.id)).toBe(true);
    expectError(await send(t.app, 'DELETE', url, ines.cookie), 404);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}`, theo.cookie), 404);
    expectFieldErrors(await send(t.app, 'DELETE', `/api/classes/${cls.id}/members/nope`, ines.cookie), ['studentId']);
  });
});
