// When each channel delivers an alert. In the app: at the due time, always. E-mail and push: not
// inside the baker's quiet hours — held until they end, or dropped if the alert is stale by then.
import type { AlertChannel, AlertQuietHours } from '../contracts/alert.js';
import { parseClockTime, quietIntervals } from '../fermentation/plan/zone.js';

export type DeliveryDecision = { action: 'send'; at: string } | { action: 'drop'; reason: 'stale' };

export interface DeliveryInput {
  channel: AlertChannel;
  dueAt: string;
  staleAt: string;
  quietHours: AlertQuietHours | null;
  timeZone: string;
  /** The earliest the channel can send (the worker's now when re-checking; the due time at first). */
  notBefore?: string;
}

/** The moment this channel may send, or a drop when quiet hours would hold it past staleness. */
export function deliveryFor(input: DeliveryInput): DeliveryDecision {
  const due = Math.max(Date.parse(input.dueAt), input.notBefore ? Date.parse(input.notBefore) : -Infinity);
  if (input.channel === 'in-app' || input.quietHours === null)
    return { action: 'send', at: new Date(due).toISOString() };
  const quiet = {
    from: parseClockTime(input.quietHours.from, 'quietHours.from'),
    until: parseClockTime(input.quietHours.until, 'quietHours.until'),
  };
  const inside = quietIntervals(quiet, input.timeZone, due, due).find((q) => due >= q.start && due < q.end);
  const at = inside ? inside.end : due;
  if (inside && at > Date.parse(input.staleAt)) return { action: 'drop', reason: 'stale' };
  return { action: 'send', at: new Date(at).toISOString() };
}

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)$/;
/** "HH:MM", 00:00–23:59. */
export const isClockTime = (value: unknown): boolean => typeof value === 'string' && CLOCK.test(value);
