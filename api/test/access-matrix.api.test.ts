import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildWorld, type World } from './access-matrix.fixtures.js';
import { ROLES } from './access-matrix.model.js';
import { newTally, runRoute } from './access-matrix.runner.js';
import { MATRIX, NOT_IN_MATRIX } from './access-matrix.table.js';
import { openDatabase } from '../src/db/database.js';
import { startTestBucket, storageConfig, type TestBucket } from './s3-fixture.js';
import { createTestApp, resetDatabase, testConfig, type TestApp } from './test-app.js';

// The authorisation matrix: every route the app registers × anonymous, baker A, baker B, the
// instructor of A's class, an instructor of another class and an admin × A's and B's objects
// → the status class each must get (access-matrix.table*.ts), and no answer carrying another
// baker's ids or names unless the route may show them. Refused requests must write nothing.

let t: TestApp;
let bucket: TestBucket;
let world: World;
/** "METHOD /path" of every route, as Fastify registered it (collected while the app starts). */
const registered = new Set<string>();
const tally = newTally();

beforeAll(async () => {
  // Emptied before the app starts: on start it queues a job for every open alert delivery, and
  // earlier runs leave thousands of them.
  const handle = openDatabase(testConfig().databaseUrl, 1);
  await resetDatabase(handle.db);
  await handle.db.destroy();
  bucket = await startTestBucket();
  t = await createTestApp(storageConfig(bucket), {
    beforeConfigure: (fastify) =>
      fastify.addHook('onRoute', (route) => {
        for (const method of [route.method].flat()) registered.add(`${method} ${route.url}`);
      }),
  });
  world = await buildWorld(t);
}, 180_000);

afterAll(async () => {
  const roles = tally.roles.size;
  console.log(
    [
      'Access matrix',
      `  routes × roles checked: ${tally.routes} routes (${tally.objectRoutes} of them on A's and on B's objects) × ${roles} roles = ${tally.cells} requests`,
      `  answers not as the matrix says: ${tally.mismatches.length}`,
      `  unexpected 2xx: ${tally.unexpected2xx.length}`,
      `  rows leaked: ${tally.leaks.length}`,
      `  refused requests that wrote: ${tally.refusedWrites.length}`,
      `  not in the matrix by rule: ${Object.keys(NOT_IN_MATRIX).length} listed, plus HEAD twins of GET routes`,
    ].join('\n'),
  );
  await t?.close();
  await bucket?.stop();
});

/** HEAD answers through its GET's handler and guard (Fastify adds it), so the GET stands for both. */
function isHeadTwin(key: string): boolean {
  return key.startsWith('HEAD ') && registered.has(`GET ${key.slice('HEAD '.length)}`);
}

describe('the access matrix', () => {
  it('classifies every route the app registers, and lists no route the app lacks', () => {
    const routes = [...registered].filter((key) => !isHeadTwin(key) && !(key in NOT_IN_MATRIX));
    const unclassified = routes.filter((key) => !(key in MATRIX)).sort();
    expect(unclassified, 'routes missing from access-matrix.table*.ts: say who may use them').toEqual([]);
    const stale = Object.keys(MATRIX)
      .filter((key) => !registered.has(key))
      .sort();
    expect(stale, 'matrix entries for routes the app does not register').toEqual([]);
    expect(ROLES).toHaveLength(6);
  });

  for (const [key, route] of Object.entries(MATRIX)) {
    // Generous: on a busy machine one route's dozen requests can take seconds.
    it(`${key}: ${route.access.name}`, { timeout: 120_000 }, async () => {
      const before = {
        mismatches: tally.mismatches.length,
        leaks: tally.leaks.length,
        writes: tally.refusedWrites.length,
      };
      await runRoute(world, key, route, tally);
      expect(tally.mismatches.slice(before.mismatches), 'answers not as the matrix says').toEqual([]);
      expect(tally.leaks.slice(before.leaks), "another baker's rows in an answer").toEqual([]);
      expect(tally.refusedWrites.slice(before.writes)).toEqual([]);
    });
  }
});
