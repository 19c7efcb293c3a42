// Alerts for the demo cultures. The seed writes the logbook straight into the tables, past the
// services that would refresh alerts after each write, so it asks the scheduler once at the end.
import type { AlertClock } from '../alert/alert.clock.js';
import type { AlertQueue } from '../alert/alert.queue.js';
import { AlertRepository } from '../alert/alert.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { BakePlanRepository } from '../bake-plan/bake-plan.repository.js';
import { CultureSummaryRepository } from '../culture/culture-summary.repository.js';
import { CultureRepository } from '../culture/culture.repository.js';
import type { Database } from '../db/database.js';

/**
 * The seed runs before the API and has no queue of its own. The scheduler's rows (alert and
 * delivery) are the promise; the API's worker queues a job for every open delivery when it starts
 * (AlertWorker.scheduleOpen), so here the queue step is left out.
 */
const NO_QUEUE = { schedule: () => Promise.resolve() } as unknown as AlertQueue;

/**
 * Plans the alerts every demo culture wants at `now`; returns how many alerts are open. Safe to run
 * again: alerts are keyed by slot (account, kind, culture, feeding), so a rerun updates in place.
 */
export async function scheduleDemoAlerts(db: Database, cultureIds: string[], now: Date): Promise<number> {
  const clock: AlertClock = { now: () => now };
  const scheduler = new AlertScheduler(
    new AlertRepository(db),
    NO_QUEUE,
    clock,
    new CultureRepository(db),
    new CultureSummaryRepository(db),
    new BakePlanRepository(db),
  );
  for (const id of cultureIds) await scheduler.refreshCulture(id);
  if (cultureIds.length === 0) return 0;
  const row = await db
    .selectFrom('alert')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .where('cultureId', 'in', cultureIds)
    .where('status', '=', 'pending')
    .executeTakeFirstOrThrow();
  return Number(row.n);
}
