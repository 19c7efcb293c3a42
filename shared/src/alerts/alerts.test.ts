import { describe, expect, it } from 'vitest';
import type { CultureSummary } from '../contracts/culture-summary.js';
import type { PlanStep } from '../fermentation/plan/types.js';
import { cultureAlerts, PAST_PEAK_STALE_HOURS } from './culture-rules.js';
import { deliveryFor } from './delivery-rules.js';
import { planAlerts } from './plan-rules.js';
import { channelsFor, defaultAlertPreferences, mergeAlertPreferences } from './preferences.js';

const FED = '2026-12-05T08:00:00.000Z';

function summary(
  over: {
    location?: 'counter' | 'fridge';
    readyFrom?: string | null;
    readyUntil?: string | null;
    archived?: boolean;
  } = {},
): CultureSummary {
  const readyFrom = over.readyFrom === undefined ? '2026-12-05T13:00:00.000Z' : over.readyFrom;
  const readyUntil = over.readyUntil === undefined ? '2026-12-05T15:00:00.000Z' : over.readyUntil;
  return {
    culture: { id: 'c1', name: 'Juniper', location: over.location ?? 'counter', archived: over.archived ?? false },
    state: 'rising',
    lastFedAt: FED,
    running: {
      feeding: { id: 'f1', fedAt: FED },
      riseStatus: 'rising',
      readings: [],
      fittedCurve: null,
      riseMultiple: null,
      peakAt: null,
      readyFrom,
      readyUntil,
    },
    forecast: null,
  } as unknown as CultureSummary;
}

const byKind = <T extends { kind: string }>(alerts: T[], kind: string): T | undefined =>
  alerts.find((a) => a.kind === kind);

describe('cultureAlerts', () => {
  it('puts the ready alert at the window start minus the lead, past peak at its end, feeding a day after', () => {
    const alerts = cultureAlerts({
      accountId: 'a1',
      summary: summary(),
      leadMinutes: 20,
      now: FED,
      timeZone: 'Europe/London',
    });
    expect(byKind(alerts, 'culture-ready')?.dueAt).toBe('2026-12-05T12:40:00.000Z');
    expect(byKind(alerts, 'past-peak')?.dueAt).toBe('2026-12-05T15:00:00.000Z');
    // London is on UTC in December; 5 Dec 2026 is a Saturday.
    expect(byKind(alerts, 'culture-ready')?.body).toMatch(/^Ready from Sat 13:00/);
    // Daily on the counter: common practice for a starter kept warm.
    expect(byKind(alerts, 'feeding-due')?.dueAt).toBe('2026-12-06T08:00:00.000Z');
  });

  it('gives the same slot key when the prediction moves, so the alert is moved and not duplicated', () => {
    const first = cultureAlerts({ accountId: 'a1', summary: summary(), leadMinutes: 0, now: FED, timeZone: 'UTC' });
    const moved = cultureAlerts({
      accountId: 'a1',
      summary: summary({ readyFrom: '2026-12-05T14:10:00.000Z' }),
      leadMinutes: 0,
      now: FED,
      timeZone: 'UTC',
    });
    expect(byKind(moved, 'culture-ready')?.slotKey).toBe(byKind(first, 'culture-ready')?.slotKey);
    expect(byKind(moved, 'culture-ready')?.dueAt).not.toBe(byKind(first, 'culture-ready')?.dueAt);
  });

  it('keys alerts by feeding, so the next feeding makes new ones', () => {
    const a = cultureAlerts({ accountId: 'a1', summary: summary(), leadMinutes: 0, now: FED, timeZone: 'UTC' });
    const s = summary();
    s.running = { ...s.running!, feeding: { ...s.running!.feeding, id: 'f2' } };
    const b = cultureAlerts({ accountId: 'a1', summary: s, leadMinutes: 0, now: FED, timeZone: 'UTC' });
    expect(new Set([...a, ...b].map((x) => x.slotKey)).size).toBe(a.length + b.length);
  });

  it('in the fridge only the weekly feeding is due', () => {
    const alerts = cultureAlerts({
      accountId: 'a1',
      summary: summary({ location: 'fridge' }),
      leadMinutes: 0,
      now: FED,
      timeZone: 'UTC',
    });
    expect(alerts.map((a) => a.kind)).toEqual(['feeding-due']);
    expect(alerts[0]?.dueAt).toBe('2026-12-12T08:00:00.000Z');
  });

  it('leaves out alerts already stale and everything for an archived culture', () => {
    const late = new Date(
      Date.parse('2026-12-05T15:00:00.000Z') + (PAST_PEAK_STALE_HOURS + 1) * 3_600_000,
    ).toISOString();
    expect(
      cultureAlerts({ accountId: 'a1', summary: summary(), leadMinutes: 0, now: late, timeZone: 'UTC' }).map(
        (a) => a.kind,
      ),
    ).toEqual(['feeding-due']);
    expect(
      cultureAlerts({
        accountId: 'a1',
        summary: summary({ archived: true }),
        leadMinutes: 0,
        now: FED,
        timeZone: 'UTC',
      }),
    ).toEqual([]);
  });
});

function step(id: string, kind: PlanStep['kind'], startAt: string, endAt: string, done = false): PlanStep {
  return { id, kind, startAt, endAt, action: true, done, inQuietHours: false, uncertainty: null, cautions: [] };
}

describe('planAlerts', () => {
  const steps = [
    step('mix', 'mix', '2026-12-05T09:00:00Z', '2026-12-05T09:15:00Z', true),
    step('fold-1', 'fold', '2026-12-05T09:45:00Z', '2026-12-05T09:50:00Z', true),
    step('fold-2', 'fold', '2026-12-05T10:15:00Z', '2026-12-05T10:20:00Z'),
    step('bulk-end', 'bulk-end', '2026-12-05T14:00:00Z', '2026-12-05T14:00:00Z'),
    step('shape', 'shape', '2026-12-05T14:00:00Z', '2026-12-05T14:15:00Z'),
    step('bake', 'bake', '2026-12-05T16:00:00Z', '2026-12-05T16:45:00Z'),
  ];
  it('reminds of open hands-on steps (bake at its end), not done ones or shaping', () => {
    const alerts = planAlerts({
      accountId: 'a1',
      plan: { id: 'p1', name: 'Country loaf', status: 'active', steps },
      now: '2026-12-05T10:00:00Z',
    });
    expect(alerts.map((a) => [a.slotKey.split(':').at(-1), a.dueAt])).toEqual([
      ['fold-2', '2026-12-05T10:15:00.000Z'],
      ['bulk-end', '2026-12-05T14:00:00.000Z'],
      ['bake', '2026-12-05T16:45:00.000Z'],
    ]);
  });
  it('wants nothing of a cancelled plan', () => {
    expect(
      planAlerts({
        accountId: 'a1',
        plan: { id: 'p1', name: 'x', status: 'cancelled', steps },
        now: '2026-12-05T10:00:00Z',
      }),
    ).toEqual([]);
  });
});

describe('deliveryFor', () => {
  const quiet = { from: '22:00', until: '07:00' };
  const base = {
    dueAt: '2026-12-05T23:30:00.000Z',
    staleAt: '2026-12-06T12:00:00.000Z',
    quietHours: quiet,
    timeZone: 'Europe/London',
  };
  it('sends in the app at the due time even inside quiet hours', () => {
    expect(deliveryFor({ ...base, channel: 'in-app' })).toEqual({ action: 'send', at: base.dueAt });
  });
  it('holds e-mail until the quiet hours end in the baker’s zone', () => {
    expect(deliveryFor({ ...base, channel: 'email' })).toEqual({ action: 'send', at: '2026-12-06T07:00:00.000Z' });
    // New York is UTC−5 in December: 23:30 UTC is 18:30 local, outside 22:00–07:00.
    expect(deliveryFor({ ...base, channel: 'email', timeZone: 'America/New_York' })).toEqual({
      action: 'send',
      at: base.dueAt,
    });
  });
  it('drops e-mail that would be stale when the quiet hours end', () => {
    expect(deliveryFor({ ...base, channel: 'push', staleAt: '2026-12-06T01:00:00.000Z' })).toEqual({
      action: 'drop',
      reason: 'stale',
    });
  });
});

describe('preferences', () => {
  it('merges a partial change and keeps the app always on', () => {
    const p = mergeAlertPreferences(defaultAlertPreferences(), {
      leadMinutes: 30,
      channels: { 'past-peak': { email: false } },
    });
    expect(p.leadMinutes).toBe(30);
    expect(channelsFor(p, 'past-peak')).toEqual(['in-app', 'push']);
    expect(channelsFor(p, 'culture-ready')).toEqual(['in-app', 'email', 'push']);
    const kept = mergeAlertPreferences(p, { channels: { 'past-peak': { email: true, push: undefined } } });
    expect(kept.channels['past-peak']).toEqual({ email: true, push: true });
  });

  it('a kind the stored choices predate takes the default channels', () => {
    const stored = defaultAlertPreferences();
    const { comment: _dropped, ...older } = stored.channels;
    const prefs = { ...stored, channels: older as typeof stored.channels };
    expect(channelsFor(prefs, 'comment')).toEqual(['in-app', 'email', 'push']);
    expect(mergeAlertPreferences(prefs, { leadMinutes: 5 }).channels.comment).toEqual({ email: true, push: true });
  });
});
