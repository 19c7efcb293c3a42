/**
 * The columns of a culture's feeding CSV, in file order: one row per rise check, the feeding's
 * columns repeated; a feeding without checks has one row with the check columns empty. Export
 * writes these headers and import reads them by default, so an export re-imports as it is.
 */
export const CSV_COLUMNS = [
  'fed_at',
  'starter_g',
  'flour_g',
  'water_g',
  'flour',
  'temperature_c',
  'water_temperature_c',
  'initial_height_mm',
  'observations',
  'notes',
  'check_taken_at',
  'check_height_mm',
  'check_temperature_c',
] as const;

export type CsvColumn = (typeof CSV_COLUMNS)[number];

/** Columns every row must have a header for. */
export const REQUIRED_COLUMNS: readonly CsvColumn[] = ['fed_at', 'starter_g', 'flour_g', 'water_g'];

/** The check columns; all empty means the row is a feeding without a check. */
export const CHECK_COLUMNS: readonly CsvColumn[] = ['check_taken_at', 'check_height_mm', 'check_temperature_c'];

/** Observations are one cell, separated by this. */
export const OBSERVATION_SEPARATOR = ';';

export type CsvRow = Record<CsvColumn, string>;

/** Limits of one import. */
export const IMPORT_MAX_ROWS = 5000;
export const PREVIEW_ROWS = 10;

/** A file name made of safe characters only, from a culture's name. */
export function csvFileName(cultureName: string): string {
  const base = cultureName
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|-+$/g, '')
    .slice(0, 80);
  return `${base || 'culture'}-feedings.csv`;
}
