import type { Alert, AlertListResponse, Culture, CultureSummary, Feeding } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { AlertRepository } from '../src/alert/alert.repository.js';
import { AlertWorker } from '../src/alert/alert.worker.js';
import type { FakeSmtp } from '../src/dev/fake-smtp.js';
import { expectError, expectFieldErrors, send, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { mailConfig, startTestMailbox } from './mail-fixture.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Real time, real queue: the worker polls every 0.5 s. A lead of 240 min puts the culture-ready
// alert of a feeding logged a little while ago at "now", so it comes due at once; a lead of 0
// keeps it hours ahead (pending), to watch it move.

let t: TestApp;
let mailbox: FakeSmtp;
beforeAll(async () => {
  mailbox = await startTestMailbox();
  t = await createTestApp({ alertPollingSeconds: 0.5, ...mailConfig(mailbox) });
});
afterAll(async () => {
  await t.close();
  await mailbox.close();
});

let theo: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  mailbox.clear();
  theo = await signUp(t.app, { displayName: 'Theo Park', timeZone: 'UTC' });
});

const HOUR = 3_600_000;
const ago = (hours: number) => new Date(Date.now() - hours * HOUR).toISOString();

function call(
  method: 'GET' | 'POST' | 'PATCH' | 'DELETE',
  url: string,
  payload?: unknown,
  as = theo,
): Promise<InjectResponse> {
  return send(t.app, method, url, as.cookie, payload);
}

async function ok<T>(res: Promise<InjectResponse>, status = 200): Promise<T> {
  const r = await res;
  expect(r.statusCode, r.body).toBe(status);
  return r.json<T>();
}

const setPrefs = (body: object, as = theo) => ok(call('PATCH', '/api/account/alert-preferences', body, as));

async function fedCulture(hoursAgo: number, as = theo): Promise<{ culture: Culture; feeding: Feeding }> {
  const culture = await ok<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }, as), 201);
  const feeding = await ok<Feeding>(
    call(
      'POST',
      `/api/cultures/${culture.id}/feedings`,
      { starterG: 20, flourG: 40, waterG: 40, temperatureC: 24, fedAt: ago(hoursAgo) },
      as,
    ),
    201,
  );
  return { culture, feeding };
}

/** Polls the Alerts list until it holds `count` items or the time runs out (then answers what it saw). */
async function waitForAlerts(count: number, as = theo, timeoutMs = 15_000): Promise<Alert[]> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const list = await ok<AlertListResponse>(call('GET', '/api/alerts', undefined, as));
    if (list.items.length >= count || Date.now() > until) return list.items;
    await new Promise((r) => setTimeout(r, 250));
  }
}

const alertRows = (kind: string) =>
  t.db.selectFrom('alert').selectAll().where('kind', '=', kind).orderBy('createdAt').execute();

describe('scheduling and in-app delivery', () => {
  it('a feeding whose ready window starts soon yields exactly one in-app alert and one e-mail', async () => {
    await setPrefs({ leadMinutes: 240 });
    const { culture } = await fedCulture(2);
    // Precondition: the forecast's window starts within the lead and has not ended yet.
    const s = await ok<CultureSummary>(call('GET', `/api/cultures/${culture.id}/summary`));
    expect(Date.parse(s.forecast!.low) - 240 * 60_000).toBeLessThanOrEqual(Date.now());
    expect(Date.parse(s.forecast!.high)).toBeGreaterThan(Date.now());

    const items = await waitForAlerts(1);
    expect(items).toHaveLength(1);
    expect(items[0]).toMatchObject({
      kind: 'culture-ready',
      subjectType: 'culture',
      subjectId: culture.id,
      linkPath: `/cultures/${culture.id}`,
      readAt: null,
    });
    expect(await ok(call('GET', '/api/alerts/unread-count'))).toEqual({ unread: 1 });

    // The e-mail arrives once, with a Message-ID from the alert's slot and a link to the settings.
    const until = Date.now() + 15_000;
    while (mailbox.messages().length === 0 && Date.now() < until) await new Promise((r) => setTimeout(r, 250));
    const mails = mailbox.messages();
    expect(mails).toHaveLength(1);
    expect(mails[0]).toMatchObject({ to: [theo.email], subject: 'Bramble will be ready soon' });
    expect(mails[0]!.text).toContain('/account/alerts');
    expect(mails[0]!.text).toContain('(UTC)');

    // Refreshing again (another feeding edit) neither duplicates nor re-sends it.
    const deliveries = await t.db.selectFrom('alertDelivery').selectAll().where('sentAt', 'is not', null).execute();
    expect(deliveries.map((d) => d.channel).sort()).toEqual(['email', 'in-app']);
    expect(await alertRows('culture-ready')).toHaveLength(1);
  });

  it('a change that moves the prediction moves the pending alert: same row, new time, no duplicate', async () => {
    await setPrefs({ leadMinutes: 0 });
    const { feeding } = await fedCulture(0.5);
    const [before] = await alertRows('culture-ready');
    expect(before?.status).toBe('pending');
    // A cooler jar: the culture's pace at 18 °C puts the window later (the shared model's kinetics).
    await ok(call('PATCH', `/api/feedings/${feeding.id}`, { temperatureC: 18 }));
    const after = await alertRows('culture-ready');
    expect(after).toHaveLength(1);
    expect(after[0]!.id).toBe(before!.id);
    expect(after[0]!.dueAt.getTime()).toBeGreaterThan(before!.dueAt.getTime());
    expect(after[0]!.movedAt).not.toBeNull();
    const inApp = await t.db
      .selectFrom('alertDelivery')
      .selectAll()
      .where('alertId', '=', before!.id)
      .where('channel', '=', 'in-app')
      .execute();
    expect(inApp).toHaveLength(1);
    expect(inApp[0]!.sendAfter.getTime()).toBe(after[0]!.dueAt.getTime());
  });

  it('rise checks that place the window move the pending alert to it, on the same row', async () => {
    await setPrefs({ leadMinutes: 0 });
    const culture = await ok<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }), 201);
    const fedAt = Date.now() - 1.5 * HOUR;
    const feeding = await ok<Feeding>(
      call('POST', `/api/cultures/${culture.id}/feedings`, {
        ...{ starterG: 20, flourG: 40, waterG: 40, temperatureC: 24, initialHeightMm: 50 },
        fedAt: new Date(fedAt).toISOString(),
      }),
      201,
    );
    const [before] = await alertRows('culture-ready');
    // A quick climb (invented heights, mm): the jar's own checks now place the window.
    for (const [h, mm] of [
      [0.5, 52],
      [1, 60],
      [1.5, 72],
    ] as const) {
      await ok(
        call('POST', `/api/feedings/${feeding.id}/rise-checks`, {
          takenAt: new Date(fedAt + h * HOUR).toISOString(),
          heightMm: mm,
        }),
        201,
      );
    }
    const s = await ok<CultureSummary>(call('GET', `/api/cultures/${culture.id}/summary`));
    const after = await alertRows('culture-ready');
    expect(after).toHaveLength(1);
    expect(after[0]!.id).toBe(before!.id);
    const expected = s.running?.readyFrom ?? s.forecast!.low;
    expect(after[0]!.dueAt.toISOString()).toBe(new Date(expected).toISOString());
    expect(after[0]!.dueAt.getTime()).not.toBe(before!.dueAt.getTime());
  });

  it('quiet hours hold the e-mail but not the in-app alert, and drop it when it would be stale', async () => {
    const now = new Date();
    const hhmm = (d: Date) => d.toISOString().slice(11, 16);
    const end = new Date(now.getTime() + 0.5 * HOUR);
    await setPrefs({ leadMinutes: 240, quietHours: { from: hhmm(new Date(now.getTime() - HOUR)), until: hhmm(end) } });
    const { culture } = await fedCulture(2);
    // Precondition: the ready window (the alert's staleness) lasts past the quiet hours' end.
    const s = await ok<CultureSummary>(call('GET', `/api/cultures/${culture.id}/summary`));
    expect(Date.parse(s.forecast!.high)).toBeGreaterThan(end.getTime() + 60_000);
    expect(await waitForAlerts(1)).toHaveLength(1);
    const [alert] = await alertRows('culture-ready');
    const email = () =>
      t.db
        .selectFrom('alertDelivery')
        .selectAll()
        .where('alertId', '=', alert!.id)
        .where('channel', '=', 'email')
        .executeTakeFirstOrThrow();
    const held = await email();
    expect(held.sentAt).toBeNull();
    expect(held.droppedAt).toBeNull();
    // Held to the end of the quiet hours (within the minute: the clock times are whole minutes).
    expect(Math.abs(held.sendAfter.getTime() - end.getTime())).toBeLessThan(60_000);
    expect(mailbox.messages()).toHaveLength(0);
  });

  it('an e-mail that quiet hours would hold past the ready window is dropped; the app still shows it', async () => {
    const now = new Date();
    const hhmm = (d: Date) => d.toISOString().slice(11, 16);
    await setPrefs({ leadMinutes: 0 });
    const { culture } = await fedCulture(2);
    const s = await ok<CultureSummary>(call('GET', `/api/cultures/${culture.id}/summary`));
    // Quiet from an hour ago until an hour after the ready window closes (the alert's staleness).
    const until = new Date(Date.parse(s.forecast!.high) + HOUR);
    expect(until.getTime() - now.getTime()).toBeLessThan(23 * HOUR);
    await setPrefs({
      leadMinutes: 240,
      quietHours: { from: hhmm(new Date(now.getTime() - HOUR)), until: hhmm(until) },
    });
    // Any logbook write re-plans: the longer lead moves the alert to now, with the new quiet hours.
    await ok(call('PATCH', `/api/cultures/${culture.id}`, { notes: 'Warm kitchen' }));
    expect(await waitForAlerts(1)).toHaveLength(1);
    const [alert] = await alertRows('culture-ready');
    const email = await t.db
      .selectFrom('alertDelivery')
      .selectAll()
      .where('alertId', '=', alert!.id)
      .where('channel', '=', 'email')
      .executeTakeFirstOrThrow();
    expect(email.droppedAt).not.toBeNull();
    expect(email.sentAt).toBeNull();
  });

  it('deleting the feeding removes its pending alerts', async () => {
    await setPrefs({ leadMinutes: 0 });
    const { feeding } = await fedCulture(0.5);
    expect(
      (await t.db.selectFrom('alert').selectAll().where('status', '=', 'pending').execute()).length,
    ).toBeGreaterThan(0);
    expect((await call('DELETE', `/api/feedings/${feeding.id}`)).statusCode).toBe(204);
    expect(await t.db.selectFrom('alert').selectAll().where('status', '=', 'pending').execute()).toEqual([]);
  });

  it('a culture moved to the fridge cancels its ready and past-peak alerts and keeps a weekly feeding', async () => {
    await setPrefs({ leadMinutes: 0 });
    const { culture } = await fedCulture(0.5);
    await ok(call('PATCH', `/api/cultures/${culture.id}`, { location: 'fridge' }));
    const rows = await t.db.selectFrom('alert').select(['kind', 'status']).orderBy('kind').execute();
    expect(rows).toEqual([
      { kind: 'culture-ready', status: 'cancelled' },
      { kind: 'feeding-due', status: 'pending' },
      { kind: 'past-peak', status: 'cancelled' },
    ]);
  });
});

describe('the window that cannot be closed', () => {
  it('mail accepted, then a crash before recording it: one duplicate with the same Message-ID, then never again', async () => {
    const culture = await ok<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }), 201);
    const past = new Date(Date.now() - HOUR);
    const alert = await t.db
      .insertInto('alert')
      .values({
        ...{ accountId: theo.account.id, kind: 'feeding-due', subjectType: 'culture', cultureId: culture.id },
        ...{
          slotKey: 'crash:1',
          dueAt: past,
          staleAt: new Date(Date.now() + HOUR),
          linkPath: `/cultures/${culture.id}`,
        },
        ...{ title: 'Bramble is due a feeding', body: 'Crash test.' },
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const delivery = await t.db
      .insertInto('alertDelivery')
      .values({ alertId: alert.id, channel: 'email', sendAfter: past })
      .returning('id')
      .executeTakeFirstOrThrow();
    const worker = t.app.get(AlertWorker);
    // The SMTP server accepts the message, then recording it fails (the process "dies" there).
    const markSent = vi.spyOn(t.app.get(AlertRepository), 'markSent').mockRejectedValueOnce(new Error('crash'));
    await expect(worker.deliver({ deliveryId: delivery.id })).rejects.toThrow('crash');
    markSent.mockRestore();
    await worker.deliver({ deliveryId: delivery.id }); // the retry sends it again and records it
    await worker.deliver({ deliveryId: delivery.id }); // recorded: nothing more
    const mails = mailbox.messages();
    expect(mails).toHaveLength(2);
    expect(mails[0]!.messageId).not.toBeNull();
    expect(mails[0]!.messageId).toBe(mails[1]!.messageId);
    const row = await t.db
      .selectFrom('alertDelivery')
      .selectAll()
      .where('id', '=', delivery.id)
      .executeTakeFirstOrThrow();
    expect(row.sentAt).not.toBeNull();
    expect(row.attempts).toBe(2);
  });
});

describe('Alerts page routes', () => {
  it('marks one read, then all; another account gets 404 and sees none', async () => {
    await setPrefs({ leadMinutes: 240 });
    await fedCulture(2);
    const [alert] = await waitForAlerts(1);
    const mira = await signUp(t.app, { displayName: 'Mira Sol' });
    expectError(await call('POST', `/api/alerts/${alert!.id}/read`, undefined, mira), 404);
    expect((await ok<AlertListResponse>(call('GET', '/api/alerts', undefined, mira))).items).toEqual([]);
    expectError(await call('POST', '/api/alerts/not-a-uuid/read'), 400);

    const read = await ok<Alert>(call('POST', `/api/alerts/${alert!.id}/read`));
    expect(read.readAt).not.toBeNull();
    expect(await ok(call('GET', '/api/alerts/unread-count'))).toEqual({ unread: 0 });
    expect(await ok(call('POST', '/api/alerts/read-all'))).toEqual({ marked: 0 });
  });
});

describe('alert preferences', () => {
  it('answers the defaults, applies a partial change and names the fields it refuses', async () => {
    const defaults = await ok<{ leadMinutes: number; quietHours: unknown }>(
      call('GET', '/api/account/alert-preferences'),
    );
    expect(defaults).toMatchObject({ leadMinutes: 15, quietHours: null });
    const changed = await setPrefs({
      leadMinutes: 30,
      quietHours: { from: '22:00', until: '07:00' },
      channels: { 'past-peak': { email: false } },
    });
    expect(changed).toMatchObject({
      leadMinutes: 30,
      quietHours: { from: '22:00', until: '07:00' },
      channels: { 'past-peak': { email: false, push: true }, 'culture-ready': { email: true, push: true } },
    });
    expect(await setPrefs({ quietHours: null })).toMatchObject({ quietHours: null, leadMinutes: 30 });
    expectFieldErrors(
      await call('PATCH', '/api/account/alert-preferences', {
        leadMinutes: 241,
        quietHours: { from: '25:00', until: '7' },
        channels: { 'plan-step': { push: 'yes' } },
      }),
      ['leadMinutes', 'quietHours.from', 'quietHours.until', 'channels.plan-step.push'],
    );
    expectFieldErrors(
      await call('PATCH', '/api/account/alert-preferences', { channels: { nightly: { email: true } } }),
      ['channels.nightly'],
    );
  });
});
