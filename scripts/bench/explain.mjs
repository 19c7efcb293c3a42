#!/usr/bin/env node
// `node scripts/bench/explain.mjs` while `npm run bench -- --hold` keeps the bench database up:
// where the time of the slow routes goes, phase by phase, with the built API's own modules
// (BENCH_API_DIST, default api/dist) in this process — the SQL each route runs, then the model's
// arithmetic on the rows. Medians of a few repetitions, in ms.
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { pathToFileURL } from 'node:url';
import { root } from '../lib/project.mjs';

const dist = resolve(root, process.env.BENCH_API_DIST ?? join('api', 'dist'));
const hold = JSON.parse(readFileSync(join(root, '.data', 'bench', 'hold.json'), 'utf8'));
const load = (path) => import(pathToFileURL(join(dist, 'src', path)).href);

const { openDatabase } = await load('db/database.js');
const { CultureSummaryRepository } = await load('culture/culture-summary.repository.js');
const { toHistory } = await load('culture/culture-summary.service.js');
const { computeSummary, riseOf } = await load('culture/culture-summary.compute.js');
const { readCulture } = await load('class-logs/roster.compute.js');
const { toCulture } = await load('culture/culture.mapper.js');

const { db } = openDatabase(hold.databaseUrl);
const repository = new CultureSummaryRepository(db);
const rows = [];
async function time(label, work, repeat = 5) {
  const times = [];
  let result;
  for (let i = 0; i < repeat; i++) {
    const started = performance.now();
    result = await work();
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  rows.push([label, times[Math.floor(times.length / 2)].toFixed(1), repeat]);
  return result;
}

try {
  const now = new Date();
  const cultureId = hold.summaryPath.split('/')[3];
  const culture = await db.selectFrom('culture').selectAll().where('id', '=', cultureId).executeTakeFirstOrThrow();
  const stored = await time('summary: SQL (history, 3 queries)', () => repository.history(cultureId));
  const history = await time('summary: rows → history', () => toHistory(stored));
  await time('summary: computeSummary (all of it)', () => computeSummary(toCulture(culture), history, now));
  await time(`summary: fitRise of each of ${history.length} feedings`, () => history.map(riseOf));
  await time('summary: fitRise of the running feeding only', () => riseOf(history[0]));

  // A feeding POST refreshes the culture's alerts, which computes the same summary (AlertScheduler).
  const jarId = hold.feedingPath.split('/')[3];
  const jar = await db.selectFrom('culture').selectAll().where('id', '=', jarId).executeTakeFirstOrThrow();
  const jarHistory = toHistory(await repository.history(jarId));
  await time(`feeding POST: its alert refresh's computeSummary (${jarHistory.length} feedings)`, () =>
    computeSummary(toCulture(jar), jarHistory, now),
  );

  const classId = hold.rosterPath.split('/')[3];
  const klass = await db
    .selectFrom('bakingClass')
    .select(['startsOn'])
    .where('id', '=', classId)
    .executeTakeFirstOrThrow();
  const cultures = await db
    .selectFrom('culture')
    .innerJoin('classMember', 'classMember.accountId', 'culture.accountId')
    .selectAll('culture')
    .where('classMember.classId', '=', classId)
    .where('classMember.leftAt', 'is', null)
    .execute();
  const students = await time(
    `roster: SQL (history of ${cultures.length} cultures, one after another)`,
    async () => {
      const out = [];
      for (const c of cultures) {
        out.push({
          student: { id: c.accountId, displayName: c.accountId },
          culture: toCulture(c),
          history: toHistory(await repository.history(c.id)),
        });
      }
      return out;
    },
    3,
  );
  const since = new Date(klass.startsOn).getTime();
  const feedings = students.reduce((n, s) => n + s.history.length, 0);
  await time(
    `roster: readCulture × ${students.length} (${feedings} feedings)`,
    () => students.map((s) => readCulture(s, now, since)),
    1,
  );
  await time(
    `roster: fitRise of each of those ${feedings} feedings`,
    () => students.map((s) => s.history.map(riseOf)),
    1,
  );
} finally {
  await db.destroy();
}

const width = Math.max(...rows.map((r) => r[0].length));
process.stdout.write(
  [
    `${'phase'.padEnd(width)}  median ms  runs`,
    ...rows.map(([l, ms, n]) => `${l.padEnd(width)}  ${ms.padStart(9)}  ${String(n).padStart(4)}`),
  ].join('\n') + '\n',
);
