import { existsSync } from 'node:fs';
import { sql } from 'kysely';
import PgBoss from 'pg-boss';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { ALERT_DUE_QUEUE, ALERT_QUEUE_SCHEMA, type AlertDueJob } from '../src/alert/alert.queue.js';
import { AlertRepository } from '../src/alert/alert.repository.js';
import { CLAIM_TIMEOUT_SECONDS } from '../src/alert/alert.worker.js';
import { openDatabase, type DatabaseHandle } from '../src/db/database.js';
import { startFakeSmtp, type FakeSmtp, type StoredMail } from '../src/dev/fake-smtp.js';
import { MailService } from '../src/mail/mail.service.js';
import {
  API_ENTRY,
  bakerWithCulture,
  callApi,
  startApi,
  stopApi,
  type ApiProcess,
  type ApiProcessOptions,
} from './alert-processes.fixtures.js';
import { resetDatabase, testConfig } from './test-app.js';

// The exactly-once test: two real API processes (the build `npm test` makes) share one
// database and race for the same deliveries. The queue is at-least-once (every delivery gets a job
// in each process's reach); only the claim on alert_delivery may make the result exactly once.

const MAIL_FROM = 'Peakwise <no-reply@peakwise.invalid>';
const ALERTS = 1000;
const HOUR = 3_600_000;

let mailbox: FakeSmtp;
let handle: DatabaseHandle;
let boss: PgBoss;
let mail: MailService;
let api: ApiProcessOptions;
const processes: ApiProcess[] = [];

beforeAll(async () => {
  if (!existsSync(API_ENTRY)) {
    throw new Error(`${API_ENTRY} is missing: this test runs the built API; run \`npm run build\` first`);
  }
  // Every message kept: the default box keeps the newest 200.
  mailbox = await startFakeSmtp({ smtpPort: 0, httpPort: 0, file: null, max: 10 * ALERTS });
  // The processes' mail settings, so messageIdFor() gives the Message-IDs they send.
  const config = testConfig({
    mail: { smtpUrl: mailbox.smtpUrl, from: MAIL_FROM, publicUrl: 'http://127.0.0.1:3000', devMailUrl: null },
  });
  handle = openDatabase(config.databaseUrl, 4);
  await resetDatabase(handle.db);
  mail = new MailService(config);
  api = { databaseUrl: config.databaseUrl, smtpUrl: mailbox.smtpUrl, mailFrom: MAIL_FROM };
  processes.push(...(await Promise.all([startApi(api), startApi(api)])));
  // Only inserts jobs: no maintenance, no workers of its own (the two processes do the work).
  boss = new PgBoss({
    connectionString: config.databaseUrl,
    schema: ALERT_QUEUE_SCHEMA,
    supervise: false,
    schedule: false,
  });
  boss.on('error', () => undefined);
  await boss.start();
}, 60_000);

afterAll(async () => {
  await Promise.all(processes.map(stopApi));
  await boss?.stop({ graceful: false, wait: true });
  mail?.onModuleDestroy();
  await handle?.db.destroy();
  await mailbox?.close();
}, 30_000);

let accountId: string;
let email: string;
let cultureId: string;
let cookie: string;
beforeEach(async () => {
  await resetDatabase(handle.db);
  mailbox.clear();
  ({ accountId, email, cultureId, cookie } = await bakerWithCulture(processes[0]!));
});

describe('two API processes sharing one database', () => {
  it(`${ALERTS} due alerts, each woken twice in both processes: every alert once in the app and once by e-mail`, async () => {
    const started = Date.now();
    const past = new Date(Date.now() - HOUR);
    const alerts = await handle.db
      .insertInto('alert')
      .values(
        Array.from({ length: ALERTS }, (_, i) => ({
          accountId,
          kind: 'feeding-due',
          subjectType: 'culture',
          cultureId,
          slotKey: `processes:${i}`,
          dueAt: past,
          staleAt: new Date(Date.now() + 2 * HOUR),
          title: `Bramble is due a feeding (${i})`,
          body: 'Two-process test.',
          linkPath: `/cultures/${cultureId}`,
        })),
      )
      .returning(['id', 'slotKey'])
      .execute();
    const deliveries = await handle.db
      .insertInto('alertDelivery')
      .values(
        alerts.flatMap((a) =>
          (['in-app', 'email'] as const).map((channel) => ({ alertId: a.id, channel, sendAfter: past })),
        ),
      )
      .returning('id')
      .execute();
    // Two jobs per delivery, no singleton key: both processes fetch them (in random id order), so
    // the same delivery is regularly handled by both at once.
    await boss.insert(deliveries.flatMap((d) => [job(d.id), job(d.id)]));

    await waitFor(async () => (await openCount()) === 0, 180_000, 'every delivery sent');
    const seconds = (Date.now() - started) / 1000;

    const sentInApp = await handle.db
      .selectFrom('alert')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('status', '=', 'sent')
      .executeTakeFirstOrThrow();
    expect(Number(sentInApp.n)).toBe(ALERTS);

    const received = mailsTo(email);
    const ids = received.map((m) => m.messageId);
    const expected = new Set(alerts.map((a) => mail.messageIdFor(`alert:${a.slotKey}:email`)));
    const duplicates = ids.length - new Set(ids).size;
    const missing = [...expected].filter((id) => !ids.includes(id)).length;
    expect(received).toHaveLength(ALERTS);
    expect(duplicates).toBe(0);
    expect(missing).toBe(0);

    const rows = await handle.db.selectFrom('alertDelivery').select(['attempts', 'droppedAt']).execute();
    expect(rows).toHaveLength(2 * ALERTS);
    expect(rows.every((r) => r.attempts >= 1 && r.droppedAt === null)).toBe(true);
    const attempts = rows.reduce((sum, r) => sum + r.attempts, 0);
    // Each process links to itself (PUBLIC_URL defaults to its own address): both took part.
    const bySender = processes.map((p) => received.filter((m) => m.text.includes(`${p.url}/`)).length);
    expect(bySender.every((n) => n > 0)).toBe(true);
    expect(bySender[0]! + bySender[1]!).toBe(ALERTS);
    console.log(
      `two processes: ${ALERTS} alerts, ${deliveries.length} deliveries, ${2 * deliveries.length} jobs; ` +
        `in-app sent ${sentInApp.n}, e-mails received ${received.length} (${bySender.join(' + ')} by process), ` +
        `duplicates ${duplicates}, missing ${missing}, claims ${attempts}; ${seconds.toFixed(1)} s`,
    );
  }, 240_000);

  it('an e-mail the server accepted from a process that died before recording it is sent once more, never twice more', async () => {
    const past = new Date(Date.now() - HOUR);
    const alert = await handle.db
      .insertInto('alert')
      .values({
        accountId,
        kind: 'feeding-due',
        subjectType: 'culture',
        cultureId,
        slotKey: 'processes:crash',
        dueAt: past,
        staleAt: new Date(Date.now() + 2 * HOUR),
        title: 'Bramble is due a feeding',
        body: 'Crash test.',
        linkPath: `/cultures/${cultureId}`,
      })
      .returning(['id', 'slotKey'])
      .executeTakeFirstOrThrow();
    const delivery = await handle.db
      .insertInto('alertDelivery')
      .values({ alertId: alert.id, channel: 'email', sendAfter: past })
      .returning('id')
      .executeTakeFirstOrThrow();
    const key = `alert:${alert.slotKey}:email`;

    // "Process X": claims, hands the message to the SMTP server, and dies before markSent.
    const claimed = await new AlertRepository(handle.db).claim(delivery.id, new Date(), CLAIM_TIMEOUT_SECONDS);
    expect(claimed).toBeDefined();
    await mail.send({
      to: email,
      subject: 'Bramble is due a feeding',
      text: 'Crash test.',
      html: '<p>Crash test.</p>',
      key,
    });
    const messageId = mail.messageIdFor(key);
    const copies = () => mailsTo(email).filter((m) => m.messageId === messageId).length;
    expect(copies()).toBe(1);

    // While the claim is live, both processes leave the delivery alone.
    await wake(delivery.id);
    expect(copies()).toBe(1);
    expect((await deliveryRow(delivery.id)).sentAt).toBeNull();

    // The claim outlives the timeout (moved back rather than waited for): a process takes over.
    await handle.db
      .updateTable('alertDelivery')
      .set({ claimedAt: new Date(Date.now() - (CLAIM_TIMEOUT_SECONDS + 60) * 1000) })
      .where('id', '=', delivery.id)
      .execute();
    await wake(delivery.id);
    const after = await deliveryRow(delivery.id);
    expect(after.sentAt).not.toBeNull();
    expect(after.attempts).toBe(2);
    expect(copies()).toBe(2); // the one duplicate, with the same Message-ID

    // Recorded now: more jobs for it send nothing.
    await wake(delivery.id);
    expect(copies()).toBe(2);
    expect(mailsTo(email)).toHaveLength(2);
  }, 60_000);
  it('restarting a process twice queues no second job for a delivery that has one waiting', async () => {
    const first = processes[0]!;
    // Lead 0: the ready alert stays hours ahead, so its deliveries stay open through the restarts.
    await callApi(first, cookie, 'PATCH', '/api/account/alert-preferences', { leadMinutes: 0 }, 200);
    const feeding = { starterG: 20, flourG: 40, waterG: 40, temperatureC: 24 };
    await callApi(first, cookie, 'POST', `/api/cultures/${cultureId}/feedings`, feeding, 201);
    const open = await new AlertRepository(handle.db).openDeliveries();
    expect(open.length).toBeGreaterThanOrEqual(3); // feeding due, ready, past peak: in the app at least

    expect(await waitingJobs(open)).toEqual(open.map(() => 1));
    for (let i = 0; i < 2; i++) await restart(0); // each start queues every open delivery again
    expect(await waitingJobs(open)).toEqual(open.map(() => 1));

    // A job that is no longer waiting (here: marked done while its delivery stayed open) is no
    // reason to skip: the next start queues the delivery again, once.
    await sql`UPDATE pgboss.job SET state = 'completed', completed_on = now()
               WHERE name = ${ALERT_DUE_QUEUE} AND data->>'deliveryId' IN (${sql.join(open.map((d) => d.id))})`.execute(
      handle.db,
    );
    expect(await waitingJobs(open)).toEqual(open.map(() => 0));
    await restart(0);
    expect(await waitingJobs(open)).toEqual(open.map(() => 1));
  }, 90_000);
});

function job(deliveryId: string): PgBoss.JobInsert<AlertDueJob> {
  return { name: ALERT_DUE_QUEUE, data: { deliveryId } };
}

/** Two jobs for the delivery (one for each process, as chance falls) and waits until both are done. */
async function wake(deliveryId: string): Promise<void> {
  const ids = await Promise.all([
    boss.send(ALERT_DUE_QUEUE, { deliveryId }),
    boss.send(ALERT_DUE_QUEUE, { deliveryId }),
  ]);
  await waitFor(
    async () => {
      const states = await Promise.all(ids.map((id) => boss.getJobById(ALERT_DUE_QUEUE, id!)));
      return states.every((j) => j?.state === 'completed');
    },
    30_000,
    'both jobs done',
  );
}

function deliveryRow(id: string) {
  return handle.db.selectFrom('alertDelivery').selectAll().where('id', '=', id).executeTakeFirstOrThrow();
}

async function openCount(): Promise<number> {
  const row = await handle.db
    .selectFrom('alertDelivery')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .where('sentAt', 'is', null)
    .where('droppedAt', 'is', null)
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

function mailsTo(address: string): StoredMail[] {
  return mailbox.messages().filter((m) => m.to.includes(address));
}

async function waitFor(done: () => Promise<boolean>, timeoutMs: number, what: string): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (!(await done())) {
    if (Date.now() > until) throw new Error(`timed out waiting for: ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** For each delivery, how many of its jobs wait to run (created, or retry after a failure). */
async function waitingJobs(deliveries: { id: string }[]): Promise<number[]> {
  const rows = await sql<{ deliveryId: string; n: string }>`
    SELECT data->>'deliveryId' AS "deliveryId", count(*) AS n FROM pgboss.job
     WHERE name = ${ALERT_DUE_QUEUE} AND state IN ('created', 'retry')
       AND data->>'deliveryId' IN (${sql.join(deliveries.map((d) => d.id))})
     GROUP BY 1`.execute(handle.db);
  const counts = new Map(rows.rows.map((r) => [r.deliveryId, Number(r.n)]));
  return deliveries.map((d) => counts.get(d.id) ?? 0);
}

/** SIGTERM and start again; the new process has queued its open deliveries once it answers. */
async function restart(index: number): Promise<void> {
  await stopApi(processes[index]!);
  processes[index] = await startApi(api);
}
