import type { BakePlanView } from '@peakwise/shared';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import {
  HOUR,
  NOW,
  ZONE,
  caller,
  created,
  createFormula,
  getPlan,
  iso,
  mockClock,
  planBody,
  step,
} from './bake-plan.fixtures.js';
import { expectError, signUp, withSignedInBaker, type SignedUp } from './helpers.js';
import type { TestApp } from './test-app.js';

let t: TestApp;
let theo: SignedUp;
withSignedInBaker({ timeZone: ZONE }, (app, baker) => {
  t = app;
  theo = baker;
});
beforeEach(() => {
  mockClock(t);
});
const call: ReturnType<typeof caller> = (...args) => caller(t, () => theo)(...args);

/** The content lines of a calendar, unfolded (RFC 5545 §3.1: CRLF + one space or tab continues a line). */
const unfold = (ics: string): string[] => ics.replace(/\r\n[ \t]/g, '').split('\r\n');

/** RFC 5545 §3.3.5, form #2: a UTC date-time is written YYYYMMDDTHHMMSSZ. */
const utcBasic = (isoTime: string): string =>
  iso(Date.parse(isoTime))
    .replace(/[-:]/g, '')
    .replace(/\.\d{3}/, '');

interface VEvent {
  [property: string]: string;
}

function events(lines: string[]): VEvent[] {
  const out: VEvent[] = [];
  let current: VEvent | null = null;
  for (const line of lines) {
    if (line === 'BEGIN:VEVENT') current = {};
    else if (line === 'END:VEVENT' && current) {
      out.push(current);
      current = null;
    } else if (current) {
      const colon = line.indexOf(':');
      current[line.slice(0, colon).split(';')[0]!] = line.slice(colon + 1);
    }
  }
  return out;
}

describe('GET /api/plans/:id/calendar.ics', () => {
  it('one event per step of the live plan, in UTC, with a stable UID and the step’s cautions', async () => {
    const formula = await createFormula(call);
    const view = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id, { name: 'Sunday loaf' })));
    const res = await call('GET', `/api/plans/${view.id}/calendar.ics`);
    expect(res.statusCode).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="sunday-loaf.ics"');

    const lines = unfold(res.body);
    // RFC 5545 §3.4 and §3.6: the object is one VCALENDAR holding the VEVENT components.
    expect(lines[0]).toBe('BEGIN:VCALENDAR');
    expect(lines).toContain('VERSION:2.0');
    expect(lines.filter((l) => l === 'END:VCALENDAR')).toHaveLength(1);
    const live = (await getPlan(call, view.id)).live;
    const found = events(lines);
    expect(found).toHaveLength(live.steps.length);
    for (const s of live.steps) {
      // RFC 5545 §3.8.4.7: UID identifies the event; ours is the plan and the step, so re-exports update it.
      const event = found.find((e) => e.UID === `${view.id}.${s.id}@peakwise`);
      expect(event, s.id).toBeDefined();
      // RFC 5545 §3.8.2.4 with §3.3.5 form #2: DTSTART in UTC, "Z"-suffixed.
      expect(event!.DTSTART, s.id).toBe(utcBasic(s.startAt));
      // RFC 5545 §3.8.2.2: DTEND must be later than DTSTART; a step of no length has none (§3.6.1).
      if (Date.parse(s.endAt) > Date.parse(s.startAt)) expect(event!.DTEND, s.id).toBe(utcBasic(s.endAt));
      else expect(event!.DTEND, s.id).toBeUndefined();
    }
    const mix = found.find((e) => e.UID === `${view.id}.mix@peakwise`)!;
    expect(mix.SUMMARY).toBe('Mix the dough (Sunday loaf)');
    expect(mix.DESCRIPTION).toMatch(/Caution: Raw flour and raw dough are not ready-to-eat/);
    const bake = found.find((e) => e.UID === `${view.id}.bake@peakwise`)!;
    expect(bake.DESCRIPTION).toMatch(/Oven at 250 °C/);
    expect(bake.DESCRIPTION).toMatch(/Hot oven/);
    expect(step(live, 'bake').cautions).toContain('hot-oven');
  });

  it('follows the live plan and the baker’s temperature unit', async () => {
    await call('PATCH', '/api/account', { temperatureUnit: 'F' });
    const formula = await createFormula(call);
    const view = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id)));
    const mixed = Date.parse(step(view.live, 'mix').startAt) + HOUR;
    vi.restoreAllMocks();
    mockClock(t).set(mixed + HOUR);
    await created(call('POST', `/api/plans/${view.id}/steps/mix/done`, { startedAt: iso(mixed) }));
    const found = events(unfold((await call('GET', `/api/plans/${view.id}/calendar.ics`)).body));
    const mix = found.find((e) => e.UID === `${view.id}.mix@peakwise`)!;
    expect(mix.DTSTART).toBe(utcBasic(iso(mixed)));
    // 250 °C = 482 °F.
    expect(found.find((e) => e.UID === `${view.id}.bake@peakwise`)!.DESCRIPTION).toMatch(/Oven at 482 °F/);
    expect(NOW).toBeLessThan(mixed);
  });

  it('is the owner’s only', async () => {
    const formula = await createFormula(call);
    const view = await created<BakePlanView>(call('POST', '/api/plans', planBody(formula.id)));
    const amara = await signUp(t.app, { displayName: 'Amara Quist' });
    expectError(await call('GET', `/api/plans/${view.id}/calendar.ics`, undefined, amara), 404);
  });
});
