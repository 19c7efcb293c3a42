#!/usr/bin/env node
// `npm run bench [-- --quick] [-- api|web] [-- --seconds=N]`: speed tables of the running app, a
// script that prints numbers, not a test. It installs what is missing and builds like `npm start`,
// starts its own durable PostgreSQL (.data/pg-bench, port 54341), a fresh database with seeded
// data, the built API (port 3341) and a bare Fastify + pg baseline (3342), then measures:
//   api: feeding POST, culture summary (three years of daily feedings), class roster (30 students),
//        the bare baseline — autocannon on loopback, after a warm-up;
//   web: first-load JS per route (gzip) and Lighthouse's mobile performance score.
// Prints the tables and the budgets (PASS/MISS, by how much); writes .data/bench/last.json.
// `--hold` stops after seeding and keeps everything up for profiling by hand.
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { ensureChromium, ensureNodeModules } from '../lib/install.mjs';
import { ensureDataDir, root } from '../lib/project.mjs';
import { capture, log } from '../lib/run.mjs';

const PARTS = ['api', 'web'];
const args = process.argv.slice(2);
const quick = args.includes('--quick');
const hold = args.includes('--hold');
const secondsArg = args.find((a) => a.startsWith('--seconds='));
const parts = args.filter((a) => !a.startsWith('-'));
for (const p of parts) {
  if (!PARTS.includes(p)) {
    process.stderr.write(`usage: npm run bench [-- --quick] [-- --seconds=N] [-- ${PARTS.join('|')}]\n`);
    process.exit(2);
  }
}
const want = (part) => parts.length === 0 || parts.includes(part);
const seconds = secondsArg ? Number(secondsArg.split('=')[1]) : quick ? 3 : 10;
const warmupSeconds = quick ? 1 : 3;

ensureNodeModules(root);
ensureDataDir();
// Imported only now: these use packages that `npm ci` may just have installed.
const setup = await import('./setup.mjs');
const { seed, signIn, CLASS_SIZE } = await import('./seed.mjs');
const { FEEDING_BODY, feedingRequest, getRequest, measure, probe, serial, warmUp } = await import('./api-bench.mjs');
const { routeSizes } = await import('./web-size.mjs');
const { lighthouseScores } = await import('./lighthouse.mjs');
const { budgetTable, fixed, table, verdict } = await import('./report.mjs');
const { default: pg } = await import('pg');

const load = () => ({ uptime: capture('uptime', []), loadavg: loadavg().map((x) => Number(x.toFixed(2))) });
const started = Date.now();
const results = {
  startedAt: new Date(started).toISOString(),
  machine: { cpus: cpus().length, node: process.version },
  loadBefore: load(),
  options: { quick, parts: parts.length ? parts : PARTS, seconds, warmupSeconds },
};

const stoppers = [];
let cleaning = null;
function cleanUp() {
  cleaning ??= (async () => {
    for (const stop of stoppers.reverse()) {
      try {
        await stop();
      } catch (error) {
        process.stderr.write(`[peakwise] bench clean-up: ${error.message}\n`);
      }
    }
  })();
  return cleaning;
}
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    void cleanUp().then(() => process.exit(130));
  });
}

try {
  const { apiDist, webDist } = setup.buildPaths();
  results.builds = { apiDist, webDist };
  const chromium = want('web') ? ensureChromium() : null;
  await setup.requireFreePorts([
    ['API', setup.ports.api],
    ['bare baseline', setup.ports.bare],
    ['fake SMTP', setup.ports.smtp],
    ['fake SMTP HTTP', setup.ports.smtpHttp],
  ]);

  const cluster = await setup.startCluster();
  stoppers.push(() => cluster.stop());
  const databaseUrl = cluster.url(setup.DATABASE);
  log(`bench PostgreSQL on 127.0.0.1:${setup.ports.pg} (durable settings; data in ${cluster.dir})`);
  setup.migrate(apiDist, databaseUrl);
  const mail = await setup.startFakeMail(apiDist);
  stoppers.push(mail.stop);
  const apiOptions = { apiDist, webDist, databaseUrl, smtpUrl: mail.smtpUrl, sessionSecret: setup.newSessionSecret() };
  let api = await setup.startApi(apiOptions);
  stoppers.push(() => api.stop());
  log(`API on ${api.baseUrl} (logs in ${setup.benchDir}/api.log); seeding…`);

  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  let seeded;
  try {
    seeded = await seed({ baseUrl: api.baseUrl, client });
  } finally {
    await client.end();
  }
  results.seed = { counts: seeded.counts, seconds: seeded.seconds };
  log(
    `seeded ${seeded.counts.accounts} accounts, ${seeded.counts.feedings} feedings, ` +
      `${seeded.counts.riseChecks} rise checks in ${seeded.seconds.toFixed(1)} s`,
  );
  const baker = await signIn(api.baseUrl, 'baker@bench.example');
  const poster = await signIn(api.baseUrl, 'poster@bench.example');
  const teacher = await signIn(api.baseUrl, 'teacher@bench.example');

  const summaryPath = `/api/cultures/${seeded.threeYears}/summary`;
  const rosterPath = `/api/classes/${seeded.classId}/roster`;
  const feedingPath = `/api/cultures/${seeded.posterCultures[0]}/feedings`;
  // Every route answers as expected once before it is timed.
  await probe(api.baseUrl, summaryPath, { cookie: baker });
  const roster = JSON.parse(await probe(api.baseUrl, rosterPath, { cookie: teacher }));
  if (roster.total !== CLASS_SIZE) throw new Error(`the roster has ${roster.total} rows, not ${CLASS_SIZE}`);
  await probe(api.baseUrl, feedingPath, {
    cookie: poster,
    method: 'POST',
    body: FEEDING_BODY,
    expect: 201,
    headers: { 'idempotency-key': `probe-${Date.now()}` },
  });
  const withoutKey = await fetch(`${api.baseUrl}${feedingPath}`, {
    method: 'POST',
    headers: { cookie: poster, 'content-type': 'application/json' },
    body: FEEDING_BODY,
  });
  results.feedingWithoutKeyStatus = withoutKey.status;

  if (hold) {
    // For profiling by hand: everything stays up, with the sign-ins and ids in a file, until Ctrl-C.
    const file = join(setup.benchDir, 'hold.json');
    const ids = { api: api.baseUrl, databaseUrl, apiPid: api.pid, summaryPath, rosterPath, feedingPath };
    writeFileSync(file, JSON.stringify({ ...ids, cookies: { baker, poster, teacher } }, null, 2) + '\n', {
      mode: 0o600,
    });
    log(`holding (--hold): the API stays up on ${api.baseUrl}; sign-ins and paths in ${file}; Ctrl-C ends`);
    log('where the slow routes spend their time: node scripts/bench/explain.mjs (same BENCH_API_DIST)');
    await new Promise(() => {});
  }

  if (want('web')) {
    log('web: first-load JS per route…');
    results.web = { sizes: routeSizes(webDist) };
    log('web: Lighthouse (mobile) on the sign-in page and the Shelf…');
    results.web.lighthouse = await lighthouseScores(chromium, [
      { label: 'sign-in', url: `${api.baseUrl}/sign-in` },
      { label: 'Shelf', url: `${api.baseUrl}/shelf`, cookie: baker },
    ]);
  }

  if (want('api')) {
    const runs = [];
    const restarts = [];
    // Between runs: an overloaded run leaves queued requests computing; if they do not drain in
    // 20 s the API is restarted (same database and session secret), so the next run starts clean.
    const settle = async (after) => {
      if (await setup.settle(api.baseUrl)) return;
      log(`api: still busy after "${after}"; restarting it so the next run starts clean`);
      restarts.push(after);
      await api.stop();
      api = await setup.startApi(apiOptions);
    };
    const run = async ({ warmupConnections = 10, last = false, ...options }) => {
      log(`api: ${options.label}, ${options.connections} connections, ${seconds} s…`);
      const r = await measure({
        baseUrl: api.baseUrl,
        seconds,
        beforeRun: async (o) => {
          if (warmupConnections === 0) return;
          await warmUp(warmupSeconds, warmupConnections)(o);
          await settle(`${options.label} warm-up`);
        },
        ...options,
      });
      runs.push(r);
      if (!last) await settle(`${options.label} @ ${options.connections}`);
      return r;
    };
    log(`api: a) feeding POST, one request at a time…`);
    runs.push(
      await serial({
        label: 'a) feeding POST (Nest API)',
        baseUrl: api.baseUrl,
        path: feedingPath,
        headers: { cookie: poster },
        post: FEEDING_BODY,
        seconds: Math.min(seconds, 5),
      }),
    );
    const post = await run({
      label: 'a) feeding POST (Nest API)',
      connections: 100,
      headers: { cookie: poster },
      request: feedingRequest(seeded.posterCultures, { idempotencyKey: true }),
    });
    const bare = await setup.startBare(databaseUrl);
    stoppers.push(bare.stop);
    log(`api: d) feeding POST (bare Fastify + pg), 100 connections, ${seconds} s…`);
    const baseline = await measure({
      label: 'd) feeding POST (bare Fastify + pg)',
      baseUrl: bare.baseUrl,
      connections: 100,
      seconds,
      beforeRun: warmUp(warmupSeconds, 10),
      request: feedingRequest(seeded.posterCultures, { idempotencyKey: false }),
    });
    runs.push(baseline);
    await bare.stop();
    log(`api: b) culture summary, one request at a time…`);
    runs.push(
      await serial({
        label: 'b) culture summary (3 years daily)',
        baseUrl: api.baseUrl,
        path: summaryPath,
        headers: { cookie: baker },
        seconds: Math.min(seconds, 5),
      }),
    );
    const summary50 = await run({
      label: 'b) culture summary (3 years daily)',
      connections: 50,
      warmupConnections: 0, // the one-at-a-time run just before warmed it
      headers: { cookie: baker },
      request: getRequest(summaryPath),
    });
    await run({
      label: 'b) culture summary (3 years daily)',
      connections: 100,
      warmupConnections: 0,
      headers: { cookie: baker },
      request: getRequest(summaryPath),
    });
    log(`api: c) class roster, one request at a time…`);
    runs.push(
      await serial({
        label: `c) class roster (${CLASS_SIZE} students)`,
        baseUrl: api.baseUrl,
        path: rosterPath,
        headers: { cookie: teacher },
        seconds: Math.min(seconds, 5),
      }),
    );
    await run({
      label: `c) class roster (${CLASS_SIZE} students)`,
      connections: 100,
      warmupConnections: 0, // the one-at-a-time run just before warmed it
      last: true,
      headers: { cookie: teacher },
      request: getRequest(rosterPath),
    });
    results.api = { runs, summary50, post, baseline, ratio: post.rps / baseline.rps, restarts };
  }

  results.loadAfter = load();
  results.seconds = (Date.now() - started) / 1000;
  report(results);
} catch (error) {
  process.stderr.write(`[peakwise] bench failed: ${error.stack ?? error.message}\n`);
  process.exitCode = 1;
} finally {
  await cleanUp();
}

function report(r) {
  const ms = (x, censored) => (x === null ? null : `${censored ? '≥' : ''}${x}`);
  const out = [];
  const verdicts = [];
  if (r.api) {
    out.push(
      table(
        'API (autocannon on loopback; latency in ms)',
        ['measurement', 'conns', 'p50', 'p97.5', 'p99', 'max', 'req/s', 'answered', 'unanswered', 'non-2xx', 'errors'],
        r.api.runs.map((x) => [
          x.label,
          x.connections,
          x.p50,
          ms(x.p97_5, x.censored),
          ms(x.p99, x.censored),
          ms(x.max, x.censored),
          fixed(x.rps),
          x.requests,
          x.unfinished,
          x.non2xx,
          x.errors + x.timeouts,
        ]),
      ),
      "(≥: connections that got no answer during the whole run are more than 1 % of the requests: the true figure is at least the run's length)",
      ...(r.api.restarts.length ? [`API restarted after an overloaded run: ${r.api.restarts.join('; ')}`] : []),
      `feeding POST ÷ bare baseline: ${r.api.ratio.toFixed(2)}× (${fixed(r.api.post.rps)} vs ${fixed(r.api.baseline.rps)} req/s)`,
    );
    verdicts.push(
      verdict({
        name: 'feeding POST ÷ bare baseline (req/s)',
        measured: r.api.ratio,
        limit: 0.6,
        kind: 'min',
        unit: '×',
      }),
      verdict({
        name: 'culture summary p99 @ 50 connections',
        measured: r.api.summary50.p99,
        limit: 50,
        kind: 'max',
        unit: 'ms',
        strict: true,
      }),
    );
  }
  if (r.web) {
    const { sizes, lighthouse } = r.web;
    out.push(
      table(
        `Web first-load JS per route (gzip -9, KB; the entry ${sizes.entry} with its ${sizes.entryChunks} chunks is ${fixed(sizes.entryKB)} KB of each)`,
        ['route module', 'route chunks', 'first load'],
        sizes.routes.map((x) => [x.module, fixed(x.routeKB), fixed(x.totalKB)]),
      ),
      table(
        'Lighthouse 12.2.3, mobile (simulated slow 4G, 4× CPU slowdown)',
        ['page', 'score', 'FCP ms', 'LCP ms', 'TBT ms', 'CLS', 'SI ms', 'host index'],
        lighthouse.map((x) => [
          x.label,
          x.score,
          fixed(x.metrics.fcpMs, 0),
          fixed(x.metrics.lcpMs, 0),
          fixed(x.metrics.tbtMs, 0),
          fixed(x.metrics.cls, 3),
          fixed(x.metrics.siMs, 0),
          x.benchmarkIndex,
        ]),
      ),
    );
    for (const module of ['sign-in', 'home']) {
      const row = sizes.routes.find((x) => x.module === module);
      verdicts.push(
        verdict({
          name: `first-load JS, ${module} (gzip)`,
          measured: row?.totalKB,
          limit: 200,
          kind: 'max',
          unit: 'KB',
        }),
      );
    }
    for (const x of lighthouse) {
      verdicts.push(
        verdict({ name: `Lighthouse mobile, ${x.label}`, measured: x.score, limit: 90, kind: 'min', unit: 'pts' }),
      );
    }
  }
  r.budgets = verdicts;
  out.push(budgetTable(verdicts));
  out.push(
    '',
    `load before: ${r.loadBefore.uptime}`,
    `load after:  ${r.loadAfter.uptime}`,
    `${r.machine.cpus} cores; ${r.seconds.toFixed(0)} s in all; feeding POST without Idempotency-Key answered ${r.feedingWithoutKeyStatus}`,
  );
  const dir = join(root, '.data', 'bench');
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, 'last.json'), JSON.stringify(r, null, 2) + '\n');
  out.push(`results: ${join(dir, 'last.json')}`, '');
  process.stdout.write(out.join('\n') + '\n');
}
