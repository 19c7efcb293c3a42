import {
  CAUTION_TEXT,
  type BakePlanView,
  type PlanStep,
  type PlanStepKind,
  type TemperatureUnit,
} from '@peakwise/shared';
import { createEvents, type EventAttributes } from 'ics';

// The plan as an iCalendar file (RFC 5545) through the `ics` package: one event per step of the
// live plan, in UTC, with a UID that stays the same for a plan's step across exports so a
// calendar updates the event instead of adding another.

const TITLES: Record<PlanStepKind, string> = {
  'feed-starter': 'Feed the starter for the levain',
  'starter-rise': 'Levain rising',
  mix: 'Mix the dough',
  rest: 'Rest the dough',
  'add-salt': 'Add the salt',
  bulk: 'Bulk fermentation',
  fold: 'Stretch and fold',
  'bulk-end': 'End of bulk: check the dough',
  shape: 'Divide and shape',
  proof: 'Final proof',
  retard: 'Cold retard in the fridge',
  'take-out': 'Take the dough out of the fridge and score it',
  preheat: 'Preheat the oven',
  bake: 'Bake',
  cool: 'Cool before slicing',
  finish: 'Slice or store',
};

const WHERE: Partial<Record<PlanStepKind, string>> = {
  bulk: 'Dough near',
  proof: 'Dough near',
  'starter-rise': 'Levain near',
  retard: 'Fridge at',
  preheat: 'Oven at',
  bake: 'Oven at',
};

export function stepTitle(step: PlanStep): string {
  const title = TITLES[step.kind];
  return step.set === undefined ? title : `${title}, set ${step.set}`;
}

function temperature(c: number, unit: TemperatureUnit): string {
  return unit === 'F' ? `${Math.round((c * 9) / 5 + 32)} °F` : `${Math.round(c * 10) / 10} °C`;
}

function clock(iso: string, timeZone: string): string {
  // With the weekday: an 80 % interval of a long bulk can run past midnight.
  const format = { timeZone, weekday: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' } as const;
  return new Intl.DateTimeFormat('en-GB', format).format(new Date(iso));
}

function description(step: PlanStep, timeZone: string, unit: TemperatureUnit): string {
  const lines: string[] = [step.action ? 'Hands-on step.' : 'Waiting: nothing to do but let it be.'];
  if (step.done) lines.push('Checked off: the times are the actual ones.');
  const where = WHERE[step.kind];
  if (where && step.temperatureC !== undefined) lines.push(`${where} ${temperature(step.temperatureC, unit)}.`);
  const u = step.uncertainty;
  if (u && !step.done) {
    const range = `${clock(u.low, timeZone)} and ${clock(u.high, timeZone)} (${timeZone})`;
    lines.push(u.level === null ? `Takes until between ${range}.` : `Likely to end between ${range}, 80 % interval.`);
  }
  for (const caution of step.cautions) lines.push(`Caution: ${CAUTION_TEXT[caution]}`);
  return lines.join('\n');
}

/** A file name from the plan's name: plain ASCII, never empty. */
export function calendarFileName(name: string): string {
  const slug = name
    .normalize('NFKD')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${slug || 'bake-plan'}.ics`;
}

export function planCalendar(view: BakePlanView, timeZone: string, unit: TemperatureUnit): string {
  const events = view.live.steps.map((step): EventAttributes => {
    const start = Date.parse(step.startAt);
    const end = Date.parse(step.endAt);
    const event = {
      uid: `${view.id}.${step.id}@peakwise`,
      title: `${stepTitle(step)} (${view.name})`,
      description: description(step, timeZone, unit),
      start,
      startInputType: 'utc' as const,
      startOutputType: 'utc' as const,
      status: view.status === 'cancelled' ? ('CANCELLED' as const) : ('CONFIRMED' as const),
      busyStatus: step.action ? ('BUSY' as const) : ('FREE' as const),
    };
    // RFC 5545 §3.6.1: an event with no DTEND ends when it starts; DTEND itself must be later.
    if (end <= start) return event as EventAttributes;
    return { ...event, end, endInputType: 'utc', endOutputType: 'utc' };
  });
  const { error, value } = createEvents(events, { productId: 'peakwise/bench', calName: view.name });
  if (error || value === null) throw error ?? new Error('the calendar could not be written');
  return value;
}
