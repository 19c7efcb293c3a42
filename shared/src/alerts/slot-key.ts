import type { AlertKind } from '../contracts/alert.js';

/**
 * The identity of one alert: (account, kind, subject, slot). The slot names the occurrence — the
 * feeding a ready alert belongs to, the plan step a reminder is for — never its time, so a
 * re-computation that moves the time yields the same key and the stored alert is moved, not
 * duplicated.
 */
export function alertSlotKey(accountId: string, kind: AlertKind, subjectId: string, slot: string): string {
  return `${accountId}:${kind}:${subjectId}:${slot}`;
}
