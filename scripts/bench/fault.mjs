#!/usr/bin/env node
// `npm run bench:fault [-- --writes=500] [-- api|postgres]`: crash tests, a script that prints a
// table (not a timed test). On the bench's own durable PostgreSQL and the built API it sends
// `--writes` feedings, all at once, each with its own Idempotency-Key and retried with that key
// until it gets a 2xx, while
//   api:      the API process is killed with SIGKILL and started again;
//   postgres: the PostgreSQL postmaster is killed with SIGKILL and started again (the API stays up
//             and must answer 503 with Retry-After meanwhile, then recover by itself).
// Then it counts the culture's feedings: every write that got a 2xx must be there, none twice.
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ensureNodeModules } from '../lib/install.mjs';
import { ensureDataDir, root } from '../lib/project.mjs';
import { log } from '../lib/run.mjs';

const args = process.argv.slice(2);
const writesArg = args.find((a) => a.startsWith('--writes='));
const WRITES = writesArg ? Number(writesArg.split('=')[1]) : 500;
// All writes in flight together (500 concurrent by default), as a busy morning of bakers would.
const CONCURRENCY = WRITES;
const runs = args.filter((a) => !a.startsWith('-'));
const want = (name) => runs.length === 0 || runs.includes(name);

ensureNodeModules(root);
ensureDataDir();
const setup = await import('./setup.mjs');
const { table } = await import('./report.mjs');
const pg = (await import('pg')).default;

const { apiDist, webDist } = setup.buildPaths();
await setup.requireFreePorts([
  ['PostgreSQL', setup.ports.pg],
  ['API', setup.ports.api],
  ['fake SMTP', setup.ports.smtp],
]);
const cluster = await setup.startCluster();
const databaseUrl = cluster.url(setup.DATABASE);
setup.migrate(apiDist, databaseUrl);
const mail = await setup.startFakeMail(apiDist);
const sessionSecret = setup.newSessionSecret();
const startApi = () => setup.startApi({ apiDist, webDist, databaseUrl, smtpUrl: mail.smtpUrl, sessionSecret });
let api = await startApi();
const baseUrl = api.baseUrl;

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

async function signUpBaker() {
  const email = `fault-${randomUUID().slice(0, 8)}@bench.example`;
  const password = 'bench-Levain-starter-2026!';
  const up = await fetch(`${baseUrl}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, displayName: 'Fault Baker', password, timeZone: 'Europe/London' }),
  });
  if (up.status !== 201) throw new Error(`sign-up: ${up.status} ${await up.text()}`);
  const cookie = up.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('peakwise.sid='));
  const culture = await fetch(`${baseUrl}/api/cultures`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie, 'idempotency-key': randomUUID() },
    body: JSON.stringify({ name: 'Crash Jar' }),
  });
  if (culture.status !== 201) throw new Error(`culture: ${culture.status} ${await culture.text()}`);
  return { cookie, cultureId: (await culture.json()).id };
}

/**
 * Sends every write until it gets a 2xx, each with its own key on every attempt. Records the
 * feeding id each 2xx answered, the attempts, and the 503s (and whether they said Retry-After).
 */
async function drive({ cookie, cultureId }, onProgress) {
  const stats = { ok: 0, attempts: 0, networkErrors: 0, s503: 0, s503WithRetryAfter: 0, s409: 0, other: {} };
  const ids = new Map();
  let next = 0;
  const one = async (i) => {
    const key = randomUUID();
    const body = JSON.stringify({ starterG: 20, flourG: 100, waterG: 100, notes: `write ${i}` });
    for (;;) {
      stats.attempts++;
      let res;
      try {
        res = await fetch(`${baseUrl}/api/cultures/${cultureId}/feedings`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', cookie, 'idempotency-key': key },
          body,
          signal: AbortSignal.timeout(60_000),
        });
      } catch {
        stats.networkErrors++;
        await sleep(300);
        continue;
      }
      if (res.status === 201) {
        ids.set(key, (await res.json()).id);
        stats.ok++;
        onProgress(stats.ok);
        return;
      }
      await res.arrayBuffer();
      if (res.status === 503) {
        stats.s503++;
        if (res.headers.get('retry-after')) stats.s503WithRetryAfter++;
      } else if (res.status === 409) stats.s409++;
      else stats.other[res.status] = (stats.other[res.status] ?? 0) + 1;
      await sleep(res.status === 503 ? 500 : 200);
    }
  };
  const worker = async () => {
    while (next < WRITES) await one(next++);
  };
  await Promise.all(Array.from({ length: CONCURRENCY }, worker));
  return { stats, ids };
}

async function count(cultureId, ids) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const rows = (await client.query('SELECT id FROM feeding WHERE culture_id = $1', [cultureId])).rows;
    const stored = new Set(rows.map((r) => r.id));
    const answered = [...ids.values()];
    return {
      rows: rows.length,
      missing: answered.filter((id) => !stored.has(id)).length,
      extra: rows.length - new Set(answered).size,
    };
  } finally {
    await client.end();
  }
}

function postmasterPid() {
  return Number(readFileSync(join(cluster.dir, 'postmaster.pid'), 'utf8').split('\n')[0]);
}

async function restartPostgres() {
  for (let attempt = 1; ; attempt++) {
    try {
      cluster.started = false;
      await cluster.start();
      return;
    } catch (error) {
      // Backends of the killed postmaster may hold its shared memory for a moment.
      if (attempt >= 20) throw error;
      await sleep(500);
    }
  }
}

const results = [];
async function run(name, crash) {
  const baker = await signUpBaker();
  let crashed = false;
  const crashAt = Math.floor(WRITES / 4);
  const crashing = { promise: null };
  const started = Date.now();
  const { stats, ids } = await drive(baker, (done) => {
    if (!crashed && done >= crashAt) {
      crashed = true;
      crashing.promise = crash();
    }
  });
  await crashing.promise;
  const counted = await count(baker.cultureId, ids);
  results.push([
    name,
    String(WRITES),
    String(stats.ok),
    String(stats.attempts - WRITES),
    String(stats.networkErrors),
    `${stats.s503} (${stats.s503WithRetryAfter} with Retry-After)`,
    String(stats.s409),
    JSON.stringify(stats.other),
    String(counted.rows),
    String(counted.missing),
    String(counted.extra),
    ((Date.now() - started) / 1000).toFixed(1),
  ]);
  return counted.rows === WRITES && counted.missing === 0 && counted.extra === 0 && stats.ok === WRITES;
}

let allOk = true;
try {
  if (want('api')) {
    allOk =
      (await run('API killed (SIGKILL) and restarted', async () => {
        log('killing the API with SIGKILL');
        process.kill(api.pid, 'SIGKILL');
        await sleep(1000);
        api = await startApi();
        log('API restarted');
      })) && allOk;
  }
  if (want('postgres')) {
    allOk =
      (await run('PostgreSQL killed (SIGKILL) and restarted', async () => {
        log('killing PostgreSQL with SIGKILL');
        process.kill(postmasterPid(), 'SIGKILL');
        await sleep(3000);
        await restartPostgres();
        log('PostgreSQL restarted');
      })) && allOk;
  }
} finally {
  await api.stop().catch(() => undefined);
  await mail.stop().catch(() => undefined);
  cluster.stop();
}

process.stdout.write(
  table(
    `Crash tests: ${WRITES} feeding writes, ${CONCURRENCY} at a time, each retried with its Idempotency-Key until a 2xx`,
    [
      'run',
      'writes',
      '2xx',
      'retries',
      'no answer',
      '503',
      '409',
      'other',
      'rows stored',
      '2xx missing',
      'stored twice',
      's',
    ],
    results,
  ) + '\n',
);
process.stdout.write(allOk ? 'every write that got a 2xx is stored exactly once\n' : 'FAILED: see the table\n');
process.exit(allOk ? 0 : 1);
