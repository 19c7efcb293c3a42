// Times cross the API as ISO 8601 strings with an explicit offset. A string without one would be
// read in the machine's own time zone by Date.parse, so the same log would give different
// answers on a server and in a browser: such strings are refused, not guessed at.

const ISO_WITH_OFFSET = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/i;

/** Milliseconds since the epoch, or null for anything but an ISO 8601 date-time with an offset. */
export function parseIsoWithOffset(value: unknown): number | null {
  if (typeof value !== 'string' || !ISO_WITH_OFFSET.test(value)) return null;
  const ms = Date.parse(value);
  return Number.isFinite(ms) ? ms : null;
}

/** UTC ISO string for epoch milliseconds (the inverse, with the offset normalised to Z). */
export function toIso(ms: number): string {
  return new Date(ms).toISOString();
}

export const MS_PER_HOUR = 3_600_000;
