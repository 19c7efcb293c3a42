import { describe, expect, it } from 'vitest';
import { planBake } from './plan-bake.js';
import { hours, inQuiet, input, ms, step } from './plan-test-helpers.js';
import { formatInZone, instantAtLocal, quietIntervals } from './zone.js';

const H = (hour: number, minute = 0) => ({ hour, minute });
const nightLengths = (zone: string, from: string, to: string, quiet = { from: H(23), until: H(6) }) =>
  quietIntervals(quiet, zone, ms(from), ms(to)).map((q) => (q.end - q.start) / 3_600_000);

describe('zone: local clock times across DST (IANA data via Intl)', () => {
  it('a 23:00–06:00 night is 6 h when clocks go forward and 8 h when they go back (EU rule: last Sunday of March/October)', () => {
    expect(nightLengths('Europe/Berlin', '2026-03-27T12:00:00Z', '2026-03-29T12:00:00Z')).toEqual([7, 6]);
    expect(nightLengths('Europe/Berlin', '2026-10-23T12:00:00Z', '2026-10-25T12:00:00Z')).toEqual([7, 8]);
    // US rule: second Sunday of March.
    expect(nightLengths('America/New_York', '2026-03-07T12:00:00Z', '2026-03-08T12:00:00Z')).toEqual([6]);
  });

  it('a daytime quiet stretch (13:00–15:00) stays on the same date', () => {
    const q = quietIntervals(
      { from: H(13), until: H(15) },
      'Europe/Berlin',
      ms('2026-12-04T00:00:00Z'),
      ms('2026-12-04T23:00:00Z'),
    );
    expect(q.map((i) => formatInZone(i.start, 'Europe/Berlin'))).toContain('2026-12-04T13:00:00+01:00');
    expect(q.every((i) => i.end - i.start === 2 * 3_600_000)).toBe(true);
  });

  it('reads the spring gap forward and the autumn overlap as its earlier instant', () => {
    // 02:30 on 29 March 2026 does not exist in Berlin: 03:30 CEST = 01:30Z.
    expect(new Date(instantAtLocal(2026, 3, 29, 2, 30, 'Europe/Berlin')).toISOString()).toBe(
      '2026-03-29T01:30:00.000Z',
    );
    // 02:30 on 25 October 2026 happens twice: first at 00:30Z (CEST).
    expect(new Date(instantAtLocal(2026, 10, 25, 2, 30, 'Europe/Berlin')).toISOString()).toBe(
      '2026-10-25T00:30:00.000Z',
    );
    expect(formatInZone(ms('2026-03-29T00:59:00Z'), 'Europe/Berlin')).toBe('2026-03-29T01:59:00+01:00');
    expect(formatInZone(ms('2026-03-29T01:00:00Z'), 'Europe/Berlin')).toBe('2026-03-29T03:00:00+02:00');
  });
});

describe('planBake across a DST change', () => {
  for (const [label, readyAt, before, after] of [
    ['clocks forward', '2026-03-29T10:00:00+02:00', '+01:00', '+02:00'],
    ['clocks back', '2026-10-25T10:00:00+01:00', '+02:00', '+01:00'],
  ] as const) {
    it(`${label}: the overnight retard keeps every hands-on step out of 23:00–06:00 on the wall clock`, () => {
      const now = label === 'clocks forward' ? '2026-03-28T08:00:00+01:00' : '2026-10-24T08:00:00+02:00';
      const plan = planBake(input({ now, readyAt, quietHours: { from: '23:00', until: '06:00' } }));
      const retard = plan.options.find((o) => o.kind === 'overnight-retard');
      expect(retard?.fits).toBe(true);
      if (!retard) return;
      for (const s of retard.steps.filter((x) => x.action)) expect(inQuiet(s, 23 * 60, 6 * 60), s.id).toBe(false);
      // Times carry the offset of their own instant.
      expect(step(retard, 'mix').startAt.slice(-6)).toBe(before);
      expect(step(retard, 'bake').startAt.slice(-6)).toBe(after);
      expect(step(retard, 'cool').endAt).toBe(readyAt);
      // The fridge time is real hours, inside the 8–16 h window however the clock moved.
      const fridge = step(retard, 'retard');
      expect(hours(fridge.startAt, fridge.endAt)).toBeGreaterThanOrEqual(8);
      expect(hours(fridge.startAt, fridge.endAt)).toBeLessThanOrEqual(16);
    });
  }

  it("clocks forward: the morning is read in summer time, not in the evening's offset", () => {
    const plan = (readyAt: string) =>
      planBake(input({ now: '2026-03-28T08:00:00+01:00', readyAt, quietHours: { from: '23:00', until: '06:00' } }));
    // Ready 09:00 CEST: preheat from 06:25 CEST (04:25Z). Reading the night in the evening's
    // +01:00 would end quiet hours at 05:00Z (07:00 CEST) and refuse it.
    const fits = plan('2026-03-29T09:00:00+02:00').options.find((o) => o.kind === 'overnight-retard');
    expect(fits?.fits).toBe(true);
    const preheat = step(fits ?? { steps: [] }, 'preheat');
    expect(preheat.startAt).toMatch(/^2026-03-29T06:\d\d:00\+02:00$/);
    expect(ms(preheat.startAt)).toBeLessThan(ms('2026-03-29T05:00:00Z'));
    // Ready 08:30 CEST: the preheat would start at 05:55 CEST, inside quiet hours; the nearest
    // ready time that fits is 08:35 CEST (preheat from 06:00 CEST), not 07:35 or 09:35.
    const early = plan('2026-03-29T08:30:00+02:00').options.find((o) => o.kind === 'overnight-retard');
    expect(early?.fits).toBe(true);
    expect(early?.readyAt).toBe('2026-03-29T08:35:00+02:00');
    expect(step(early ?? { steps: [] }, 'preheat').startAt).toBe('2026-03-29T06:00:00+02:00');
  });
});
