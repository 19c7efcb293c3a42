import { LOGGER_THIN_MINUTES, LOGGER_WINDOW_HOURS, type LoggerCollection } from '@peakwise/shared';

const plural = (n: number, one: string, many: string) => `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;
export const readingsText = (n: number) => plural(n, 'reading', 'readings');

/** "1.5 MB" / "48 KB". */
export function fileSizeText(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

/** What a check found, as short sentences: what will be added and what is left out, and why. */
export function checkedText(c: LoggerCollection, alreadyThere: number): string[] {
  const lines = [
    `${readingsText(c.readings.length - alreadyThere)} to add, from ${plural(c.rows, 'row', 'rows')} read.`,
  ];
  if (c.outside > 0)
    lines.push(
      `${readingsText(c.outside)} outside this feeding’s time (from the feeding to ${LOGGER_WINDOW_HOURS} h after) left out.`,
    );
  if (c.thinned > 0)
    lines.push(`${readingsText(c.thinned)} closer than ${LOGGER_THIN_MINUTES} minutes to the one kept left out.`);
  if (alreadyThere > 0) lines.push(`${readingsText(alreadyThere)} already on this feeding left as they are.`);
  return lines;
}

/** The result line: "412 readings added; 37 outside this feeding's time left out." */
export function addedText(added: number, outside: number): string {
  const head = `${readingsText(added)} added`;
  return outside > 0 ? `${head}; ${outside.toLocaleString('en-GB')} outside this feeding’s time left out.` : `${head}.`;
}
