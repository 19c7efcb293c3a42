import { existsSync } from 'node:fs';
import { sql } from 'kysely';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { openDatabase, type DatabaseHandle } from '../src/db/database.js';
import { startFakeSmtp, type FakeSmtp } from '../src/dev/fake-smtp.js';
import { API_ENTRY, bakerWithCulture, startApi, stopApi, type ApiProcess } from './alert-processes.fixtures.js';
import { resetDatabase, testConfig } from './test-app.js';

// The short version of `npm run bench:fault` (its API part): the built API is killed with SIGKILL
// while 100 feedings are being sent, 20 at a time, each retried with its own Idempotency-Key until
// it gets a 2xx; a new process takes over on the same database. Every 2xx must be stored, none
// twice. A claim the killed process left open is taken over after two minutes; the test moves
// those claims' clocks back instead of waiting.

const WRITES = 100;
const CONCURRENCY = 20;
const MAIL_FROM = 'Peakwise <no-reply@peakwise.invalid>';

let mailbox: FakeSmtp;
let handle: DatabaseHandle;
let api: ApiProcess;
beforeAll(async () => {
  if (!existsSync(API_ENTRY)) throw new Error(`${API_ENTRY} is missing: this test runs the built API (npm run build)`);
  mailbox = await startFakeSmtp({ smtpPort: 0, httpPort: 0, file: null });
  const config = testConfig();
  handle = openDatabase(config.databaseUrl, 2);
  await resetDatabase(handle.db);
  api = await startApi({ databaseUrl: config.databaseUrl, smtpUrl: mailbox.smtpUrl, mailFrom: MAIL_FROM });
}, 60_000);
afterAll(async () => {
  await stopApi(api);
  await handle.db.destroy();
  await mailbox.close();
}, 30_000);

it('keeps every write that got a 2xx exactly once when the API process is killed mid-stream', async () => {
  const baker = await bakerWithCulture(api);
  const answered = new Map<string, string>();
  let killed = false;
  let restarting: Promise<void> | null = null;
  const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

  const crash = async () => {
    api.child.kill('SIGKILL');
    await new Promise((r) => api.child.once('exit', r));
    api = await startApi({ databaseUrl: testConfig().databaseUrl, smtpUrl: mailbox.smtpUrl, mailFrom: MAIL_FROM });
    // Two minutes pass for the claims the dead process left without an answer.
    await sql`UPDATE idempotency_key SET created_at = created_at - interval '3 minutes' WHERE completed_at IS NULL`.execute(
      handle.db,
    );
  };

  const write = async (i: number) => {
    const key = crypto.randomUUID();
    const body = JSON.stringify({ starterG: 20, flourG: 100, waterG: 100, notes: `write ${i}` });
    for (;;) {
      await restarting;
      let res: Response;
      try {
        res = await fetch(`${api.url}/api/cultures/${baker.cultureId}/feedings`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', cookie: baker.cookie, 'idempotency-key': key },
          body,
        });
      } catch {
        await sleep(100);
        continue;
      }
      const text = await res.text();
      if (res.status === 201) {
        answered.set(key, (JSON.parse(text) as { id: string }).id);
        if (!killed && answered.size >= WRITES / 4) {
          killed = true;
          restarting = crash();
        }
        return;
      }
      // 409: the killed process's claim, until it is taken over; anything else is a failure.
      expect(res.status, text).toBe(409);
      await sleep(100);
    }
  };

  let next = 0;
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (next < WRITES) await write(next++);
    }),
  );
  expect(killed).toBe(true);
  expect(answered.size).toBe(WRITES);
  const rows = await handle.db.selectFrom('feeding').select('id').where('cultureId', '=', baker.cultureId).execute();
  const stored = new Set(rows.map((r) => r.id));
  expect(rows).toHaveLength(WRITES);
  expect([...answered.values()].filter((id) => !stored.has(id))).toEqual([]);
  expect(new Set(answered.values()).size).toBe(WRITES);
}, 120_000);
