// The CSV's columns and limits are shared with the web app (@peakwise/shared); this file keeps
// what only the server needs.

/** A file name made of safe characters only, from a culture's name. */
export function csvFileName(cultureName: string): string {
  const base = cultureName
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|-+$/g, '')
    .slice(0, 80);
  return `${base || 'culture'}-feedings.csv`;
}
