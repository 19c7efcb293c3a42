import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { CompiledQuery, sql } from 'kysely';
import PgBoss from 'pg-boss';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

export const ALERT_DUE_QUEUE = 'alert-due';
/** pg-boss keeps its tables here, apart from ours (sql/ never touches it). */
export const ALERT_QUEUE_SCHEMA = 'pgboss';
const DEFAULT_POLLING_SECONDS = 2;
/**
 * Jobs fetched, and handled side by side, at once. Most of a job's time is one SMTP exchange
 * (about 0.1 s even on loopback, a new connection per message), so one at a time would send ten
 * e-mails a second per process; eight at a time stays well inside the database pool (10).
 */
const BATCH_SIZE = 8;
/** A queue that could not start (database down) tries again after this long. */
const START_RETRY_MS = 15_000;

/** First half of the advisory-lock key that serialises scheduling of one job key ("al", "rt"). */
const SCHEDULE_LOCK_SPACE = 0x616c7274;

export interface AlertDueJob {
  deliveryId: string;
}

type Handler = (job: AlertDueJob) => Promise<void>;

/**
 * The durable queue (pg-boss on the same database): a job per delivery, started after its send
 * time. The job only wakes the worker; whether to send is decided by the claim on alert_delivery,
 * so a stale or repeated job is harmless.
 */
@Injectable()
export class AlertQueue implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('AlertQueue');
  private readonly boss: PgBoss;
  private handler: Handler | null = null;
  private afterStart: (() => Promise<void>) | null = null;
  private started: Promise<void> | null = null;
  private stopping = false;
  private retry: NodeJS.Timeout | null = null;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @Inject(DATABASE) private readonly db: Database,
  ) {
    this.boss = new PgBoss({
      connectionString: config.databaseUrl,
      schema: ALERT_QUEUE_SCHEMA,
      max: 4,
      // No cron schedules: every alert is a job with its own start time.
      schedule: false,
    });
    this.boss.on('error', (error) => this.logger.error(error.message));
  }

  /** The worker registers here before the application starts. */
  onWork(handler: Handler, afterStart: () => Promise<void>): void {
    this.handler = handler;
    this.afterStart = afterStart;
  }

  /**
   * Starts the queue with the API. A database that is down must not keep the API from starting
   * (the health route reports it), so a failed start is logged and tried again a little later.
   */
  async onApplicationBootstrap(): Promise<void> {
    this.started = this.start();
    await this.started.then(
      () => this.recover(),
      (error: unknown) => this.retryLater(error),
    );
  }

  /** Jobs for deliveries planned while the queue was down (or lost with its schema). */
  private async recover(): Promise<void> {
    await this.afterStart?.().catch((error: unknown) =>
      this.logger.error(`Alert recovery failed: ${error instanceof Error ? error.message : String(error)}`),
    );
  }

  private async start(): Promise<void> {
    await this.boss.start();
    await this.boss.createQueue(ALERT_DUE_QUEUE);
    const handler = this.handler;
    if (handler) {
      const pollingIntervalSeconds = Math.max(0.5, this.config.alertPollingSeconds ?? DEFAULT_POLLING_SECONDS);
      let workerId: string | null = null;
      workerId = await this.boss.work<AlertDueJob>(
        ALERT_DUE_QUEUE,
        { pollingIntervalSeconds, batchSize: BATCH_SIZE },
        async (jobs) => {
          await Promise.all(jobs.map((job) => this.runOne(handler, job)));
          // Many alerts due at once (a thousand bakers' 7 a.m.): without this each batch would wait
          // out the polling interval, and the last alert would arrive minutes late.
          if (jobs.length === BATCH_SIZE && workerId) this.boss.notifyWorker(workerId);
        },
      );
    }
  }

  /**
   * One job of a batch: a failure fails that job alone (pg-boss retries it with back-off). A throw
   * from the batch handler would fail the whole batch, and the others would wait out the back-off
   * for someone else's error.
   */
  private async runOne(handler: Handler, job: PgBoss.Job<AlertDueJob>): Promise<void> {
    try {
      await handler(job.data);
    } catch (error) {
      await this.boss.fail(ALERT_DUE_QUEUE, job.id, {
        message: error instanceof Error ? error.message : String(error),
      });
    }
  }

  private retryLater(error: unknown): void {
    this.logger.error(`Alert queue did not start: ${error instanceof Error ? error.message : String(error)}`);
    if (this.stopping) return;
    this.retry = setTimeout(() => {
      this.started = this.start();
      this.started.then(
        () => this.recover(),
        (e: unknown) => this.retryLater(e),
      );
    }, START_RETRY_MS);
    this.retry.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopping = true;
    if (this.retry) clearTimeout(this.retry);
    if (!this.started) return;
    const running = await this.started.then(
      () => true,
      () => false,
    );
    // Graceful: the worker finishes the job in hand (its claim is recorded) before the pool closes.
    if (running) await this.boss.stop({ graceful: true, wait: true, timeout: 10_000 });
  }

  /**
   * A job at `at` for one delivery; the key includes the time so a moved delivery gets a fresh job.
   * pg-boss dedupes by singletonKey only under the short, singleton and stately queue policies or
   * with singletonSeconds, and none of them means "one waiting job per key, created or retry"; on
   * this standard queue the key is ignored. Every start queues every open delivery again, so
   * without a check the jobs of a pending alert would pile up restart after restart. A job already waiting (created, or retry after a failure) for the same key is enough;
   * a running or finished one is not, since the delivery is open again (a crash, a re-plan). The
   * advisory lock makes check-then-send one step for processes starting together.
   */
  async schedule(deliveryId: string, slotKey: string, at: Date): Promise<void> {
    await this.started;
    const singletonKey = jobKey({ deliveryId, slotKey, at });
    await this.db.transaction().execute(async (trx) => {
      await sql`SELECT pg_advisory_xact_lock(${SCHEDULE_LOCK_SPACE}, hashtext(${singletonKey}))`.execute(trx);
      const waiting = await sql`
        SELECT 1 FROM ${sql.table(`${ALERT_QUEUE_SCHEMA}.job`)}
         WHERE name = ${ALERT_DUE_QUEUE} AND singleton_key = ${singletonKey} AND state IN ('created', 'retry')
         LIMIT 1`.execute(trx);
      if (waiting.rows.length > 0) return;
      await this.boss.send(ALERT_DUE_QUEUE, { deliveryId } satisfies AlertDueJob, {
        startAfter: at,
        singletonKey,
        ...RETRY,
        // Inside this transaction, so the lock is held until the job is visible to the next check.
        db: { executeSql: (text, values) => trx.executeQuery(CompiledQuery.raw(text, values)) },
      });
    });
  }

  /**
   * The start-up sweep: a job for each open delivery that has none waiting, in one transaction.
   * One query reads the waiting keys and one insert per thousand adds the rest, so a start with
   * thousands of open deliveries takes a moment, not a query per delivery.
   */
  async scheduleMany(items: ScheduleItem[]): Promise<number> {
    await this.started;
    if (items.length === 0) return 0;
    return this.db.transaction().execute(async (trx) => {
      await sql`SELECT pg_advisory_xact_lock(${SCHEDULE_LOCK_SPACE}, 0)`.execute(trx);
      const waiting = await sql<{ key: string }>`
        SELECT singleton_key AS key FROM ${sql.table(`${ALERT_QUEUE_SCHEMA}.job`)}
         WHERE name = ${ALERT_DUE_QUEUE} AND state IN ('created', 'retry') AND singleton_key IS NOT NULL`.execute(trx);
      const have = new Set(waiting.rows.map((r) => r.key));
      const missing = items.filter((item) => !have.has(jobKey(item)));
      const db = { executeSql: (text: string, values: unknown[]) => trx.executeQuery(CompiledQuery.raw(text, values)) };
      for (let i = 0; i < missing.length; i += 1000) {
        await this.boss.insert(
          missing.slice(i, i + 1000).map((item) => ({
            name: ALERT_DUE_QUEUE,
            data: { deliveryId: item.deliveryId } satisfies AlertDueJob,
            startAfter: item.at,
            singletonKey: jobKey(item),
            ...RETRY,
          })),
          { db },
        );
      }
      return missing.length;
    });
  }
}

export interface ScheduleItem {
  deliveryId: string;
  slotKey: string;
  at: Date;
}

/** The job's key includes the time, so a moved delivery gets a fresh job. */
const jobKey = (item: ScheduleItem): string => `${item.slotKey}:${item.deliveryId}:${item.at.getTime()}`;

/** A failed delivery is tried again five times, 30 s apart and growing. */
const RETRY = { retryLimit: 5, retryDelay: 30, retryBackoff: true } as const;
