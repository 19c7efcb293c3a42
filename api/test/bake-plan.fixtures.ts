import type { BakePlanView, Culture, Feeding, Formula, PlanStep, RiseCheck } from '@peakwise/shared';
import { vi } from 'vitest';
import { BakePlanClock } from '../src/bake-plan/bake-plan.service.js';
import { created, gompertzHeight, send, type HttpMethod, type InjectResponse, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

// Shared by the bake-plan API tests: a formula, a culture with observed peaks, and a clock the
// plan service reads. The clock sits in the past (so check-offs and readings near it are not
// "in the future" for the logbook's own time checks) and moves only when a test moves it.

export const HOUR = 3_600_000;
export const MINUTE = 60_000;
/** A Friday morning, 08:00 in Berlin (UTC+1 in November). */
export const NOW = Date.parse('2026-11-20T07:00:00Z');
export const ZONE = 'Europe/Berlin';
export const iso = (ms: number) => new Date(ms).toISOString();

export interface Clock {
  set(ms: number): void;
}

export function mockClock(t: TestApp): Clock {
  let now = NOW;
  vi.spyOn(t.app.get(BakePlanClock), 'now').mockImplementation(() => new Date(now));
  return { set: (ms) => (now = ms) };
}

export type Method = HttpMethod;
export { created };

export function caller(t: TestApp, who: () => SignedUp) {
  return (method: Method, url: string, payload?: unknown, as: SignedUp = who()): Promise<InjectResponse> =>
    send(t.app, method, url, as.cookie, payload);
}

/** A lean country loaf by weight: 1000 g flour, 750 g water, 200 g levain at 100 %, 20 g salt. */
export const COUNTRY_LOAF = {
  name: 'Country loaf',
  ingredients: [
    { kind: 'flour', name: 'Bread flour', amount: 1000, unit: 'g' },
    { kind: 'water', name: 'Water', amount: 750, unit: 'g' },
    { kind: 'starter', name: 'Levain', amount: 200, unit: 'g', starterHydrationPct: 100 },
    { kind: 'salt', name: 'Salt', amount: 20, unit: 'g' },
  ],
};

export const createFormula = (call: ReturnType<typeof caller>, body: object = COUNTRY_LOAF, as?: SignedUp) =>
  created<Formula>(call('POST', '/api/formulas', body, as));

/** Settings for a plan that starts now (mix at the levain's peak). */
export const START_NOW = { mode: 'start-now', doughTemperatureC: 24 } as const;

export function planBody(formulaId: string, extra: Record<string, unknown> = {}) {
  return { formulaId, ...START_NOW, option: 'same-day', ...extra };
}

export const step = (view: { steps: PlanStep[] }, id: string): PlanStep => {
  const found = view.steps.find((s) => s.id === id);
  if (!found) throw new Error(`no step ${id} in ${view.steps.map((s) => s.id).join(', ')}`);
  return found;
};

export const getPlan = (call: ReturnType<typeof caller>, id: string) =>
  created<BakePlanView>(call('GET', `/api/plans/${id}`), 200);

/**
 * A culture with two feedings whose rise checks show a peak (a Gompertz rise, then a fall), so
 * the culture has kinetics of its own. Feedings lie in the past of the real clock.
 */
export async function cultureWithPeaks(call: ReturnType<typeof caller>, as?: SignedUp) {
  const culture = await created<Culture>(call('POST', '/api/cultures', { name: 'Bramble' }, as));
  const feedings: Feeding[] = [];
  for (const daysAgo of [4, 3]) {
    const fedAt = Date.now() - daysAgo * 24 * HOUR;
    const feeding = await created<Feeding>(
      call(
        'POST',
        `/api/cultures/${culture.id}/feedings`,
        { fedAt: iso(fedAt), starterG: 20, flourG: 40, waterG: 40, temperatureC: 24, initialHeightMm: 50 },
        as,
      ),
    );
    // Twice as fast as the rise of the published defaults' shape, so the culture is not average.
    const height = (h: number) => gompertzHeight(50, h, 2);
    const points = [1, 2, 3, 4, 5].map((h) => ({ h, mm: height(h) }));
    points.push({ h: 6, mm: height(5) - 20 }, { h: 7, mm: height(5) - 30 });
    for (const p of points) {
      await created<RiseCheck>(
        call(
          'POST',
          `/api/feedings/${feeding.id}/rise-checks`,
          { takenAt: iso(fedAt + p.h * HOUR), heightMm: p.mm },
          as,
        ),
      );
    }
    feedings.push(feeding);
  }
  return { culture, feedings };
}
