import type { BakePlanView, CheckedStep, DoughReading } from '@peakwise/shared';
import { beforeEach, describe, expect, it } from 'vitest';
import {
  HOUR,
  MINUTE,
  NOW,
  ZONE,
  caller,
  created,
  createFormula,
  cultureWithPeaks,
  iso,
  mockClock,
  planBody,
  type Clock,
  type Method,
} from './bake-plan.fixtures.js';
import { expectError, expectFieldErrors, signUp, withSignedInBaker, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

let t: TestApp;
let theo: SignedUp;
let amara: SignedUp;
let clock: Clock;
withSignedInBaker({ timeZone: ZONE }, (app, baker) => {
  t = app;
  theo = baker;
});
beforeEach(async () => {
  amara = await signUp(t.app, { displayName: 'Amara Quist', timeZone: ZONE });
  clock = mockClock(t);
});
const call: ReturnType<typeof caller> = (...args) => caller(t, () => theo)(...args);

async function theosPlan() {
  const formula = await createFormula(call);
  const { culture, feedings } = await cultureWithPeaks(call);
  const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id, { cultureId: culture.id })));
  return { formula, culture, feedings, plan };
}

describe('owner only', () => {
  it("another account's plan, formula, culture, feeding or reading answers 404 on every route", async () => {
    const { formula, culture, feedings, plan } = await theosPlan();
    clock.set(NOW + HOUR);
    const reading = await created<DoughReading>(
      call('POST', `/api/plans/${plan.id}/readings`, { takenAt: iso(NOW + HOUR), temperatureC: 24 }),
    );
    const p = `/api/plans/${plan.id}`;
    const routes: [Method, string, unknown?][] = [
      ['GET', p],
      ['GET', `${p}/calendar.ics`],
      ['PATCH', p, { name: 'Mine now' }],
      ['POST', `${p}/steps/mix/done`, {}],
      ['DELETE', `${p}/steps/mix/done`],
      ['POST', `${p}/readings`, { takenAt: iso(NOW), risePct: 10 }],
      ['DELETE', `${p}/readings/${reading.id}`],
      ['POST', `${p}/finish`, { rating: 1 }],
      ['DELETE', p],
    ];
    for (const [method, url, body] of routes) {
      expectError(await call(method, url, body, amara), 404);
    }
    // Amara's own plan cannot reach Theo's formula, culture, feeding or reading either.
    const mine = await createFormula(call, undefined, amara);
    const settings = { mode: 'start-now', doughTemperatureC: 24 };
    expectError(await call('POST', '/api/plans/preview', { formulaId: formula.id, ...settings }, amara), 404);
    const withCulture = { formulaId: mine.id, cultureId: culture.id, ...settings };
    expectError(await call('POST', '/api/plans/preview', withCulture, amara), 404);
    const ownPlan = await created<BakePlanView>(call('POST', '/api/plans', planBody(mine.id), amara));
    const own = `/api/plans/${ownPlan.id}`;
    expectError(await call('POST', `${own}/finish`, { feedingId: feedings[0]!.id }, amara), 404);
    expectError(await call('DELETE', `${own}/readings/${reading.id}`, undefined, amara), 404);

    // Nothing of Theo's changed, and his list does not show Amara's plan.
    const still = await created<BakePlanView>(call('GET', p), 200);
    expect(still.name).toBe(plan.name);
    expect(still.readings).toHaveLength(1);
    expect((await call('GET', '/api/plans')).json<{ total: number }>().total).toBe(1);
  });
});

describe('validation', () => {
  it('names the fields, nested ones by their dotted path', async () => {
    const formula = await createFormula(call);
    const base = { formulaId: formula.id, mode: 'ready-at', readyAt: iso(NOW + 20 * HOUR), doughTemperatureC: 24 };
    const preview = (body: object) => call('POST', '/api/plans/preview', body);
    expectFieldErrors(await preview({ ...base, quietHours: { from: '25:00', until: '06:00' } }), ['quietHours.from']);
    expectFieldErrors(await preview({ ...base, steps: { folds: { sets: 20 } } }), ['steps.folds.sets']);
    expectFieldErrors(await preview({ ...base, steps: { finalProof: { kind: 'retard', hours: 2 } } }), [
      'steps.finalProof.hours',
    ]);
    expectFieldErrors(await preview({ ...base, starter: { ratio: { starter: 1, flour: 2 } } }), [
      'starter.ratio.water',
    ]);
    expectFieldErrors(await preview({ ...base, doughTemperatureC: 45 }), ['doughTemperatureC']);
    expectFieldErrors(await preview({ ...base, formulaId: 'loaf' }), ['formulaId']);
    expectFieldErrors(await preview({ ...base, readyAt: undefined }), ['readyAt']);
    expectFieldErrors(await preview({ ...base, mode: 'start-now' }), ['readyAt']);
    expectFieldErrors(await preview({ ...base, extra: 1 }), ['extra']);
    // readyAt: ahead of the server's now, and within the planner's reach.
    expectFieldErrors(await preview({ ...base, readyAt: iso(NOW - MINUTE) }), ['readyAt']);
    expectFieldErrors(await preview({ ...base, readyAt: iso(NOW + 8 * 24 * HOUR) }), ['readyAt']);
    // The planner's own refusals come back at the request's field.
    expectFieldErrors(await preview({ ...base, quietHours: { from: '23:00', until: '23:00' } }), ['quietHours.until']);
    expectFieldErrors(await preview({ ...base, starter: { ratio: { starter: 1, flour: 0, water: 0 } } }), [
      'starter.ratio.flour',
    ]);
    expectFieldErrors(await preview({ ...base, prefer: 'overnight-retard', steps: { finalProof: { kind: 'room' } } }), [
      'prefer',
    ]);
    const noStarter = await createFormula(call, {
      name: 'Yeasted',
      ingredients: [
        { kind: 'flour', name: 'Flour', amount: 500, unit: 'g' },
        { kind: 'water', name: 'Water', amount: 350, unit: 'g' },
      ],
    });
    expectFieldErrors(await preview({ ...base, formulaId: noStarter.id }), ['formulaId']);
    expectFieldErrors(await call('POST', '/api/plans', { ...base, option: 'tomorrow' }), ['option']);
  });

  it('check-offs, readings and the finish name their fields', async () => {
    const { plan } = await theosPlan();
    clock.set(NOW + HOUR);
    const p = `/api/plans/${plan.id}`;
    expectFieldErrors(await call('POST', `${p}/steps/knead/done`, {}), ['stepId']);
    expectFieldErrors(await call('POST', `${p}/steps/fold-9/done`, {}), ['stepId']);
    const backwards = { startedAt: iso(NOW + 30 * MINUTE), endedAt: iso(NOW) };
    expectFieldErrors(await call('POST', `${p}/steps/mix/done`, backwards), ['endedAt']);
    expectFieldErrors(await call('POST', `${p}/steps/mix/done`, { startedAt: iso(Date.now() + 2 * HOUR) }), [
      'startedAt',
    ]);
    expectFieldErrors(await call('POST', `${p}/readings`, { takenAt: iso(NOW) }), ['temperatureC']);
    expectFieldErrors(await call('POST', `${p}/readings`, { takenAt: iso(NOW), risePct: 500 }), ['risePct']);
    expectFieldErrors(await call('POST', `${p}/finish`, { rating: 6 }), ['rating']);
    expectFieldErrors(await call('PATCH', p, { status: 'finished' }), ['status']);
    expectFieldErrors(await call('GET', '/api/plans?status=baking'), ['status']);
    expectFieldErrors(await call('GET', '/api/plans/not-an-id'), ['id']);
  });
});

describe('check-off retries', () => {
  it('a retried check-off with the same Idempotency-Key writes once; a different one replaces the times', async () => {
    const { plan } = await theosPlan();
    clock.set(NOW + HOUR);
    const url = `/api/plans/${plan.id}/steps/feed-starter/done`;
    const body = { startedAt: iso(NOW + 5 * MINUTE) };
    const post = (key: string, payload: object) =>
      t.app.inject({ method: 'POST', url, payload, headers: { cookie: theo.cookie, 'idempotency-key': key } });
    const first = await post('check-1', body);
    expect(first.statusCode, first.body).toBe(201);
    const rowAfterFirst = await t.db.selectFrom('bakePlanStep').selectAll().where('planId', '=', plan.id).execute();
    const again = await post('check-1', body);
    expect(again.statusCode).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.json()).toEqual(first.json());
    const rows = await t.db.selectFrom('bakePlanStep').selectAll().where('planId', '=', plan.id).execute();
    expect(rows).toEqual(rowAfterFirst);

    const changed = await post('check-2', { startedAt: iso(NOW + 10 * MINUTE) });
    expect(changed.json<CheckedStep>().startedAt).toBe(iso(NOW + 10 * MINUTE));
    const view = await created<BakePlanView>(call('GET', `/api/plans/${plan.id}`), 200);
    expect(view.checked).toEqual([{ stepId: 'feed-starter', startedAt: iso(NOW + 10 * MINUTE), endedAt: null }]);
  });
});

describe('rename, cancel, finish, delete', () => {
  it('finishes with notes, a rating and a feeding of the plan’s culture; finishing again edits the record', async () => {
    const { plan, feedings } = await theosPlan();
    const other = await created<{ id: string }>(call('POST', '/api/cultures', { name: 'Rye jar' }));
    const otherFeeding = await created<{ id: string }>(
      call('POST', `/api/cultures/${other.id}/feedings`, { fedAt: iso(NOW), starterG: 10, flourG: 50, waterG: 50 }),
    );
    const p = `/api/plans/${plan.id}`;
    expectFieldErrors(await call('POST', `${p}/finish`, { feedingId: otherFeeding.id }), ['feedingId']);
    clock.set(NOW + 20 * HOUR);
    const done = await created<BakePlanView>(
      call('POST', `${p}/finish`, { notes: ' Open crumb. ', rating: 4, feedingId: feedings[1]!.id }),
      200,
    );
    expect(done).toMatchObject({ status: 'finished', notes: 'Open crumb.', rating: 4, feedingId: feedings[1]!.id });
    expect(done.finishedAt).toBe(iso(NOW + 20 * HOUR));
    clock.set(NOW + 30 * HOUR);
    const edited = await created<BakePlanView>(call('POST', `${p}/finish`, { rating: 5, notes: null }), 200);
    expect(edited).toMatchObject({ rating: 5, notes: null, feedingId: feedings[1]!.id, finishedAt: done.finishedAt });
    // The record keeps the timeline as it stood at the finish, not re-planned at a later now.
    expect(Date.parse(edited.live.now)).toBe(NOW + 20 * HOUR);
    expect(edited.live).toEqual(done.live);
    // A finished plan takes no more check-offs and cannot be cancelled.
    expectError(await call('POST', `${p}/steps/mix/done`, {}), 409);
    expectError(await call('PATCH', p, { status: 'cancelled' }), 409);
    const list = await call('GET', '/api/plans?status=finished');
    expect(list.json<{ items: { id: string }[] }>().items.map((i) => i.id)).toEqual([plan.id]);
  });

  it('renames and cancels; a cancelled plan cannot be finished; delete removes it', async () => {
    const formula = await createFormula(call);
    const plan = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id, { name: 'Saturday' })));
    expect(plan.name).toBe('Saturday');
    const p = `/api/plans/${plan.id}`;
    const renamed = await created<BakePlanView>(call('PATCH', p, { name: '  Sunday loaf ' }), 200);
    expect(renamed.name).toBe('Sunday loaf');
    const cancelled = await created<BakePlanView>(call('PATCH', p, { status: 'cancelled' }), 200);
    expect(cancelled.status).toBe('cancelled');
    expect(cancelled.cancelledAt).toBe(iso(NOW));
    expectError(await call('POST', `${p}/finish`, {}), 409);
    expect((await call('DELETE', p)).statusCode).toBe(204);
    expectError(await call('GET', p), 404);
    expect(await t.db.selectFrom('bakePlan').select('id').execute()).toEqual([]);
  });
});
