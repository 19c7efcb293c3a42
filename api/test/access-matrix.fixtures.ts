import { createHash, randomBytes, randomUUID } from 'node:crypto';
import type { BakePlanView, CheckedStep, Culture, DoughReading, Feeding, Formula, RiseCheck } from '@peakwise/shared';
import { ALERT_KINDS, type PhotoUploadResponse, type TemperatureReadingBatchResponse } from '@peakwise/shared';
import { COUNTRY_LOAF, planBody } from './bake-plan.fixtures.js';
import { image, multipart } from './photo.fixtures.js';
import { created, makeAdmin, send, signInCookie, signUp, type SignedUp } from './helpers.js';
import {
  PARTIES,
  ROLES,
  type Caller,
  type MarkerKind,
  type ObjectSet,
  OWNER_OF,
  type Party,
  type Person,
  type Relation,
  type RoleName,
} from './access-matrix.model.js';
import { classroomObjects, enrolInClasses, type ClassRef } from './access-matrix.classroom.js';
import type { TestApp } from './test-app.js';

// The people and objects of the matrix. Names follow the invented Larkspur class of PRODUCT.md:
// Theo (baker A) keeps "Bramble", Amara (baker B) keeps "Old Copper"; Ines teaches A's class.

const PEOPLE: Record<Person, string> = {
  bakerA: 'Theo Park',
  bakerB: 'Amara Quist',
  instructorA: 'Ines Marlow',
  instructorOther: 'Rowena Vale',
  admin: 'Hal Okafor',
};

const PARTY_DATA: Record<Party, { culture: string; formula: string; note: string; comment: string }> = {
  A: {
    culture: 'Bramble',
    formula: 'Theo’s country loaf',
    note: 'Theo: smelled of acetone',
    comment: 'Theo asks: is a 4 h peak too fast?',
  },
  B: {
    culture: 'Old Copper',
    formula: 'Amara’s rye tin',
    note: 'Amara: fed with whole rye',
    comment: 'Amara asks: why so flat today?',
  },
};

const HOUR = 3_600_000;
const iso = (ms: number) => new Date(ms).toISOString();

export interface World {
  t: TestApp;
  callers: Record<RoleName, Caller>;
  accountIds: Record<Person, string>;
  /** The instructors each party's logs are shared with, as the classroom fixtures made it so. */
  sharedWith: Record<Party, RoleName[]>;
  /** Every private string of each party made so far (ids of every fresh set too), by kind. */
  markers: Record<Party, Record<MarkerKind, Set<string>>>;
  /** An account outside the matrix, for the password-reset routes (they act on an e-mail, not a session). */
  spare: SignedUp;
  /** The class each party is a member of (access-matrix.classroom.ts). */
  classes: Record<Party, ClassRef>;
}

export function relationOf(world: World, role: RoleName, party: Party): Relation | null {
  if (role === 'anonymous') return null;
  if (role === OWNER_OF[party]) return 'owned';
  return world.sharedWith[party].includes(role) ? 'shared' : 'foreign';
}

/** Signs everyone up, makes the admin (in the database: nobody could yet) and the instructors (by the admin). */
export async function buildWorld(t: TestApp): Promise<World> {
  const accounts = {} as Record<Person, SignedUp>;
  for (const [role, displayName] of Object.entries(PEOPLE) as [Person, string][]) {
    accounts[role] = await signUp(t.app, { displayName, timeZone: 'Europe/London' });
  }
  await makeAdmin(t.db, accounts.admin.account.id);
  for (const role of ['instructorA', 'instructorOther'] as const) {
    await created(
      send(t.app, 'PATCH', `/api/admin/accounts/${accounts[role].account.id}/role`, accounts.admin.cookie, {
        role: 'instructor',
      }),
      200,
    );
  }
  // In-app only: the matrix is about who may ask what, and mail and push attempts (to nowhere)
  // would keep the alert worker busy beside it for the whole file.
  const channels = Object.fromEntries(ALERT_KINDS.map((kind) => [kind, { email: false, push: false }]));
  for (const a of Object.values(accounts)) {
    await created(send(t.app, 'PATCH', '/api/account/alert-preferences', a.cookie, { channels }), 200);
  }
  const callers = Object.fromEntries(
    ROLES.map((role): [RoleName, Caller] => {
      const a = role === 'anonymous' ? null : accounts[role];
      return [role, { role, cookie: a?.cookie ?? null, email: a?.email ?? null, password: a?.password ?? null }];
    }),
  ) as Record<RoleName, Caller>;
  const markers = Object.fromEntries(
    PARTIES.map((party) => {
      const a = accounts[OWNER_OF[party]];
      const { culture, formula, note, comment } = PARTY_DATA[party];
      const logbook = [culture, formula, note, comment];
      return [party, { account: new Set([a.account.id, a.email, a.displayName]), logbook: new Set(logbook) }];
    }),
  ) as World['markers'];
  const world: World = {
    t,
    callers,
    accountIds: Object.fromEntries(
      Object.entries(accounts).map(([role, a]) => [role, a.account.id]),
    ) as World['accountIds'],
    sharedWith: { A: [], B: [] },
    markers,
    spare: await signUp(t.app, { displayName: 'Wren Abbott' }),
    classes: { A: { id: '', joinCode: '' }, B: { id: '', joinCode: '' } },
  };
  await enrolInClasses(world);
  return world;
}

/** A second session of the caller's account, for routes that end or replace the session they run in. */
export async function throwawayCookie(world: World, caller: Caller): Promise<string | null> {
  if (!caller.email || !caller.password) return null;
  return signInCookie(world.t.app, caller.email, caller.password);
}

/** A usable password-reset token for the spare account, as the e-mailed link would carry. */
export async function mintResetToken(world: World): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await world.t.db
    .insertInto('accountToken')
    .values({
      accountId: world.spare.account.id,
      purpose: 'password-reset',
      tokenHash: createHash('sha256').update(token).digest('hex'),
      expiresAt: new Date(Date.now() + HOUR),
    })
    .execute();
  return token;
}

let jpeg: Promise<Buffer> | undefined;

/** A multipart body with one small JPEG, as the photo uploader sends it. */
export async function jarPhotoForm(): Promise<{ payload: Buffer; headers: Record<string, string> }> {
  jpeg ??= image('jpeg', 120, 90);
  return multipart([{ filename: 'jar.jpg', contentType: 'image/jpeg', data: await jpeg }]);
}

/** New objects for both parties (routes that write get their own, so no route depends on another's effects). */
export async function freshObjects(world: World): Promise<Record<Party, ObjectSet>> {
  const [a, b] = await Promise.all(PARTIES.map((party) => objectsOf(world, party)));
  return { A: a!, B: b! };
}

async function objectsOf(world: World, party: Party): Promise<ObjectSet> {
  const { t } = world;
  const owner = world.callers[OWNER_OF[party]];
  const accountId = world.accountIds[OWNER_OF[party]];
  const data = PARTY_DATA[party];
  const call = (method: 'POST', url: string, payload: unknown) => send(t.app, method, url, owner.cookie, payload);
  const now = Date.now();

  const culture = await created<Culture>(call('POST', '/api/cultures', { name: data.culture }));
  const feeding = await created<Feeding>(
    call('POST', `/api/cultures/${culture.id}/feedings`, {
      fedAt: iso(now - 3 * HOUR),
      starterG: 20,
      flourG: 100,
      waterG: 100,
      temperatureC: 24,
      initialHeightMm: 40,
      notes: data.note,
    }),
  );
  const check = await created<RiseCheck>(
    call('POST', `/api/feedings/${feeding.id}/rise-checks`, { takenAt: iso(now - 2 * HOUR), heightMm: 55 }),
  );
  const temperatures = await created<TemperatureReadingBatchResponse>(
    call('POST', `/api/feedings/${feeding.id}/temperatures`, {
      readings: [{ takenAt: iso(now - 2 * HOUR), temperatureC: 23.5 }],
    }),
  );
  const formula = await created<Formula>(call('POST', '/api/formulas', { ...COUNTRY_LOAF, name: data.formula }));
  const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id, { cultureId: culture.id })));
  const checked = await created<CheckedStep>(call('POST', `/api/plans/${plan.id}/steps/mix/done`, {}));
  const reading = await created<DoughReading>(
    call('POST', `/api/plans/${plan.id}/readings`, { takenAt: iso(Date.now() - 1000), temperatureC: 24 }),
  );
  // An alert already shown in the app; the scheduler's own would come due only hours from now.
  const alert = await t.db
    .insertInto('alert')
    .values({
      accountId,
      kind: 'feeding-due',
      subjectType: 'culture',
      cultureId: culture.id,
      feedingId: feeding.id,
      slotKey: `access-matrix:${randomUUID()}`,
      dueAt: new Date(now - HOUR),
      staleAt: new Date(now + HOUR),
      status: 'sent',
      sentAt: new Date(now - HOUR),
      title: `${data.culture} wants feeding`,
      body: `${data.culture} was last fed 3 hours ago.`,
      linkPath: `/cultures/${culture.id}`,
    })
    .returning('id')
    .executeTakeFirstOrThrow();

  const upload = await jarPhotoForm();
  const photos = await created<PhotoUploadResponse>(
    t.app.inject({
      method: 'POST',
      url: `/api/feedings/${feeding.id}/photos`,
      payload: upload.payload,
      headers: { cookie: owner.cookie!, ...upload.headers },
    }),
  );
  const photoId = photos.items[0]!.id;
  const extras = await classroomObjects(world, party, { feedingId: feeding.id, comment: data.comment });
  const ids = [check.id, temperatures.items[0]!.id, reading.id, alert.id, culture.id, feeding.id, formula.id, plan.id];
  ids.push(extras.commentId, extras.pushDeviceId, photoId);
  for (const id of ids) world.markers[party].logbook.add(id);
  const objects: ObjectSet = {
    party,
    via: 'own class',
    accountId,
    cultureId: culture.id,
    feedingId: feeding.id,
    riseCheckId: check.id,
    temperatureId: temperatures.items[0]!.id,
    formulaId: formula.id,
    planId: plan.id,
    checkedStepId: checked.stepId,
    planReadingId: reading.id,
    alertId: alert.id,
    photoId,
    ...extras,
  };
  return objects;
}
