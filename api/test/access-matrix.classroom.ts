import { createECDH, createHash, randomBytes } from 'node:crypto';
import type { BakingClass, ClassInvite, CommentView, CreateClassInvitesResponse } from '@peakwise/shared';
import { sql } from 'kysely';
import { INSTRUCTOR_OF, OWNER_OF, PARTIES, type Party } from './access-matrix.model.js';
import type { World } from './access-matrix.fixtures.js';
import { created, send, uniqueEmail } from './helpers.js';

// The classroom side of the matrix's world: baker A is a student of instructorA's class, baker B
// of instructorOther's, so each instructor has one student whose logs are shared with them and
// one whose logs are foreign. Routes that change who is in which class (join, leave, remove,
// delete) are followed by enrolInClasses(), which starts the classes over.

export interface ClassRef {
  id: string;
  joinCode: string;
}

const CLASS_NAMES: Record<Party, string> = { A: 'Weekend Levain', B: 'Rye on Thursdays' };
const DAY = 86_400_000;
const date = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** Deletes every class, then makes the two classes afresh and has each party join theirs by code. */
export async function enrolInClasses(world: World): Promise<void> {
  const { t } = world;
  await sql`DELETE FROM baking_class`.execute(t.db);
  for (const party of PARTIES) {
    const instructor = world.callers[INSTRUCTOR_OF[party]];
    const body = {
      name: CLASS_NAMES[party],
      startsOn: date(Date.now() - 7 * DAY),
      endsOn: date(Date.now() + 35 * DAY),
    };
    const cls = await created<BakingClass>(send(t.app, 'POST', '/api/classes', instructor.cookie, body));
    const student = world.callers[OWNER_OF[party]];
    await created(send(t.app, 'POST', '/api/class-join', student.cookie, { code: cls.joinCode }), 200);
    world.classes[party] = { id: cls.id, joinCode: cls.joinCode! };
  }
  world.sharedWith = { A: [INSTRUCTOR_OF.A], B: [INSTRUCTOR_OF.B] };
}

export interface ClassroomObjects {
  classId: string;
  joinCode: string;
  commentId: string;
  inviteId: string;
  inviteToken: string;
  pushDeviceId: string;
}

/** The party's class, a comment of theirs, invitations to their class, and a push device of theirs. */
export async function classroomObjects(
  world: World,
  party: Party,
  logbook: { feedingId: string; comment: string },
): Promise<ClassroomObjects> {
  const { t } = world;
  const owner = world.callers[OWNER_OF[party]];
  const instructor = world.callers[INSTRUCTOR_OF[party]];
  const cls = world.classes[party];

  const comment = await created<CommentView>(
    send(t.app, 'POST', `/api/feedings/${logbook.feedingId}/comments`, owner.cookie, { body: logbook.comment }),
  );
  const invites = await created<CreateClassInvitesResponse>(
    send(t.app, 'POST', `/api/classes/${cls.id}/invites`, instructor.cookie, { emails: [uniqueEmail('invitee')] }),
  );
  // A live link addressed to the owner, as the invitation mail would carry it (only its hash is stored).
  const inviteToken = randomBytes(32).toString('base64url');
  await t.db
    .insertInto('classInvite')
    .values({
      classId: cls.id,
      email: owner.email!,
      tokenHash: createHash('sha256').update(inviteToken).digest('hex'),
      expiresAt: new Date(Date.now() + DAY),
    })
    .execute();
  // In the database: through the API every new device re-plans all the account's alerts, which
  // grows with each fresh set (POST /api/push/subscriptions itself is in the matrix).
  const { endpoint, keys } = pushSubscription();
  const device = await t.db
    .insertInto('pushSubscription')
    .values({ accountId: world.accountIds[OWNER_OF[party]], endpoint, ...keys, label: 'Firefox on a phone' })
    .returning('id')
    .executeTakeFirstOrThrow();
  return {
    classId: cls.id,
    joinCode: cls.joinCode,
    commentId: comment.id,
    inviteId: (invites.invites[0] as ClassInvite).id,
    inviteToken,
    pushDeviceId: device.id,
  };
}

/**
 * A browser's subscription: a real P-256 key and auth secret, at a public https host that does not
 * exist (.invalid never resolves), so a test push fails fast instead of reaching anyone.
 */
export function pushSubscription() {
  const ecdh = createECDH('prime256v1');
  ecdh.generateKeys();
  return {
    endpoint: `https://push.peakwise.invalid/send/${randomBytes(12).toString('base64url')}`,
    keys: { p256dh: ecdh.getPublicKey().toString('base64url'), auth: randomBytes(16).toString('base64url') },
  };
}
