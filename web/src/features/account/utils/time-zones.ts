/** The zone this device is set to, e.g. `Europe/London`; the natural suggestion for a baker. */
export function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

/** Every IANA zone this browser knows. */
export function supportedTimeZones(): string[] {
  return Intl.supportedValuesOf('timeZone');
}

/**
 * The list to choose from: the browser's zones, plus the account's and the device's own in case
 * the browser's list leaves them out (some list no `UTC`), sorted and without repeats.
 */
export function timeZoneOptions(supported: readonly string[], ...alsoInclude: string[]): string[] {
  return [...new Set([...supported, ...alsoInclude.filter(Boolean)])].sort((a, b) => a.localeCompare(b));
}

/** `America/Argentina/Buenos_Aires` → `America/Argentina/Buenos Aires`. */
export function timeZoneLabel(zone: string): string {
  return zone.replaceAll('_', ' ');
}

/** The zone's current offset, e.g. `GMT+1`, to tell neighbouring cities apart at a glance. */
export function timeZoneOffset(zone: string, at: Date): string {
  try {
    const parts = new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'shortOffset' }).formatToParts(at);
    return parts.find((p) => p.type === 'timeZoneName')?.value ?? '';
  } catch {
    return '';
  }
}
