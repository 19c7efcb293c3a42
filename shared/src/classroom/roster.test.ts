import { describe, expect, it } from 'vitest';
import { FEEDING_ROUTINE_HOURS } from '../alerts/culture-rules.js';
import {
  queryRoster,
  rosterEntry,
  rosterTrend,
  type RosterCultureInput,
  type RosterEntry,
  type RosterFeedingInput,
} from './roster.js';

// Small invented series (not measured data): each test builds the feedings it needs, newest first.
// The thresholds are our own common-practice rules (see roster.ts), so the cases sit clearly on
// either side of them rather than asserting a published figure.

const NOW = '2026-12-05T12:00:00.000Z';
const HOUR = 3_600_000;
const hoursAgo = (h: number) => new Date(Date.parse(NOW) - h * HOUR).toISOString();

/** Daily feedings, newest first: hours to peak and rise multiples oldest → newest, like a logbook reads. */
function daily(peaks: number[], multiples?: number[], over: Partial<RosterFeedingInput> = {}): RosterFeedingInput[] {
  return peaks
    .map((p, i) => ({
      fedAt: hoursAgo(6 + 24 * (peaks.length - 1 - i)),
      riseCheckCount: 5,
      observations: ['bubbles' as const],
      riseMultiple: multiples?.[i] ?? 2.4,
      normalisedHoursToPeak: p,
      ...over,
    }))
    .reverse();
}

function culture(name: string, feedings: RosterFeedingInput[], over: Partial<RosterCultureInput> = {}) {
  return {
    studentId: `s-${name}`,
    studentName: name,
    culture: { id: `c-${name}`, name: `${name}'s jar`, location: 'counter' as const },
    feedings,
    hoursToPeakAtReference: 4.5,
    ...over,
  };
}

describe('rosterTrend', () => {
  it('calls a culture steady when its recent times to peak stay near its baseline', () => {
    const t = rosterTrend(daily([4.4, 4.6, 4.5, 4.7, 4.3, 4.6, 4.5, 4.4]));
    expect(t.trend).toBe('steady');
    expect(t.sluggish).toBe(false);
  });

  it('calls it slower and sluggish when the last three take a third longer than the five before', () => {
    // Baseline mean 4.5 h; recent mean 6.0 h: ratio 1.33, past the 25 % line.
    const t = rosterTrend(daily([4.4, 4.6, 4.5, 4.6, 4.4, 5.6, 6.0, 6.4]));
    expect(t.trend).toBe('slower');
    expect(t.peakRatio).toBeCloseTo(6.0 / 4.5, 6);
    expect(t.sluggish).toBe(true);
  });

  it('calls it faster when the last three take a third less time', () => {
    expect(rosterTrend(daily([6, 6, 6, 6, 4.4, 4.5, 4.6])).trend).toBe('faster');
  });

  it('is sluggish when the rise multiple falls even though the time to peak holds', () => {
    // Baseline multiple 2.5; recent 1.8: 28 % weaker, past the 20 % line.
    const t = rosterTrend(daily([4.5, 4.5, 4.5, 4.5, 4.5, 4.5], [2.5, 2.6, 2.4, 1.9, 1.8, 1.7]));
    expect(t.trend).toBe('steady');
    expect(t.riseRatio).toBeCloseTo(1.8 / 2.5, 6);
    expect(t.sluggish).toBe(true);
  });

  it('says nothing with fewer than three recent and two baseline completed feedings', () => {
    const t = rosterTrend(daily([4, 8, 9, 10]));
    expect(t.trend).toBeNull();
    expect(t.sluggish).toBe(false);
  });

  it('skips feedings without an observed peak (still rising, or no rise checks)', () => {
    const feedings = daily([4.5, 4.5, 4.5, 6.2, 6.0]);
    const open: RosterFeedingInput = { ...feedings[0]!, normalisedHoursToPeak: null, fedAt: hoursAgo(1) };
    // Only four completed feedings: one short of three recent + two baseline.
    expect(rosterTrend([open, ...feedings.slice(1)]).trend).toBeNull();
  });
});

describe('rosterEntry flags', () => {
  it('flags a counter culture overdue past its daily routine and a fridge culture only past a week', () => {
    const late = daily([4.5]).map((f) => ({ ...f, fedAt: hoursAgo(FEEDING_ROUTINE_HOURS.counter + 2) }));
    expect(rosterEntry(culture('Theo', late), NOW).row.flags).toContain('overdue');
    const fridge = culture('Dev', late, { culture: { id: 'c', name: 'Pip', location: 'fridge' } });
    expect(rosterEntry(fridge, NOW).row.flags).not.toContain('overdue');
    const weekOld = late.map((f) => ({ ...f, fedAt: hoursAgo(FEEDING_ROUTINE_HOURS.fridge + 1) }));
    expect(rosterEntry({ ...fridge, feedings: weekOld }, NOW).row.flags).toContain('overdue');
  });

  it('flags caution when a recent feeding noted discolouration, not when an old one did', () => {
    const feedings = daily([4.5, 4.5, 4.5, 4.5, 4.5]);
    const recent = feedings.map((f, i) => (i === 1 ? { ...f, observations: ['discolouration' as const] } : f));
    expect(rosterEntry(culture('Amara', recent), NOW).row.flags).toContain('caution');
    const old = feedings.map((f, i) => (i === 4 ? { ...f, observations: ['discolouration' as const] } : f));
    expect(rosterEntry(culture('Amara', old), NOW).row.flags).not.toContain('caution');
  });

  it('flags no-rise-checks when none of the recent feedings has one', () => {
    const bare = daily([4.5, 4.5, 4.5, 4.5], undefined, {
      riseCheckCount: 0,
      riseMultiple: null,
      normalisedHoursToPeak: null,
    });
    const row = rosterEntry(culture('Theo', bare), NOW).row;
    expect(row.flags).toEqual(['no-rise-checks']);
    expect(row.riseMultiple).toBeNull();
    const oneChecked = bare.map((f, i) => (i === 2 ? { ...f, riseCheckCount: 3 } : f));
    expect(rosterEntry(culture('Theo', oneChecked), NOW).row.flags).not.toContain('no-rise-checks');
  });

  it('gives a student without a culture one no-culture row', () => {
    const row = rosterEntry({ ...culture('Dev', []), culture: null }, NOW).row;
    expect(row).toMatchObject({ cultureId: null, cultureName: null, trend: null, flags: ['no-culture'] });
  });

  it('reports hours since fed and the latest rise multiple of a feeding with rise checks', () => {
    const feedings = daily([4.5, 4.5], [2.2, 2.6]);
    const unchecked = { ...feedings[0]!, fedAt: hoursAgo(2), riseCheckCount: 0, riseMultiple: null };
    const row = rosterEntry(culture('Theo', [unchecked, ...feedings]), NOW).row;
    expect(row.hoursSinceFed).toBeCloseTo(2, 9);
    expect(row.riseMultiple).toBe(2.6);
  });

  it('quotes the latest finished feeding’s normalised time to peak, the fit only before one finished', () => {
    const slowing = daily([4, 4, 4, 6.5]);
    const rising = { ...slowing[0]!, fedAt: hoursAgo(1), normalisedHoursToPeak: null };
    expect(rosterEntry(culture('Dev', [rising, ...slowing]), NOW).row.hoursToPeakAtReference).toBe(6.5);
    expect(rosterEntry(culture('Dev', [rising]), NOW).row.hoursToPeakAtReference).toBe(4.5);
  });
});

describe('queryRoster', () => {
  const entries: RosterEntry[] = [
    rosterEntry(culture('Amara', daily([5, 5, 5, 5, 5, 5])), NOW),
    // Slower by a third.
    rosterEntry(culture('Dev', daily([4, 4, 4, 4, 5.4, 5.4, 5.2])), NOW),
    // Slower by more than half: the worst.
    rosterEntry(culture('Bea', daily([4, 4, 4, 6.5, 6.5, 6.5])), NOW),
    rosterEntry({ ...culture('Cy', []), culture: null }, NOW),
    rosterEntry(culture('Theo', daily([4.5, 4.5, 4.5, 4.5, 4.5, 4.5])), NOW),
  ];
  const names = (q: Parameters<typeof queryRoster>[1]) => queryRoster(entries, q).rows.map((r) => r.studentName);

  it('sorted by sluggish puts the sluggish worst first, then other flags, then the rest A→Z', () => {
    expect(names({ sort: 'sluggish' })).toEqual(['Bea', 'Dev', 'Cy', 'Amara', 'Theo']);
  });

  it('sorts by student name and by hours to peak with nulls last in either order', () => {
    expect(names({ sort: 'student' })).toEqual(['Amara', 'Bea', 'Cy', 'Dev', 'Theo']);
    expect(names({ sort: 'student', order: 'desc' })).toEqual(['Theo', 'Dev', 'Cy', 'Bea', 'Amara']);
    expect(names({ sort: 'hoursToPeak', order: 'asc' }).at(-1)).toBe('Cy');
    expect(names({ sort: 'hoursToPeak', order: 'desc' }).at(-1)).toBe('Cy');
  });

  it('filters by flag and by part of a student or culture name', () => {
    expect(names({ flag: 'sluggish', sort: 'student' })).toEqual(['Bea', 'Dev']);
    expect(names({ q: 'THEO' })).toEqual(['Theo']);
    expect(names({ q: "ara's j" })).toEqual(['Amara']);
  });

  it('pages after sorting and counts every match', () => {
    const page = queryRoster(entries, { sort: 'student', limit: 2, offset: 2 });
    expect(page.rows.map((r) => r.studentName)).toEqual(['Cy', 'Dev']);
    expect(page.total).toBe(5);
  });
});
