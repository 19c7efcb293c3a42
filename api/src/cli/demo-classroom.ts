// The demo class for the seed: Ines Marlow's "Weekend Levain" at the invented Larkspur Community
// Kitchen, six weeks around today, with Theo, Amara and Dev as current members. Dev's Pip is made
// to struggle over its last few feedings (slower to peak, a lower rise) so the roster, sorted by
// "sluggish", has a student to put first. Like the rest of the demo, none of this is measured.
import { randomInt } from 'node:crypto';
import { JOIN_CODE_ALPHABET, JOIN_CODE_LENGTH } from '@peakwise/shared';
import type { Database } from '../db/database.js';

export const DEMO_CLASS = {
  name: 'Weekend Levain',
  description:
    'Six Saturdays at the Larkspur Community Kitchen: keeping a starter, reading its rise, and baking ' +
    'a first open-crumb loaf. Log your feedings and rise checks between sessions; Ines reads them.',
  instructor: 'ines@larkspur-kitchen.example',
  students: ['theo@larkspur-kitchen.example', 'amara@larkspur-kitchen.example', 'dev@larkspur-kitchen.example'],
} as const;

/** The struggling culture, and its newest feedings made slower (× time to peak) and weaker (× rise). */
export const STRUGGLING_CULTURE = 'Pip';
const STRUGGLE: { slower: number; rise: number }[] = [
  { slower: 2.0, rise: 0.45 },
  { slower: 1.4, rise: 0.55 },
  { slower: 1.3, rise: 0.65 },
  { slower: 1.15, rise: 0.8 },
];

const DAY = 86_400_000;
const date = (ms: number) => new Date(ms).toISOString().slice(0, 10);

function joinCode(): string {
  return Array.from({ length: JOIN_CODE_LENGTH }, () => JOIN_CODE_ALPHABET[randomInt(JOIN_CODE_ALPHABET.length)]).join(
    '',
  );
}

/**
 * Stretches each of the culture's newest feedings' rise checks in time and flattens them in height,
 * so the model sees a culture taking longer to peak and rising less: what a tired starter looks like.
 */
async function makeStruggle(db: Database, cultureId: string, now: Date): Promise<void> {
  const feedings = await db
    .selectFrom('feeding')
    .select(['id', 'fedAt', 'initialHeightMm'])
    .where('cultureId', '=', cultureId)
    .orderBy('fedAt', 'desc')
    .limit(STRUGGLE.length)
    .execute();
  for (const [i, feeding] of feedings.entries()) {
    const { slower, rise } = STRUGGLE[i] ?? { slower: 1, rise: 1 };
    const h0 = feeding.initialHeightMm;
    if (h0 === null) continue;
    const checks = await db.deleteFrom('riseCheck').where('feedingId', '=', feeding.id).returningAll().execute();
    const fed = feeding.fedAt.getTime();
    const moved = checks
      .map(({ id: _id, ...c }) => ({
        ...c,
        takenAt: new Date(fed + (c.takenAt.getTime() - fed) * slower),
        heightMm: Math.round((h0 + (c.heightMm - h0) * rise) * 10) / 10,
      }))
      .filter((c) => c.takenAt <= now);
    if (moved.length) await db.insertInto('riseCheck').values(moved).execute();
  }
}

/** Creates the class once (a second run finds it and changes nothing); returns its id. */
export async function seedDemoClassroom(
  db: Database,
  accountIds: Map<string, string>,
  cultureIds: Map<string, string>,
  now: Date,
): Promise<string | null> {
  const instructorId = accountIds.get(DEMO_CLASS.instructor);
  if (!instructorId) return null;
  const existing = await db
    .selectFrom('bakingClass')
    .select('id')
    .where('instructorId', '=', instructorId)
    .where('name', '=', DEMO_CLASS.name)
    .executeTakeFirst();
  if (existing) return existing.id;
  const startsAt = now.getTime() - 21 * DAY;
  const row = await db
    .insertInto('bakingClass')
    .values({
      instructorId,
      name: DEMO_CLASS.name,
      description: DEMO_CLASS.description,
      startsOn: date(startsAt),
      endsOn: date(now.getTime() + 21 * DAY),
      joinCode: joinCode(),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  const members = DEMO_CLASS.students.flatMap((email) => {
    const accountId = accountIds.get(email);
    return accountId ? [{ classId: row.id, accountId, joinedAt: new Date(startsAt) }] : [];
  });
  if (members.length) await db.insertInto('classMember').values(members).execute();
  const struggling = cultureIds.get(STRUGGLING_CULTURE);
  if (struggling) await makeStruggle(db, struggling, now);
  return row.id;
}
