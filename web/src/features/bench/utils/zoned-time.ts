// Times on the Bench are shown and typed in the baker's own zone (the account's, which is also the
// zone the planner works in), not the browser's: a phone abroad still plans the bake at home.

/** Minutes the zone is ahead of UTC at this instant (e.g. +60 for Europe/Berlin in winter). */
export function zoneOffsetMinutes(instant: Date, timeZone: string): number {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
  }).formatToParts(instant);
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value ?? 0);
  const asUtc = Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'), get('second'));
  return Math.round((asUtc - Math.floor(instant.getTime() / 1000) * 1000) / 60_000);
}

function offsetText(minutes: number): string {
  const sign = minutes < 0 ? '-' : '+';
  const abs = Math.abs(minutes);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
}

/**
 * "2026-12-03T09:00" read as a wall clock in `timeZone` → ISO 8601 with that zone's offset.
 * The offset is looked up twice, so a time near a daylight-saving change gets the offset it
 * really has; a wall time skipped by the change lands an hour later, as a clock would show it.
 */
export function wallTimeToIso(wall: string, timeZone: string): string | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/.exec(wall);
  if (!m) return null;
  const asUtc = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]), Number(m[4]), Number(m[5]));
  let offset = zoneOffsetMinutes(new Date(asUtc), timeZone);
  offset = zoneOffsetMinutes(new Date(asUtc - offset * 60_000), timeZone);
  const instant = new Date(asUtc - offset * 60_000);
  const local = new Date(instant.getTime() + offset * 60_000).toISOString().slice(0, 19);
  return `${local}${offsetText(offset)}`;
}

/** An instant → "2026-12-03T09:00" on the wall clock of `timeZone`, for a datetime-local input. */
export function isoToWallTime(iso: string | Date, timeZone: string): string {
  const instant = typeof iso === 'string' ? new Date(iso) : iso;
  const offset = zoneOffsetMinutes(instant, timeZone);
  return new Date(instant.getTime() + offset * 60_000).toISOString().slice(0, 16);
}

/** Tomorrow at hh:mm in `timeZone`, as a wall time for the "Ready at" field. */
export function tomorrowAt(now: Date, timeZone: string, hhmm = '09:00'): string {
  const today = isoToWallTime(now, timeZone).slice(0, 10);
  const [y, mo, d] = today.split('-').map(Number) as [number, number, number];
  const next = new Date(Date.UTC(y, mo - 1, d + 1)).toISOString().slice(0, 10);
  return `${next}T${hhmm}`;
}
