import { LOGGER_THIN_MINUTES, LOGGER_WINDOW_HOURS, type LoggerCollection } from '@peakwise/shared';

const plural = (n: number, one: string, many: string) => `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;
export const readingsText = (n: number) => plural(n, 'reading', 'readings');

/** "1.5 MB" / "48 KB". */
export function fileSizeText(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;
  return `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

/** Whose time the readings must fall in, for the words: a feeding's 48 h or a bake's run. */
export type LoggerPlace = 'feeding' | 'bake';

const WINDOW_WORDS: Record<LoggerPlace, string> = {
  feeding: `this feeding’s time (from the feeding to ${LOGGER_WINDOW_HOURS} h after)`,
  bake: 'this bake’s time (from an hour before the mix to the bread being ready)',
};

/** What a check found, as short sentences: what will be added and what is left out, and why. */
export function checkedText(c: LoggerCollection, alreadyThere: number, place: LoggerPlace = 'feeding'): string[] {
  const lines = [
    `${readingsText(c.readings.length - alreadyThere)} to add, from ${plural(c.rows, 'row', 'rows')} read.`,
  ];
  if (c.outside > 0) lines.push(`${readingsText(c.outside)} outside ${WINDOW_WORDS[place]} left out.`);
  if (c.thinned > 0)
    lines.push(`${readingsText(c.thinned)} closer than ${LOGGER_THIN_MINUTES} minutes to the one kept left out.`);
  if (alreadyThere > 0)
    lines.push(
      `${readingsText(alreadyThere)} already on this ${place} left as ${alreadyThere === 1 ? 'it is' : 'they are'}.`,
    );
  return lines;
}

/** The result line: "412 readings added; 37 outside this feeding's time left out." */
export function addedText(added: number, outside: number, place: LoggerPlace = 'feeding'): string {
  const head = `${readingsText(added)} added`;
  return outside > 0
    ? `${head}; ${outside.toLocaleString('en-GB')} outside this ${place}’s time left out.`
    : `${head}.`;
}
