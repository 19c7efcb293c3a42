import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MATRIX } from './access-matrix.table.js';
import { requestsFor, type FuzzRequest } from './fuzz-bodies.js';
import {
  FUZZ_ONLY,
  NOTHING_TO_FUZZ,
  WRITE_METHODS,
  changedTables,
  prototypeKeys,
  sendFuzz,
  snapshot,
  startFuzzWorld,
  targetOf,
  urlOf,
  wrongAnswer,
  type FuzzWorld,
} from './fuzz-world.js';

// Property-based fuzz of every write route (POST/PUT/PATCH/DELETE with a body or a path id), as
// the app registers them: RUNS requests each, invalid by construction (fuzz-bodies.ts), sent as
// the caller who passes the route's access check. Each must answer a 4xx in the one error shape;
// none may write (every table but the bookkeeping ones is hashed before and after each route);
// the built-in prototypes must stay as they were; the server must still answer afterwards.
// The seed is fixed so a run repeats; FUZZ_SEED=<n> tries another (fast-check prints the seed
// and path of a failure, to replay it with FUZZ_SEED and FUZZ_PATH).

const RUNS = 1_000;
const SEED = Number(process.env.FUZZ_SEED ?? 20_261_202);
const PATH = process.env.FUZZ_PATH;

const isWrite = (key: string) => (WRITE_METHODS as readonly string[]).includes(key.slice(0, key.indexOf(' ')));
const ROUTES = [...Object.keys(MATRIX), ...Object.keys(FUZZ_ONLY)]
  .filter((key) => isWrite(key) && !(key in NOTHING_TO_FUZZ))
  .sort();

let fw: FuzzWorld;
let prototypesBefore: string;
const timings: string[] = [];
const started = Date.now();

beforeAll(async () => {
  prototypesBefore = prototypeKeys();
  fw = await startFuzzWorld();
}, 180_000);

afterAll(async () => {
  console.log(
    [
      `Write-route fuzz (seed ${SEED}): ${timings.length} routes × ${RUNS} requests in ${((Date.now() - started) / 1000).toFixed(1)} s`,
      ...timings,
    ].join('\n'),
  );
  await fw?.close();
});

describe('write-route fuzz', () => {
  it('fuzzes every write route the app registers, or names why not', async () => {
    const writes = [...fw.registered].filter(isWrite).sort();
    expect(
      writes.filter((key) => !ROUTES.includes(key) && !(key in NOTHING_TO_FUZZ)),
      'write routes without fuzz coverage: add them to the access matrix (it gives the valid body)',
    ).toEqual([]);
    expect(
      ROUTES.filter((key) => !writes.includes(key)),
      'fuzzed routes the app lacks',
    ).toEqual([]);
    // The routes left out are exactly those with nothing to send: no body, no path id.
    const empty: string[] = [];
    for (const key of writes) {
      const target = await targetOf(fw, key);
      if (!target.template && !target.upload && target.params.length === 0) empty.push(key);
    }
    expect(empty).toEqual(Object.keys(NOTHING_TO_FUZZ).sort());
  });
});

// Routes run a few at a time (vitest's maxConcurrency, 5): each route's requests still go one
// after another, but while one waits for the database another can run (on the two-core dev
// machine, busy with other test runs: 435 s one route at a time, 192 s five at a time). The tables are hashed before and after each route; invalid requests of any
// route may write nothing, so a write shows up in whichever route's window it falls, and the
// message says to rerun one at a time (FUZZ_SERIAL=1) to find the writer.
const routes = process.env.FUZZ_SERIAL ? describe : describe.concurrent;
routes('write-route fuzz, route by route', () => {
  for (const key of ROUTES) {
    it(
      `${key}: ${RUNS} invalid requests, each a 4xx in the error shape, nothing written`,
      { timeout: 120_000 },
      async () => {
        const target = await targetOf(fw, key);
        const before = await snapshot(fw);
        const t0 = Date.now();
        const statuses = new Map<number, number>();
        await fc.assert(
          fc.asyncProperty(requestsFor(target), async (request: FuzzRequest) => {
            const res = await sendFuzz(fw, target, request);
            statuses.set(res.statusCode, (statuses.get(res.statusCode) ?? 0) + 1);
            const wrong = wrongAnswer(target, request, res);
            if (wrong) {
              const sent =
                typeof request.payload === 'string' ? request.payload : String(request.payload?.length ?? 'none');
              throw new Error(
                `${wrong}\n  why invalid: ${request.why}\n  as ${target.role}: ${target.method} ${urlOf(target, request.ids).slice(0, 300)}\n` +
                  `  content-type: ${request.contentType ?? '(none)'}\n  body: ${sent.slice(0, 300)}\n` +
                  `  answer: ${res.statusCode} ${res.body.slice(0, 300)}`,
              );
            }
          }),
          { numRuns: RUNS, seed: SEED, ...(PATH ? { path: PATH } : {}), endOnFailure: true },
        );
        const ms = Date.now() - t0;
        const after = await snapshot(fw);
        const counts = [...statuses]
          .sort(([a], [b]) => a - b)
          .map(([s, n]) => `${s}×${n}`)
          .join(' ');
        timings.push(`  ${key} as ${target.role}: ${ms} ms (${counts})`);
        expect(
          changedTables(before, after),
          'tables changed while this route ran (FUZZ_SERIAL=1 runs one route at a time, to find the writer)',
        ).toEqual([]);
        expect(prototypeKeys(), 'built-in prototypes changed').toBe(prototypesBefore);
        expect(({} as Record<string, unknown>).polluted).toBeUndefined();
      },
    );
  }
});

describe('write-route fuzz, afterwards', () => {
  it('leaves the server healthy and the caller signed in', async () => {
    const health = await fw.t.app.inject({ method: 'GET', url: '/api/health' });
    expect(health.statusCode, health.body).toBe(200);
    const account = await fw.t.app.inject({
      method: 'GET',
      url: '/api/account',
      headers: { cookie: fw.world.callers.bakerA.cookie! },
    });
    expect(account.statusCode, account.body).toBe(200);
    expect(prototypeKeys()).toBe(prototypesBefore);
  });
});
