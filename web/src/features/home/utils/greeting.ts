/**
 * "Good morning" by the baker's own clock (their account's time zone, not the server's).
 * Early bakers are up at 4: before 5 and late at night we just say hello.
 */
export function greetingFor(now: Date, timeZone: string): string {
  let hour: number;
  try {
    hour = Number(new Intl.DateTimeFormat('en-GB', { hour: 'numeric', hourCycle: 'h23', timeZone }).format(now));
  } catch {
    return 'Hello'; // An unknown zone name must not break the home page.
  }
  if (hour >= 5 && hour < 12) return 'Good morning';
  if (hour >= 12 && hour < 18) return 'Good afternoon';
  if (hour >= 18 && hour < 23) return 'Good evening';
  return 'Hello';
}
