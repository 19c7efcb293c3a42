import type { AlertListResponse } from '@peakwise/shared';
import { sql } from 'kysely';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AlertWorker } from '../src/alert/alert.worker.js';
import { scheduleDemoAlerts } from '../src/cli/demo-alerts.js';
import { seedDemoLogbook } from '../src/cli/demo-logbook.js';
import { signUp, type SignedUp } from './helpers.js';
import { createTestApp, resetDatabase, type TestApp } from './test-app.js';

// The demo seed writes its logbook past the services, then plans the alerts in one go; the API's
// worker queues every open delivery when it starts. This checks the seed's part on the real tables.

const THEO = 'theo@larkspur-kitchen.example';
const MINUTE = 60_000;

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

let theo: SignedUp;
let brambleId: string;
let cultureIds: string[];
let now: Date;
beforeEach(async () => {
  await resetDatabase(t.db);
  theo = await signUp(t.app, { email: THEO, displayName: 'Theo Park', timeZone: 'Europe/London' });
  now = new Date();
  const seeded = await seedDemoLogbook(t.db, new Map([[THEO, theo.account.id]]), now);
  cultureIds = [...seeded.cultureIds.values()];
  brambleId = seeded.cultureIds.get('Bramble') ?? '';
});

async function readyAlerts() {
  return t.db
    .selectFrom('alert')
    .select(['id', 'dueAt', 'status', 'slotKey'])
    .where('cultureId', '=', brambleId)
    .where('kind', '=', 'culture-ready')
    .execute();
}

async function openDeliveries(alertId: string) {
  return t.db
    .selectFrom('alertDelivery')
    .select(['id', 'channel', 'sendAfter'])
    .where('alertId', '=', alertId)
    .where('sentAt', 'is', null)
    .where('droppedAt', 'is', null)
    .orderBy('channel')
    .execute();
}

describe('demo alerts from the seed', () => {
  it('Bramble gets one ready alert, due soon after seeding, with an in-app and an e-mail delivery', async () => {
    expect(brambleId).not.toBe('');
    const open = await scheduleDemoAlerts(t.db, cultureIds, now);
    expect(open).toBeGreaterThanOrEqual(1);
    const ready = await readyAlerts();
    expect(ready).toHaveLength(1);
    expect(ready[0]?.status).toBe('pending');
    // "Soon": after the seed (so it arrives while the demo runs) and within the hour.
    const dueIn = (ready[0]?.dueAt.getTime() ?? 0) - now.getTime();
    expect(dueIn).toBeGreaterThan(0);
    expect(dueIn).toBeLessThan(60 * MINUTE);
    const deliveries = await openDeliveries(ready[0]?.id ?? '');
    expect(deliveries.map((d) => d.channel)).toEqual(['email', 'in-app']);
    // Not shown in the app before it is due: the Alerts page lists sent alerts only.
    const list = await t.app.inject({ method: 'GET', url: '/api/alerts', headers: { cookie: theo.cookie } });
    expect(list.statusCode).toBe(200);
    expect(list.json<AlertListResponse>().items).toHaveLength(0);
  });

  it('running it again (a restart, a second seed) adds no alert and no delivery', async () => {
    await scheduleDemoAlerts(t.db, cultureIds, now);
    const count = async () => ({
      alerts: (await t.db.selectFrom('alert').select('id').execute()).length,
      deliveries: (await t.db.selectFrom('alertDelivery').select('id').execute()).length,
    });
    const first = await count();
    await scheduleDemoAlerts(t.db, cultureIds, new Date(now.getTime() + MINUTE));
    expect(await count()).toEqual(first);
    const ready = await readyAlerts();
    expect(ready).toHaveLength(1);
  });

  it('the API start queues a job for each open delivery of the ready alert', async () => {
    await scheduleDemoAlerts(t.db, cultureIds, now);
    const [ready] = await readyAlerts();
    const deliveries = await openDeliveries(ready?.id ?? '');
    await t.app.get(AlertWorker).scheduleOpen();
    // pg-boss's own table (schema pgboss), outside the typed schema.
    const jobs = await sql<{
      deliveryId: string;
    }>`SELECT data->>'deliveryId' AS "deliveryId" FROM pgboss.job WHERE name = 'alert-due'`.execute(t.db);
    const queued = new Set(jobs.rows.map((j) => j.deliveryId));
    expect(deliveries).toHaveLength(2);
    for (const d of deliveries) expect(queued.has(d.id)).toBe(true);
  });
});
