import type { BakePlanView, Culture } from '@peakwise/shared';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AlertRepository } from '../src/alert/alert.repository.js';
import { CLAIM_TIMEOUT_SECONDS } from '../src/alert/alert.worker.js';
import { openDatabase, type DatabaseHandle } from '../src/db/database.js';
import { caller, createFormula, created, planBody } from './bake-plan.fixtures.js';
import { signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// The exactly-once gate (the conditional UPDATE on alert_delivery) raced from two connection
// pools, as two API processes would, and the plan side of scheduling.

let t: TestApp;
let other: DatabaseHandle;
beforeAll(async () => {
  t = await createTestApp({ alertPollingSeconds: 0.5 });
  other = openDatabase(t.config.databaseUrl, 4);
  call = caller(t, () => theo);
});
afterAll(async () => {
  await other.db.destroy();
  await t.close();
});

let theo: SignedUp;
let call: ReturnType<typeof caller>;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { displayName: 'Theo Park', timeZone: 'UTC' });
  await created(call('PATCH', '/api/account/alert-preferences', { leadMinutes: 0 }), 200);
});

const HOUR = 3_600_000;

/** A culture fed just now: its alerts lie hours ahead, so the running worker leaves them alone. */
async function pendingDeliveries(): Promise<string[]> {
  const culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }));
  await created(
    call('POST', `/api/cultures/${culture.id}/feedings`, { starterG: 20, flourG: 40, waterG: 40, temperatureC: 24 }),
  );
  const rows = await t.db.selectFrom('alertDelivery').select('id').where('droppedAt', 'is', null).execute();
  return rows.map((r) => r.id);
}

describe('claiming a delivery', () => {
  it('two workers on separate pools racing for the same delivery: exactly one wins, every time', async () => {
    const ids = await pendingDeliveries();
    expect(ids.length).toBeGreaterThanOrEqual(4);
    const a = new AlertRepository(t.db);
    const b = new AlertRepository(other.db);
    // A "now" past every send time, so each delivery is due for both.
    const at = new Date(Date.now() + 8 * 24 * HOUR);
    for (const id of ids) {
      const [x, y] = await Promise.all([
        a.claim(id, at, CLAIM_TIMEOUT_SECONDS),
        b.claim(id, at, CLAIM_TIMEOUT_SECONDS),
      ]);
      expect([x, y].filter(Boolean)).toHaveLength(1);
    }
    const attempts = await t.db.selectFrom('alertDelivery').select('attempts').where('id', 'in', ids).execute();
    expect(attempts.every((r) => r.attempts === 1)).toBe(true);
  });

  it('1,000 due deliveries claimed by two workers on separate pools: no duplicate, none missing', async () => {
    const culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }));
    const past = new Date(Date.now() - HOUR);
    const alerts = await t.db
      .insertInto('alert')
      .values(
        Array.from({ length: 1000 }, (_, i) => ({
          accountId: theo.account.id,
          kind: 'feeding-due',
          subjectType: 'culture',
          cultureId: culture.id,
          slotKey: `race:${i}`,
          dueAt: past,
          staleAt: new Date(Date.now() + HOUR),
          title: 'Bramble is due a feeding',
          body: 'Race test.',
          linkPath: `/cultures/${culture.id}`,
        })),
      )
      .returning('id')
      .execute();
    const deliveries = await t.db
      .insertInto('alertDelivery')
      .values(alerts.map((a) => ({ alertId: a.id, channel: 'email', sendAfter: past })))
      .returning('id')
      .execute();
    const ids = deliveries.map((d) => d.id);
    const at = new Date();
    // Each worker walks every id (the second in reverse, so they meet in the middle and collide).
    const work = async (repo: AlertRepository, order: string[]) => {
      const won: string[] = [];
      for (const id of order) if (await repo.claim(id, at, CLAIM_TIMEOUT_SECONDS)) won.push(id);
      return won;
    };
    const [a, b] = await Promise.all([
      work(new AlertRepository(t.db), ids),
      work(new AlertRepository(other.db), [...ids].reverse()),
    ]);
    const all = [...a, ...b];
    expect(new Set(all).size).toBe(all.length); // 0 duplicates
    expect(all.length).toBe(1000); // 0 missing
  });

  it('a claim left by a dead worker is taken over after the timeout, and a sent delivery never again', async () => {
    const [id] = await pendingDeliveries();
    const repo = new AlertRepository(t.db);
    const at = new Date(Date.now() + 8 * 24 * HOUR);
    const first = await repo.claim(id!, at, CLAIM_TIMEOUT_SECONDS);
    expect(first).toBeDefined();
    expect(
      await repo.claim(id!, new Date(at.getTime() + (CLAIM_TIMEOUT_SECONDS - 1) * 1000), CLAIM_TIMEOUT_SECONDS),
    ).toBeUndefined();
    // This is the one window that cannot be closed: if the first worker had handed the message to
    // the SMTP server and died before recording it, the takeover sends it a second time.
    const second = await repo.claim(
      id!,
      new Date(at.getTime() + (CLAIM_TIMEOUT_SECONDS + 1) * 1000),
      CLAIM_TIMEOUT_SECONDS,
    );
    expect(second).toBeDefined();
    await repo.markSent(second!, new Date());
    expect(await repo.claim(id!, new Date(at.getTime() + 3600 * 1000), CLAIM_TIMEOUT_SECONDS)).toBeUndefined();
  });

  it('a delivery not yet due cannot be claimed', async () => {
    const [id] = await pendingDeliveries();
    expect(await new AlertRepository(t.db).claim(id!, new Date(), CLAIM_TIMEOUT_SECONDS)).toBeUndefined();
  });
});

describe('bake plan alerts', () => {
  it('a plan started now gets step reminders; cancelling the plan cancels them', async () => {
    const formula = await createFormula(call);
    const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id)));
    const pending = await t.db.selectFrom('alert').selectAll().where('planId', '=', plan.id).execute();
    const folds = plan.live.steps.filter((s) => s.kind === 'fold' && !s.done);
    expect(pending.length).toBeGreaterThanOrEqual(folds.length);
    expect(
      pending.every((a) => a.kind === 'plan-step' && a.status === 'pending' && a.linkPath === `/bench/${plan.id}`),
    ).toBe(true);
    const fold = pending.find((a) => a.slotKey.endsWith(`:${folds[0]!.id}`));
    // The alert is planned a moment before the answer's re-plan, and a plan started now moves
    // with the clock until the mix is checked off: the two may be a second or so apart.
    expect(Math.abs((fold?.dueAt.getTime() ?? NaN) - Date.parse(folds[0]!.startAt))).toBeLessThanOrEqual(5_000);

    await created(call('PATCH', `/api/plans/${plan.id}`, { status: 'cancelled' }), 200);
    const after = await t.db.selectFrom('alert').select('status').where('planId', '=', plan.id).execute();
    expect(after.every((a) => a.status === 'cancelled')).toBe(true);
    const open = await t.db
      .selectFrom('alertDelivery')
      .select('id')
      .where('droppedAt', 'is', null)
      .where('sentAt', 'is', null)
      .execute();
    // Only the (new) culture alerts of other tests could remain; this test has none.
    expect(open).toEqual([]);
  });

  it("another baker's plan answers 404 on its alerts' routes and leaves them alone", async () => {
    const formula = await createFormula(call);
    const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id)));
    const mira = await signUp(t.app, { displayName: 'Mira Sol' });
    const res = await call('PATCH', `/api/plans/${plan.id}`, { status: 'cancelled' }, mira);
    expect(res.statusCode).toBe(404);
    const rows = await t.db.selectFrom('alert').select('status').where('planId', '=', plan.id).execute();
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.every((r) => r.status === 'pending')).toBe(true);
  });
});
