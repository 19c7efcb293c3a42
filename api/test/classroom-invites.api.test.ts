import {
  CLASS_INVITE_TTL_DAYS,
  CLASS_SHARING_TERMS,
  type BakingClass,
  type ClassInviteListResponse,
  type ClassJoinPreview,
  type CreateClassInvitesResponse,
} from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { ClassAccessRepository } from '../src/classroom/class-access.repository.js';
import type { FakeSmtp, StoredMail } from '../src/dev/fake-smtp.js';
import { MailService } from '../src/mail/mail.service.js';
import { created, expectError, expectFieldErrors, send, signUp, uniqueEmail, type SignedUp } from './helpers.js';
import { mailConfig, startTestMailbox } from './mail-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

let t: TestApp;
let mailbox: FakeSmtp;
let ines: SignedUp;
let cls: BakingClass;

beforeAll(async () => {
  mailbox = await startTestMailbox();
  t = await createTestApp(mailConfig(mailbox, 'http://bakery.test:8080'));
});
afterAll(async () => {
  await t.close();
  await mailbox.close();
});
beforeEach(async () => {
  await resetDatabase(t.db);
  mailbox.clear();
  ines = await signUp(t.app, { displayName: 'Ines Marlow' });
  await t.db.updateTable('account').set({ role: 'instructor' }).where('id', '=', ines.account.id).execute();
  cls = await created<BakingClass>(
    send(t.app, 'POST', '/api/classes', ines.cookie, {
      name: 'Weekend Levain',
      description: 'Six Saturdays at the Larkspur Community Kitchen.',
      startsOn: '2026-03-07',
      endsOn: '2026-04-11',
    }),
  );
});

function invite(emails: unknown, cookie = ines.cookie, classId = cls.id) {
  return send(t.app, 'POST', `/api/classes/${classId}/invites`, cookie, { emails });
}

/** The mail goes out after the answer, so wait for the `count`th (a deadline, not a measured time). */
async function mailsTo(address: string, count: number): Promise<StoredMail[]> {
  for (let i = 0; i < 100; i++) {
    // Oldest first.
    const found = mailbox
      .messages()
      .filter((m) => m.to.includes(address))
      .reverse();
    if (found.length >= count) return found;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`fewer than ${count} mails reached ${address}`);
}

async function mailTo(address: string): Promise<StoredMail> {
  return (await mailsTo(address, 1))[0]!;
}

function tokenIn(mail: StoredMail): string {
  const link = /http:\/\/bakery\.test:8080\/invites\/([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!link) throw new Error(`no invitation link in ${mail.text}`);
  return link[1]!;
}

/** Invites a fresh address, signs that address up and returns its account and mailed token. */
async function invitedStudent(displayName = 'Amara Quist'): Promise<{ student: SignedUp; token: string }> {
  const email = uniqueEmail('student');
  await created(invite([email]));
  const token = tokenIn(await mailTo(email));
  return { student: await signUp(t.app, { email, displayName }), token };
}

const preview = (token: string, cookie: string | null) => send(t.app, 'GET', `/api/class-invites/${token}`, cookie);
const accept = (token: string, cookie: string) => send(t.app, 'POST', `/api/class-invites/${token}/accept`, cookie);

async function inviteList(): Promise<ClassInviteListResponse> {
  return created<ClassInviteListResponse>(send(t.app, 'GET', `/api/classes/${cls.id}/invites`, ines.cookie), 200);
}

describe('POST /api/classes/:classId/invites', () => {
  it('lower-cases, collapses duplicates and mails each address one link in the instructor’s name', async () => {
    const amara = uniqueEmail('amara');
    const dev = uniqueEmail('dev');
    const res = await created<CreateClassInvitesResponse>(invite([amara.toUpperCase(), ` ${amara} `, dev]));
    expect(res.invites.map((i) => [i.email, i.status, i.acceptedAt])).toEqual([
      [amara, 'pending', null],
      [dev, 'pending', null],
    ]);
    const ttl = Date.parse(res.invites[0]!.expiresAt) - Date.parse(res.invites[0]!.createdAt);
    expect(ttl).toBe(CLASS_INVITE_TTL_DAYS * 24 * 3600_000);

    const mail = await mailTo(amara);
    await mailTo(dev);
    expect(mailbox.messages()).toHaveLength(2);
    expect(mail.subject).toContain('Ines Marlow');
    expect(mail.subject).toContain('Weekend Levain');
    for (const term of CLASS_SHARING_TERMS) expect(mail.text).toContain(term);
    const token = tokenIn(mail);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(mail.html).toContain(`http://bakery.test:8080/invites/${token}`);
    // The Message-ID comes from a stable key, so a resend would carry the same one.
    expect(mail.messageId).toBe(t.app.get(MailService).messageIdFor(`class-invite:${res.invites[0]!.id}`));
    // Only the hash is kept.
    const rows = await t.db.selectFrom('classInvite').select(['tokenHash']).execute();
    expect(rows.map((r) => r.tokenHash)).not.toContain(token);
    expect(JSON.stringify(rows)).not.toContain(token);
  });

  it('refuses bad lists by field, names the bad address, and writes and sends nothing', async () => {
    expectFieldErrors(await invite([]), ['emails']);
    expectFieldErrors(await invite('amara@example.com'), ['emails']);
    expectFieldErrors(await invite(Array.from({ length: 51 }, (_, i) => `baker${i}@example.com`)), ['emails']);
    const bad = expectFieldErrors(await invite(['amara@example.com', 'theo at example.com']), ['emails']);
    expect(bad.details?.[0]?.message).toContain('theo at example.com');
    expectFieldErrors(await send(t.app, 'POST', `/api/classes/${cls.id}/invites`, ines.cookie, {}), ['emails']);
    expect(await t.db.selectFrom('classInvite').selectAll().execute()).toEqual([]);
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(mailbox.messages().map((m) => [m.to, m.subject, m.date])).toEqual([]);
  });

  it('is the instructor’s alone: a student gets 403, another instructor 404', async () => {
    const theo = await signUp(t.app, { displayName: 'Theo Park' });
    await created(send(t.app, 'POST', '/api/class-join', theo.cookie, { code: cls.joinCode }), 200);
    expectError(await invite(['x@example.com'], theo.cookie), 403);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}/invites`, theo.cookie), 403);
    const other = await signUp(t.app, { displayName: 'Other Instructor' });
    await t.db.updateTable('account').set({ role: 'instructor' }).where('id', '=', other.account.id).execute();
    expectError(await invite(['x@example.com'], other.cookie), 404);
    expectError(await send(t.app, 'GET', `/api/classes/${cls.id}/invites`, other.cookie), 404);
    expect(await t.db.selectFrom('classInvite').selectAll().execute()).toEqual([]);
  });
});

describe('accepting an invitation', () => {
  it('the mailed link previews the class and works once', async () => {
    const { student, token } = await invitedStudent();
    const seen = await created<ClassJoinPreview>(preview(token, student.cookie), 200);
    expect(seen).toEqual({
      name: 'Weekend Levain',
      description: 'Six Saturdays at the Larkspur Community Kitchen.',
      startsOn: '2026-03-07',
      endsOn: '2026-04-11',
      instructorName: 'Ines Marlow',
      shares: [...CLASS_SHARING_TERMS],
      alreadyMember: false,
    });
    const access = t.app.get(ClassAccessRepository);
    expect(await access.instructsInClass(ines.account.id, cls.id, student.account.id)).toBe(false);

    const joined = await created<BakingClass>(accept(token, student.cookie), 200);
    expect(joined).toMatchObject({ id: cls.id, role: 'student', memberCount: 1, joinCode: null });
    expect(await access.instructsInClass(ines.account.id, cls.id, student.account.id)).toBe(true);

    expect(expectError(await accept(token, student.cookie), 410).message).toMatch(/already used/);
    expectError(await preview(token, student.cookie), 410);
    const [listed] = (await inviteList()).items;
    expect(listed).toMatchObject({ email: student.email, status: 'accepted' });
    expect(listed!.acceptedAt).not.toBeNull();
    // An accepted invitation is not revoked: the student is removed instead.
    expectError(await send(t.app, 'DELETE', `/api/classes/${cls.id}/invites/${listed!.id}`, ines.cookie), 409);
  });

  it('an expired link answers 410 and stays unspent', async () => {
    const { student, token } = await invitedStudent();
    await t.db
      .updateTable('classInvite')
      .set({ createdAt: new Date(Date.now() - 20 * 24 * 3600_000), expiresAt: new Date(Date.now() - 60_000) })
      .execute();
    expect(expectError(await preview(token, student.cookie), 410).message).toMatch(/expired/);
    expect(expectError(await accept(token, student.cookie), 410).message).toMatch(/expired/);
    expect((await inviteList()).items.map((i) => i.status)).toEqual(['expired']);
    expect(await t.db.selectFrom('classMember').selectAll().execute()).toEqual([]);
  });

  it('a revoked link answers 410; revoking twice is fine', async () => {
    const { student, token } = await invitedStudent();
    const [pending] = (await inviteList()).items;
    const url = `/api/classes/${cls.id}/invites/${pending!.id}`;
    expect((await send(t.app, 'DELETE', url, ines.cookie)).statusCode).toBe(204);
    expect((await send(t.app, 'DELETE', url, ines.cookie)).statusCode).toBe(204);
    expect(expectError(await accept(token, student.cookie), 410).message).toMatch(/withdrawn/);
    expect((await inviteList()).items.map((i) => i.status)).toEqual(['revoked']);
    expect(await t.db.selectFrom('classMember').selectAll().execute()).toEqual([]);
    expectError(await send(t.app, 'DELETE', `/api/classes/${cls.id}/invites/${student.account.id}`, ines.cookie), 404);
  });

  it('another signed-in account gets 403 and the link stays usable for the right one', async () => {
    const { student, token } = await invitedStudent();
    const dev = await signUp(t.app, { displayName: 'Dev Rowan' });
    const refused = expectError(await accept(token, dev.cookie), 403);
    expect(refused.message).toMatch(/This invitation was sent to another address/);
    expectError(await preview(token, dev.cookie), 403);
    expect((await inviteList()).items.map((i) => i.status)).toEqual(['pending']);
    await created(accept(token, student.cookie), 200);
  });

  it('of two accepts racing with one link, exactly one wins', async () => {
    const { student, token } = await invitedStudent();
    const results = await Promise.all([accept(token, student.cookie), accept(token, student.cookie)]);
    const statuses = results.map((r) => r.statusCode).sort();
    expect(statuses).toEqual([200, 410]);
    const members = await t.db.selectFrom('classMember').selectAll().execute();
    expect(members).toHaveLength(1);
  });

  it('a retried accept with the same Idempotency-Key gets the first answer, not 410', async () => {
    const { student, token } = await invitedStudent();
    const retry = () =>
      t.app.inject({
        method: 'POST',
        url: `/api/class-invites/${token}/accept`,
        headers: { cookie: student.cookie, 'idempotency-key': 'accept-once-1' },
      });
    const first = await created<BakingClass>(retry(), 200);
    const second = await retry();
    expect(second.statusCode, second.body).toBe(200);
    expect(second.headers['idempotent-replayed']).toBe('true');
    expect(second.json<BakingClass>().id).toBe(first.id);
  });

  it('unknown links are 404, signed out is 401, the instructor cannot join their own class', async () => {
    const { student } = await invitedStudent();
    expectError(await preview('A'.repeat(43), student.cookie), 404);
    expectError(await accept('not-a-token', student.cookie), 404);
    expectError(await preview('A'.repeat(43), null), 401);

    await created(invite([ines.email]));
    const own = tokenIn(await mailTo(ines.email));
    expect(expectError(await accept(own, ines.cookie), 403).message).toMatch(/teach/);
    expect((await inviteList()).items.find((i) => i.email === ines.email)?.status).toBe('pending');
  });

  it('a student who left joins again through a new invitation', async () => {
    const { student, token } = await invitedStudent();
    await created(accept(token, student.cookie), 200);
    expect((await send(t.app, 'POST', `/api/classes/${cls.id}/leave`, student.cookie)).statusCode).toBe(204);
    await created(invite([student.email]));
    const fresh = tokenIn((await mailsTo(student.email, 2))[1]!);
    expect(fresh).not.toBe(token);
    await created(accept(fresh, student.cookie), 200);
    const access = t.app.get(ClassAccessRepository);
    expect(await access.instructsInClass(ines.account.id, cls.id, student.account.id)).toBe(true);
  });
});

describe('joining by code', () => {
  it('previews and joins case-insensitively; joining twice changes nothing', async () => {
    const theo = await signUp(t.app, { displayName: 'Theo Park' });
    const code = cls.joinCode!;
    const seen = await created<ClassJoinPreview>(
      send(t.app, 'GET', `/api/class-join/${code.toLowerCase()}`, theo.cookie),
      200,
    );
    expect(seen).toMatchObject({ name: 'Weekend Levain', instructorName: 'Ines Marlow', alreadyMember: false });
    expect(seen.shares).toEqual([...CLASS_SHARING_TERMS]);

    const spaced = `${code.slice(0, 4).toLowerCase()} ${code.slice(4)}`;
    const joined = await created<BakingClass>(
      send(t.app, 'POST', '/api/class-join', theo.cookie, { code: spaced }),
      200,
    );
    expect(joined).toMatchObject({ id: cls.id, role: 'student', memberCount: 1 });
    const again = await created<BakingClass>(send(t.app, 'POST', '/api/class-join', theo.cookie, { code }), 200);
    expect(again.memberCount).toBe(1);
    const now = await created<ClassJoinPreview>(send(t.app, 'GET', `/api/class-join/${code}`, theo.cookie), 200);
    expect(now.alreadyMember).toBe(true);
  });

  it('refuses malformed codes by field, unknown ones with 404, and the instructor with 403', async () => {
    const theo = await signUp(t.app, { displayName: 'Theo Park' });
    expectFieldErrors(await send(t.app, 'POST', '/api/class-join', theo.cookie, { code: 'ABC' }), ['code']);
    expectFieldErrors(await send(t.app, 'POST', '/api/class-join', theo.cookie, { code: 'ABCDEFG0' }), ['code']);
    expectFieldErrors(await send(t.app, 'POST', '/api/class-join', theo.cookie, {}), ['code']);
    expectFieldErrors(await send(t.app, 'GET', '/api/class-join/O0O0O0O0', theo.cookie), ['code']);
    const unknown = cls.joinCode === 'ABCDEFGH' ? 'HGFEDCBA' : 'ABCDEFGH';
    expectError(await send(t.app, 'POST', '/api/class-join', theo.cookie, { code: unknown }), 404);
    expectError(await send(t.app, 'POST', '/api/class-join', ines.cookie, { code: cls.joinCode }), 403);
    expect(await t.db.selectFrom('classMember').selectAll().execute()).toEqual([]);
  });
});
