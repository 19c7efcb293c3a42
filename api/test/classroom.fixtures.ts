import type { Database } from '../src/db/database.js';

// Classes and memberships written straight into the tables, for tests that need a class without
// going through the class routes (the roster, the drill-down, the access checks).

const DAY = 86_400_000;
const date = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export interface ClassFixture {
  name?: string;
  /** Defaults to three weeks ago → three weeks ahead. */
  startsOn?: string;
  endsOn?: string;
  joinCode?: string | null;
}

/** A class taught by `instructorId`; returns its id. */
export async function createClass(db: Database, instructorId: string, over: ClassFixture = {}): Promise<string> {
  const now = Date.now();
  const row = await db
    .insertInto('bakingClass')
    .values({
      instructorId,
      name: over.name ?? 'Weekend Levain',
      startsOn: over.startsOn ?? date(now - 21 * DAY),
      endsOn: over.endsOn ?? date(now + 21 * DAY),
      joinCode: over.joinCode ?? null,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Makes `accountId` a current member (joining again clears an earlier leave). */
export async function addMember(db: Database, classId: string, accountId: string): Promise<void> {
  await db
    .insertInto('classMember')
    .values({ classId, accountId })
    .onConflict((oc) => oc.columns(['classId', 'accountId']).doUpdateSet({ leftAt: null }))
    .execute();
}

/** The student leaves (or is removed): sharing ends with the next request. */
export async function leaveClass(db: Database, classId: string, accountId: string): Promise<void> {
  await db
    .updateTable('classMember')
    .set({ leftAt: new Date() })
    .where('classId', '=', classId)
    .where('accountId', '=', accountId)
    .execute();
}

/** Gives an account the instructor role (who may create classes through the routes). */
export async function makeInstructor(db: Database, accountId: string): Promise<void> {
  await db.updateTable('account').set({ role: 'instructor' }).where('id', '=', accountId).execute();
}
