import { describe, expect, it } from 'vitest';
import { ALERT_KINDS } from '../contracts/alert.js';
import type { CultureSummary } from '../contracts/culture-summary.js';
import type { PlanStep } from '../fermentation/plan/types.js';
import { CULTURE_ALERT_KINDS, cultureAlerts } from './culture-rules.js';
import { PLAN_ALERT_KINDS, planAlerts } from './plan-rules.js';

// The kind lists bound what a refresh may cancel (AlertRepository.cancelPending), so a kind the
// rules start producing must be listed, and a kind of its own (comment) must stay out.

const FED = '2026-12-05T08:00:00.000Z';

const counterCulture = {
  culture: { id: 'c1', name: 'Juniper', location: 'counter', archived: false },
  state: 'rising',
  lastFedAt: FED,
  running: {
    feeding: { id: 'f1', fedAt: FED },
    riseStatus: 'rising',
    readings: [],
    fittedCurve: null,
    riseMultiple: null,
    peakAt: '2026-12-05T14:00:00.000Z',
    readyFrom: '2026-12-05T13:00:00.000Z',
    readyUntil: '2026-12-05T15:00:00.000Z',
  },
  forecast: null,
} as unknown as CultureSummary;

const step = (id: string, kind: PlanStep['kind'], at: string): PlanStep =>
  ({ id, kind, startAt: at, endAt: at, done: false }) as unknown as PlanStep;

describe('alert kinds per subject', () => {
  it('a culture with a ready window yields exactly the culture kinds', () => {
    const alerts = cultureAlerts({
      accountId: 'a1',
      summary: counterCulture,
      leadMinutes: 0,
      now: FED,
      timeZone: 'UTC',
    });
    expect(new Set(alerts.map((a) => a.kind))).toEqual(new Set(CULTURE_ALERT_KINDS));
  });

  it('a plan yields only plan kinds', () => {
    const steps = ['fold', 'bulk-end', 'take-out', 'preheat', 'bake'].map((kind, i) =>
      step(`s${i}`, kind as PlanStep['kind'], `2026-12-05T1${i}:00:00.000Z`),
    );
    const alerts = planAlerts({ accountId: 'a1', plan: { id: 'p1', name: 'Loaf', status: 'active', steps }, now: FED });
    expect(alerts.length).toBe(steps.length);
    expect(new Set(alerts.map((a) => a.kind))).toEqual(new Set(PLAN_ALERT_KINDS));
  });

  it('no kind belongs to both, and comment belongs to neither', () => {
    const ruled: string[] = [...CULTURE_ALERT_KINDS, ...PLAN_ALERT_KINDS];
    expect(new Set(ruled).size).toBe(ruled.length);
    expect(ruled).not.toContain('comment');
    expect(ALERT_KINDS).toEqual(expect.arrayContaining(ruled));
  });
});
