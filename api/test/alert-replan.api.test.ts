import {
  localTime,
  type Culture,
  type CultureSummary,
  type Feeding,
  type TemperatureReadingBatchResponse,
} from '@peakwise/shared';
import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { ALERT_DUE_QUEUE } from '../src/alert/alert.queue.js';
import { send, signUp, type InjectResponse, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// Changes that move alerts without a logbook write (alert preferences, the account's time zone) and
// a deleted temperature reading re-plan the pending alerts; a refresh cancels only the kinds its
// rules produce. Every alert here lies hours ahead, so the running worker leaves them pending.

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ alertPollingSeconds: 0.5 });
});
afterAll(async () => {
  await t.close();
});

let theo: SignedUp;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park', timeZone: 'UTC' });
});

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

async function ok<T>(method: 'GET' | 'POST' | 'PATCH' | 'DELETE', url: string, payload?: unknown, status = 200) {
  const r: InjectResponse = await send(t.app, method, url, theo.cookie, payload);
  expect(r.statusCode, r.body).toBe(status);
  return (r.body ? r.json<T>() : undefined) as T;
}

async function fedCulture(hoursAgo = 0): Promise<{ culture: Culture; feeding: Feeding }> {
  const culture = await ok<Culture>('POST', '/api/cultures', { name: 'Bramble' }, 201);
  const fedAt = new Date(Date.now() - hoursAgo * HOUR).toISOString();
  const body = { starterG: 20, flourG: 40, waterG: 40, temperatureC: 24, fedAt };
  const feeding = await ok<Feeding>('POST', `/api/cultures/${culture.id}/feedings`, body, 201);
  return { culture, feeding };
}

async function alertOf(kind: string) {
  const rows = await t.db.selectFrom('alert').selectAll().where('kind', '=', kind).execute();
  expect(rows, `one ${kind} alert`).toHaveLength(1);
  return rows[0]!;
}

const delivery = (alertId: string, channel: 'in-app' | 'email') =>
  t.db
    .selectFrom('alertDelivery')
    .selectAll()
    .where('alertId', '=', alertId)
    .where('channel', '=', channel)
    .executeTakeFirstOrThrow();

/** "HH:MM" in UTC, `offsetMs` from `at`. */
const utcClock = (at: Date, offsetMs: number) => new Date(at.getTime() + offsetMs).toISOString().slice(11, 16);

describe('re-planning without a logbook write', () => {
  it('a longer lead time moves the pending ready alert earlier, on the same row, with a job at the new time', async () => {
    await ok('PATCH', '/api/account/alert-preferences', { leadMinutes: 0 });
    await fedCulture();
    const before = await alertOf('culture-ready');
    expect(before.status).toBe('pending');

    await ok('PATCH', '/api/account/alert-preferences', { leadMinutes: 30 });
    const after = await alertOf('culture-ready');
    expect(after.id).toBe(before.id);
    expect(after.status).toBe('pending');
    expect(before.dueAt.getTime() - after.dueAt.getTime()).toBe(30 * MINUTE);
    const inApp = await delivery(after.id, 'in-app');
    expect(inApp.sendAfter.getTime()).toBe(after.dueAt.getTime());
    const jobs = await sql<{ n: string }>`SELECT count(*) AS n FROM pgboss.job
      WHERE name = ${ALERT_DUE_QUEUE} AND state = 'created' AND singleton_key = ${`${after.slotKey}:${inApp.id}:${after.dueAt.getTime()}`}`.execute(
      t.db,
    );
    expect(Number(jobs.rows[0]!.n)).toBe(1);
  });

  it('quiet hours set and cleared hold and release the e-mail of a pending alert; the app is not held', async () => {
    await fedCulture();
    const feedingDue = await alertOf('feeding-due');
    const due = feedingDue.dueAt;
    // Quiet from an hour before the reminder until an hour after (clock times in the baker's UTC).
    const quietHours = { from: utcClock(due, -HOUR), until: utcClock(due, HOUR) };
    await ok('PATCH', '/api/account/alert-preferences', { quietHours });
    const held = await delivery(feedingDue.id, 'email');
    expect(held.sendAfter.getTime()).toBeGreaterThan(due.getTime());
    expect(held.sendAfter.toISOString().slice(11, 16)).toBe(quietHours.until);
    expect((await delivery(feedingDue.id, 'in-app')).sendAfter.getTime()).toBe(due.getTime());

    await ok('PATCH', '/api/account/alert-preferences', { quietHours: null });
    expect((await delivery(feedingDue.id, 'email')).sendAfter.getTime()).toBe(due.getTime());
  });

  it('switching e-mail off drops the pending e-mail; on again brings it back', async () => {
    await fedCulture();
    const feedingDue = await alertOf('feeding-due');
    await ok('PATCH', '/api/account/alert-preferences', { channels: { 'feeding-due': { email: false } } });
    expect((await delivery(feedingDue.id, 'email')).droppedAt).not.toBeNull();
    await ok('PATCH', '/api/account/alert-preferences', { channels: { 'feeding-due': { email: true } } });
    expect((await delivery(feedingDue.id, 'email')).droppedAt).toBeNull();
  });

  it('a new time zone re-words the ready alert in local time and moves e-mail out of quiet hours', async () => {
    const { culture } = await fedCulture();
    const feedingDue = await alertOf('feeding-due');
    const due = feedingDue.dueAt;
    const quietHours = { from: utcClock(due, -HOUR), until: utcClock(due, HOUR) };
    await ok('PATCH', '/api/account/alert-preferences', { quietHours });
    expect((await delivery(feedingDue.id, 'email')).sendAfter.getTime()).toBeGreaterThan(due.getTime());
    const summary = await ok<CultureSummary>('GET', `/api/cultures/${culture.id}/summary`);
    const readyFrom = Date.parse(summary.forecast!.low);
    expect((await alertOf('culture-ready')).body).toContain(`Ready from ${localTime(readyFrom, 'UTC')}`);

    await ok('PATCH', '/api/account', { timeZone: 'Asia/Tokyo' });
    // Tokyo is UTC+9 all year: the reminder's local time lies nine hours outside the quiet window.
    expect((await alertOf('culture-ready')).body).toContain(`Ready from ${localTime(readyFrom, 'Asia/Tokyo')}`);
    expect(localTime(readyFrom, 'Asia/Tokyo')).not.toBe(localTime(readyFrom, 'UTC'));
    expect((await delivery(feedingDue.id, 'email')).sendAfter.getTime()).toBe(due.getTime());
  });

  it('deleting a temperature reading moves the ready alert back to where it was without it', async () => {
    await ok('PATCH', '/api/account/alert-preferences', { leadMinutes: 0 });
    const { feeding } = await fedCulture(1);
    const before = await alertOf('culture-ready');
    // A cold kitchen (16 °C against the 24 °C logged): the model's kinetics slow the rise.
    const readings = [{ takenAt: new Date(Date.now() - 30 * MINUTE).toISOString(), temperatureC: 16 }];
    const { items } = await ok<TemperatureReadingBatchResponse>(
      'POST',
      `/api/feedings/${feeding.id}/temperatures`,
      { readings },
      201,
    );
    const cooler = await alertOf('culture-ready');
    expect(cooler.dueAt.getTime()).not.toBe(before.dueAt.getTime()); // precondition: the reading counts

    await ok('DELETE', `/api/temperatures/${items[0]!.id}`, undefined, 204);
    const after = await alertOf('culture-ready');
    expect(after.id).toBe(before.id);
    expect(after.dueAt.getTime()).toBe(before.dueAt.getTime());
  });
});

describe('what a refresh may cancel', () => {
  it('a pending comment alert about the culture survives refreshes; a culture alert no rule wants is cancelled', async () => {
    const { culture, feeding } = await fedCulture();
    const base = {
      accountId: theo.account.id,
      subjectType: 'culture',
      cultureId: culture.id,
      dueAt: new Date(Date.now() + 2 * HOUR),
      staleAt: new Date(Date.now() + 3 * HOUR),
      body: 'Inserted by the test.',
      linkPath: `/feedings/${feeding.id}`,
    };
    const [comment, orphan] = await t.db
      .insertInto('alert')
      .values([
        { ...base, kind: 'comment', slotKey: 'replan:comment', title: 'Ines commented on your feeding' },
        { ...base, kind: 'feeding-due', slotKey: 'replan:no-rule-wants-this', title: 'Bramble is due a feeding' },
      ])
      .returning('id')
      .execute();
    await t.db
      .insertInto('alertDelivery')
      .values({ alertId: comment!.id, channel: 'in-app', sendAfter: base.dueAt })
      .execute();

    // A logbook write (refreshCulture) and a preference change (refreshAccount).
    await ok('PATCH', `/api/feedings/${feeding.id}`, { temperatureC: 22 });
    await ok('PATCH', '/api/account/alert-preferences', { leadMinutes: 15 });

    const rows = await t.db
      .selectFrom('alert')
      .select(['id', 'status'])
      .where('id', 'in', [comment!.id, orphan!.id])
      .execute();
    expect(rows.find((r) => r.id === comment!.id)?.status).toBe('pending');
    expect(rows.find((r) => r.id === orphan!.id)?.status).toBe('cancelled');
    expect((await delivery(comment!.id, 'in-app')).droppedAt).toBeNull();
  });
});
