import type { BakePlanView, Culture, Feeding } from '@peakwise/shared';
import type { Database } from '../src/db/database.js';
import { caller, createFormula, planBody } from './bake-plan.fixtures.js';
import { created, freshKey, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// Shared by the comment API tests: the Larkspur class "Weekend Levain" (instructor Ines Marlow;
// students Theo Park and Amara Quist), written straight into the tables because the class routes
// are another part of the work. Theo owns a culture Bramble with one feeding, and one bake plan.

export interface CommentWorld {
  theo: SignedUp;
  amara: SignedUp;
  ines: SignedUp;
  /** Teaches another class, which Amara is in and Theo is not. */
  olwen: SignedUp;
  classId: string;
  otherClassId: string;
  culture: Culture;
  feeding: Feeding;
  plan: BakePlanView;
}

export async function addClass(db: Database, instructorId: string, studentIds: string[], name: string) {
  await db.updateTable('account').set({ role: 'instructor' }).where('id', '=', instructorId).execute();
  const { id } = await db
    .insertInto('bakingClass')
    .values({ instructorId, name, startsOn: '2026-11-01', endsOn: '2026-12-20' })
    .returning('id')
    .executeTakeFirstOrThrow();
  if (studentIds.length > 0) {
    await db
      .insertInto('classMember')
      .values(studentIds.map((accountId) => ({ classId: id, accountId })))
      .execute();
  }
  return id;
}

/** What leaving (or being removed) writes: the membership row stays, with left_at set. */
export async function leaveClass(db: Database, classId: string, studentId: string): Promise<void> {
  await db
    .updateTable('classMember')
    .set({ leftAt: new Date() })
    .where('classId', '=', classId)
    .where('accountId', '=', studentId)
    .execute();
}

export async function commentWorld(t: TestApp): Promise<CommentWorld> {
  const [theo, amara, ines, olwen] = await Promise.all([
    signUp(t.app, { displayName: 'Theo Park', timeZone: 'UTC' }),
    signUp(t.app, { displayName: 'Amara Quist', timeZone: 'UTC' }),
    signUp(t.app, { displayName: 'Ines Marlow', timeZone: 'UTC' }),
    signUp(t.app, { displayName: 'Olwen Fairley', timeZone: 'UTC' }),
  ]);
  const classId = await addClass(t.db, ines.account.id, [theo.account.id, amara.account.id], 'Weekend Levain');
  const otherClassId = await addClass(t.db, olwen.account.id, [amara.account.id], 'Rye Basics');
  const call = caller(t, () => theo);
  const culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }));
  const feeding = await created<Feeding>(
    call('POST', `/api/cultures/${culture.id}/feedings`, { starterG: 20, flourG: 40, waterG: 40, temperatureC: 24 }),
  );
  const formula = await createFormula(call);
  const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id)));
  return { theo, amara, ines, olwen, classId, otherClassId, culture, feeding, plan };
}

export type Call = (
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE',
  url: string,
  as: SignedUp,
  payload?: unknown,
  headers?: Record<string, string>,
) => Promise<InjectResponse>;

export function callAs(t: TestApp): Call {
  return (method, url, as, payload, headers = {}) =>
    t.app.inject({
      method,
      url,
      payload: payload as never,
      // Writes carry a fresh key like the web client's; a test's own key wins.
      headers: { cookie: as.cookie, ...(method === 'GET' ? {} : freshKey()), ...headers },
    });
}
