import type { Alert, AlertListResponse, CommentView } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { FakeSmtp } from '../src/dev/fake-smtp.js';
import { addClass, callAs, commentWorld, leaveClass, type Call, type CommentWorld } from './comment.fixtures.js';
import { created, type SignedUp } from './helpers.js';
import { mailConfig, startTestMailbox } from './mail-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// The alert a new comment gives the other side of the thread. Real time, real queue: the worker
// polls every 0.5 s, and the tests wait for it by polling the Alerts list (never a fixed sleep).

let t: TestApp;
let mailbox: FakeSmtp;
let call: Call;
let w: CommentWorld;
beforeAll(async () => {
  mailbox = await startTestMailbox();
  t = await createTestApp({ alertPollingSeconds: 0.5, ...mailConfig(mailbox) });
  call = callAs(t);
});
afterAll(async () => {
  await t.close();
  await mailbox.close();
});
beforeEach(async () => {
  await resetDatabase(t.db);
  mailbox.clear();
  w = await commentWorld(t);
});

const feedingThread = () => `/api/feedings/${w.feeding.id}/comments`;
const planThread = () => `/api/plans/${w.plan.id}/comments`;
const post = (url: string, as: SignedUp, body: string) => created<CommentView>(call('POST', url, as, { body }));

async function commentAlerts(as: SignedUp): Promise<Alert[]> {
  const list = await created<AlertListResponse>(call('GET', '/api/alerts', as), 200);
  return list.items.filter((a) => a.kind === 'comment');
}

/** Polls `as`'s Alerts list until it shows `count` comment alerts, or 15 s pass. */
async function waitForCommentAlerts(as: SignedUp, count: number): Promise<Alert[]> {
  const until = Date.now() + 15_000;
  for (;;) {
    const items = await commentAlerts(as);
    if (items.length >= count || Date.now() > until) return items;
    await new Promise((r) => setTimeout(r, 250));
  }
}

async function waitForMail(to: string, subject: string) {
  const until = Date.now() + 15_000;
  const mine = () => mailbox.messages().filter((m) => m.to.includes(to) && m.subject === subject);
  while (mine().length === 0 && Date.now() < until) await new Promise((r) => setTimeout(r, 250));
  return mine();
}

/** Every delivery of the comment alerts, sent or not: the worker has nothing left once all are sent. */
const commentDeliveries = () =>
  t.db
    .selectFrom('alertDelivery as d')
    .innerJoin('alert as a', 'a.id', 'd.alertId')
    .select(['a.accountId', 'd.channel', 'd.sentAt', 'd.droppedAt'])
    .where('a.kind', '=', 'comment')
    .execute();

describe('the instructor comments: the owner hears of it', () => {
  it('exactly one in-app alert leading to the feeding, and one e-mail', async () => {
    const comment = await post(feedingThread(), w.ines, 'Lovely dome on Bramble. Try a 1:3:3 feed before the weekend.');
    const [alert, ...more] = await waitForCommentAlerts(w.theo, 1);
    expect(more).toEqual([]);
    expect(alert).toMatchObject({
      kind: 'comment',
      subjectType: 'culture',
      subjectId: w.culture.id,
      title: 'Ines Marlow commented on your feeding of Bramble',
      body: comment.body,
      linkPath: `/feedings/${w.feeding.id}`,
      readAt: null,
    });

    const mails = await waitForMail(w.theo.email, 'Ines Marlow commented on your feeding of Bramble');
    expect(mails).toHaveLength(1);
    expect(mails[0]!.text).toContain(`/feedings/${w.feeding.id}`);
    // The writer is not alerted about their own comment.
    expect(await commentAlerts(w.ines)).toEqual([]);
    const rows = await commentDeliveries();
    // No push: Theo has turned it on for no device (push.api.test.ts covers a device).
    expect(rows.map((r) => [r.accountId, r.channel]).sort()).toEqual(
      [
        [w.theo.account.id, 'email'],
        [w.theo.account.id, 'in-app'],
      ].sort(),
    );
    expect(rows.every((r) => r.sentAt !== null)).toBe(true);
  });

  it('on a bake, the alert leads to the Bench; with e-mail off for comments it comes in the app only', async () => {
    await created(
      call('PATCH', '/api/account/alert-preferences', w.theo, { channels: { comment: { email: false, push: false } } }),
      200,
    );
    await post(planThread(), w.ines, 'Shape tighter next time.');
    const [alert] = await waitForCommentAlerts(w.theo, 1);
    expect(alert).toMatchObject({
      subjectType: 'bake-plan',
      subjectId: w.plan.id,
      title: `Ines Marlow commented on your ${w.plan.name} bake`,
      linkPath: `/bench/${w.plan.id}`,
    });
    // Only the in-app channel was ever planned, so no e-mail can follow.
    expect((await commentDeliveries()).map((r) => r.channel)).toEqual(['in-app']);
    expect(mailbox.messages().filter((m) => m.to.includes(w.theo.email))).toEqual([]);
  });

  it('a long comment shows only its start in the alert', async () => {
    const long = `Bramble looks good. ${'Keep the jar at 24 to 26 °C and feed at 1:2:2. '.repeat(20)}`.trim();
    await post(feedingThread(), w.ines, long);
    const [alert] = await waitForCommentAlerts(w.theo, 1);
    expect([...alert!.body].length).toBeLessThanOrEqual(140);
    expect(alert!.body.endsWith('…')).toBe(true);
    expect(long.startsWith(alert!.body.slice(0, -1))).toBe(true);
  });
});

describe('the owner comments: the instructors hear of it', () => {
  it('each instructor who may read it gets one alert leading to the class page; nobody else does', async () => {
    // Olwen also teaches Theo now, in her own class; Amara's classmates and the owner get nothing.
    await addClass(t.db, w.olwen.account.id, [w.theo.account.id], 'Weekday Rye');
    const olwenClass = await t.db
      .selectFrom('bakingClass')
      .select('id')
      .where('name', '=', 'Weekday Rye')
      .executeTakeFirstOrThrow();
    await post(planThread(), w.theo, 'My crumb was tight. Underproofed?');

    const [toInes] = await waitForCommentAlerts(w.ines, 1);
    const [toOlwen] = await waitForCommentAlerts(w.olwen, 1);
    expect(toInes).toMatchObject({
      title: `Theo Park commented on their ${w.plan.name} bake`,
      linkPath: `/classes/${w.classId}/plans/${w.plan.id}`,
    });
    expect(toOlwen!.linkPath).toBe(`/classes/${olwenClass.id}/plans/${w.plan.id}`);
    expect(await commentAlerts(w.theo)).toEqual([]);
    expect(await commentAlerts(w.amara)).toEqual([]);
    expect(new Set((await commentDeliveries()).map((r) => r.accountId))).toEqual(
      new Set([w.ines.account.id, w.olwen.account.id]),
    );
  });

  it('on a feeding, the instructor is led to the class feeding page and e-mailed', async () => {
    await post(feedingThread(), w.theo, 'It smells of nail polish today.');
    const [alert] = await waitForCommentAlerts(w.ines, 1);
    expect(alert).toMatchObject({
      title: 'Theo Park commented on their feeding of Bramble',
      linkPath: `/classes/${w.classId}/feedings/${w.feeding.id}`,
    });
    expect(await waitForMail(w.ines.email, 'Theo Park commented on their feeding of Bramble')).toHaveLength(1);
  });

  it('after the student has left, their comments alert nobody', async () => {
    await leaveClass(t.db, w.classId, w.theo.account.id);
    await post(feedingThread(), w.theo, 'A note to myself now.');
    // Nothing was recorded, so the worker has nothing to deliver to anyone.
    expect(await commentDeliveries()).toEqual([]);
    expect(await t.db.selectFrom('alert').select('id').where('kind', '=', 'comment').execute()).toEqual([]);
  });
});

describe('deleting a comment', () => {
  it('takes its alert with it', async () => {
    const comment = await post(feedingThread(), w.ines, 'Oops, wrong student.');
    const before = await t.db.selectFrom('alert').select('id').where('commentId', '=', comment.id).execute();
    expect(before).toHaveLength(1);
    expect((await call('DELETE', `/api/comments/${comment.id}`, w.ines)).statusCode).toBe(204);
    expect(await t.db.selectFrom('alert').select('id').where('kind', '=', 'comment').execute()).toEqual([]);
    expect(await commentDeliveries()).toEqual([]);
    expect(await commentAlerts(w.theo)).toEqual([]);
  });

  it('a retried POST alerts once', async () => {
    const headers = { 'idempotency-key': 'comment-alert-retry' };
    for (let i = 0; i < 2; i++) {
      expect((await call('POST', feedingThread(), w.ines, { body: 'Once' }, headers)).statusCode).toBe(201);
    }
    expect(await waitForCommentAlerts(w.theo, 1)).toHaveLength(1);
    expect(await t.db.selectFrom('alert').select('id').where('kind', '=', 'comment').execute()).toHaveLength(1);
  });
});
